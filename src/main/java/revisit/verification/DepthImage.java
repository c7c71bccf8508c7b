package revisit.verification;

import boofcv.struct.image.GrayU16;
import java.util.OptionalDouble;

/**
 * A depth image registered to the colour camera: pixel (u, v) holds the depth Z (distance along the optical axis,
 * not along the ray) of the scene point seen at pixel (u, v) of the colour image, as RGB-D sensors deliver it
 * (common practice), in units of {@code metresPerUnit}. Zero means "no measurement".
 *
 * <p>Pixel centres sit at integer coordinates, as in {@link revisit.features.FrameFeatures}. The image is held, not
 * copied; do not modify it while a {@code DepthImage} is in use.
 *
 * @param image         16-bit depth values, 0 = invalid
 * @param metresPerUnit metres per stored unit, e.g. 0.001 for millimetres (typical range 1e-4 .. 1e-2)
 */
public record DepthImage(GrayU16 image, double metresPerUnit) {

    public DepthImage {
        if (image == null) {
            throw new IllegalArgumentException("depth image must not be null");
        }
        if (!(metresPerUnit > 0) || !Double.isFinite(metresPerUnit)) {
            throw new IllegalArgumentException("metres per unit must be positive and finite, was " + metresPerUnit);
        }
    }

    /** A depth image in millimetres, the usual unit of 16-bit depth files (common practice). */
    public static DepthImage millimetres(GrayU16 image) {
        return new DepthImage(image, 0.001);
    }

    /**
     * Depth at a sub-pixel position.
     *
     * @param u               column, pixels (pixel centres at integers)
     * @param v               row, pixels
     * @param sampling        how to read between pixel centres
     * @param maxRelativeJump for {@link DepthSampling#BILINEAR}: largest (max - min) / min among the four neighbours
     *                        that still counts as one surface (typical 0.02 .. 0.1)
     * @return depth in metres, or empty when outside the image or not measured
     */
    public OptionalDouble depthAt(double u, double v, DepthSampling sampling, double maxRelativeJump) {
        if (!(u > -0.5 && v > -0.5 && u < image.width - 0.5 && v < image.height - 0.5)) {
            return OptionalDouble.empty();
        }
        int nearest = image.get((int) Math.round(u), (int) Math.round(v));
        if (sampling == DepthSampling.NEAREST) {
            return metres(nearest);
        }
        int u0 = (int) Math.floor(u);
        int v0 = (int) Math.floor(v);
        if (u0 < 0 || v0 < 0 || u0 + 1 >= image.width || v0 + 1 >= image.height) {
            return metres(nearest);
        }
        int d00 = image.get(u0, v0);
        int d10 = image.get(u0 + 1, v0);
        int d01 = image.get(u0, v0 + 1);
        int d11 = image.get(u0 + 1, v0 + 1);
        int min = Math.min(Math.min(d00, d10), Math.min(d01, d11));
        int max = Math.max(Math.max(d00, d10), Math.max(d01, d11));
        if (min == 0 || max - min > maxRelativeJump * min) {
            return metres(nearest);
        }
        double fu = u - u0;
        double fv = v - v0;
        double blended = (1 - fv) * ((1 - fu) * d00 + fu * d10) + fv * ((1 - fu) * d01 + fu * d11);
        return OptionalDouble.of(blended * metresPerUnit);
    }

    private OptionalDouble metres(int stored) {
        return stored == 0 ? OptionalDouble.empty() : OptionalDouble.of(stored * metresPerUnit);
    }
}
