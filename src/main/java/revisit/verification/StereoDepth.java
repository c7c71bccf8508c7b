package revisit.verification;

import boofcv.abst.disparity.StereoDisparity;
import boofcv.factory.disparity.ConfigDisparityBM;
import boofcv.factory.disparity.DisparityError;
import boofcv.factory.disparity.FactoryStereoDisparity;
import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU16;
import boofcv.struct.image.GrayU8;

/**
 * Depth image of the left camera of a rectified stereo pair: BoofCV's block-matching disparity (census error,
 * left-right check, sub-pixel), then {@code Z = f B / d} for focal length f (pixels), baseline B (metres) and
 * disparity d (pixels). Pixels without a valid disparity, or whose depth does not fit 16 bits, are 0 (no
 * measurement). The left camera's model is the one to use with the resulting {@link DepthImage}.
 *
 * <p>Not thread-safe: holds BoofCV's matcher. Use one instance per thread.
 */
public final class StereoDepth {

    private final double focalBaseline;
    private final StereoDepthConfig config;
    private final StereoDisparity<GrayU8, GrayF32> disparity;

    /**
     * @param focalLengthPx  focal length of the rectified pair, pixels
     * @param baselineMetres distance between the two camera centres, metres
     * @param config         disparity search and output unit
     */
    public StereoDepth(double focalLengthPx, double baselineMetres, StereoDepthConfig config) {
        if (!(focalLengthPx > 0) || !(baselineMetres > 0) || !Double.isFinite(focalLengthPx * baselineMetres)) {
            throw new IllegalArgumentException("focal length and baseline must be positive and finite, were "
                    + focalLengthPx + " px, " + baselineMetres + " m");
        }
        this.focalBaseline = focalLengthPx * baselineMetres;
        this.config = config;
        ConfigDisparityBM bm = new ConfigDisparityBM();
        bm.disparityMin = config.minDisparityPx();
        bm.disparityRange = config.disparityRangePx();
        bm.regionRadiusX = config.blockRadiusPx();
        bm.regionRadiusY = config.blockRadiusPx();
        bm.errorType = DisparityError.CENSUS;
        bm.subpixel = true;
        this.disparity = FactoryStereoDisparity.blockMatch(bm, GrayU8.class, GrayF32.class);
    }

    /**
     * Computes the depth of every left pixel.
     *
     * @param left  rectified left image; not modified
     * @param right rectified right image of the same size; not modified
     * @return depth of the left image, in {@link StereoDepthConfig#metresPerUnit()} units
     */
    public DepthImage depthOf(GrayU8 left, GrayU8 right) {
        if (left.width != right.width || left.height != right.height) {
            throw new IllegalArgumentException("stereo images differ in size: " + left.width + "x" + left.height
                    + " and " + right.width + "x" + right.height);
        }
        disparity.process(left, right);
        GrayF32 d = disparity.getDisparity();
        GrayU16 depth = new GrayU16(left.width, left.height);
        double invalid = disparity.getInvalidValue();
        for (int y = 0; y < d.height; y++) {
            for (int x = 0; x < d.width; x++) {
                float value = d.get(x, y);
                if (value >= invalid) {
                    continue;
                }
                double pixels = config.minDisparityPx() + value;
                if (pixels <= 0) {
                    continue;
                }
                long units = Math.round(focalBaseline / pixels / config.metresPerUnit());
                if (units > 0 && units <= 0xFFFF) {
                    depth.set(x, y, (int) units);
                }
            }
        }
        return new DepthImage(depth, config.metresPerUnit());
    }
}
