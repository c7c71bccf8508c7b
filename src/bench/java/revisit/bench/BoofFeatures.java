package revisit.bench;

import boofcv.abst.scene.FeatureSceneRecognition;
import boofcv.struct.feature.TupleDesc_B;
import georegression.struct.point.Point2D_F64;
import revisit.features.FrameFeatures;

/**
 * Our packed descriptors seen as BoofCV's {@link FeatureSceneRecognition.Features}: descriptor bit {@code b}
 * (bit {@code b % 64} of long {@code b / 64}) becomes bit {@code b % 32} of int {@code b / 32} of a
 * {@link TupleDesc_B}, BoofCV's own bit order, so Hamming distances are unchanged. Pixels are not used by the
 * vocabulary-tree recogniser and read as (0, 0). Reused: {@link #load} overwrites the previous frame.
 */
final class BoofFeatures implements FeatureSceneRecognition.Features<TupleDesc_B> {

    private final Point2D_F64 origin = new Point2D_F64();
    private TupleDesc_B[] descriptions = new TupleDesc_B[0];
    private int size;

    /** Converts {@code count} packed descriptors starting at descriptor {@code first}. */
    BoofFeatures load(long[] packed, int first, int count) {
        if (descriptions.length < count) {
            TupleDesc_B[] grown = new TupleDesc_B[count];
            System.arraycopy(descriptions, 0, grown, 0, descriptions.length);
            for (int i = descriptions.length; i < count; i++) {
                grown[i] = new TupleDesc_B(FrameFeatures.DESCRIPTOR_BITS);
            }
            descriptions = grown;
        }
        for (int i = 0; i < count; i++) {
            int[] data = descriptions[i].data;
            for (int w = 0; w < FrameFeatures.STRIDE; w++) {
                long v = packed[(first + i) * FrameFeatures.STRIDE + w];
                data[2 * w] = (int) v;
                data[2 * w + 1] = (int) (v >>> 32);
            }
        }
        size = count;
        return this;
    }

    @Override
    public Point2D_F64 getPixel(int index) {
        return origin;
    }

    @Override
    public TupleDesc_B getDescription(int index) {
        return descriptions[index];
    }

    @Override
    public int size() {
        return size;
    }
}
