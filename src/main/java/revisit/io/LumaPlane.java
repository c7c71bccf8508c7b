package revisit.io;

import boofcv.struct.image.GrayU8;
import org.jcodec.common.model.Picture;
import org.jcodec.common.model.Rect;

/**
 * Copies the luma plane of a decoded jcodec picture into a grey image. jcodec stores 8-bit samples shifted to
 * signed bytes ({@code stored = value - 128}), so the copy adds 128 back; the picture's crop rectangle (from the
 * stream's frame cropping, e.g. 426 of 432 coded columns) gives the output size. Taking the luma plane keeps the
 * coded Y samples exactly (bit-identical to FFmpeg's decoder on the shared test videos) and skips a colour
 * round trip; decoding itself dominates the time (see {@code VideoDecodeBench} in docs/FORMAT-frames.md).
 */
final class LumaPlane {

    private LumaPlane() {
    }

    /** Width of the visible picture, pixels. */
    static int width(Picture picture) {
        Rect crop = picture.getCrop();
        return crop == null ? picture.getWidth() : crop.getWidth();
    }

    /** Height of the visible picture, pixels. */
    static int height(Picture picture) {
        Rect crop = picture.getCrop();
        return crop == null ? picture.getHeight() : crop.getHeight();
    }

    /**
     * Copies the visible luma of {@code picture} into {@code out}.
     *
     * @param out reshaped to the visible size and overwritten
     */
    static void copy(Picture picture, GrayU8 out) {
        Rect crop = picture.getCrop();
        int x0 = crop == null ? 0 : crop.getX();
        int y0 = crop == null ? 0 : crop.getY();
        int width = width(picture);
        int height = height(picture);
        out.reshape(width, height);
        byte[] plane = picture.getPlaneData(0);
        int planeWidth = picture.getPlaneWidth(0);
        for (int y = 0; y < height; y++) {
            int in = (y0 + y) * planeWidth + x0;
            int dst = out.startIndex + y * out.stride;
            for (int x = 0; x < width; x++) {
                out.data[dst + x] = (byte) (plane[in + x] + 128);
            }
        }
    }
}
