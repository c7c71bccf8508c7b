package revisit.features;

import java.util.Arrays;

/**
 * The oriented keypoints of one frame and their 256-bit binary descriptors.
 *
 * <p>Arrays are parallel and hold exactly {@code count} entries (descriptors hold {@code count * STRIDE}
 * longs). Coordinates are in pixels of the full-resolution image (level 0), origin at the top-left pixel centre.
 * Descriptors are packed little-endian: bit {@code b} of the descriptor is bit {@code b % 64} of long
 * {@code b / 64}.
 *
 * @param count       number of features
 * @param x           column, pixels at level 0
 * @param y           row, pixels at level 0
 * @param angleRad    orientation from the intensity centroid, radians in (-pi, pi]
 * @param level       pyramid level the feature was detected on, 0 = full resolution
 * @param scale       size of a level pixel in level-0 pixels (scaleFactor^level)
 * @param response    detector score used for ranking (larger is stronger)
 * @param descriptors packed descriptors, {@link #STRIDE} longs per feature
 */
public record FrameFeatures(int count, float[] x, float[] y, float[] angleRad, int[] level, float[] scale,
                            float[] response, long[] descriptors) {

    /** Longs per 256-bit descriptor. */
    public static final int STRIDE = 4;
    /** Bits per descriptor. */
    public static final int DESCRIPTOR_BITS = 256;

    public FrameFeatures {
        if (count < 0) {
            throw new IllegalArgumentException("count must be >= 0, was " + count);
        }
        if (x.length < count || y.length < count || angleRad.length < count || level.length < count
                || scale.length < count || response.length < count || descriptors.length < count * STRIDE) {
            throw new IllegalArgumentException("feature arrays shorter than count " + count);
        }
    }

    /** A frame with no features (blank or featureless image). */
    public static FrameFeatures empty() {
        return new FrameFeatures(0, new float[0], new float[0], new float[0], new int[0], new float[0],
                new float[0], new long[0]);
    }

    /** Copy of the descriptor of feature {@code i} as a new 4-long array. */
    public long[] descriptor(int i) {
        return Arrays.copyOfRange(descriptors, i * STRIDE, i * STRIDE + STRIDE);
    }
}
