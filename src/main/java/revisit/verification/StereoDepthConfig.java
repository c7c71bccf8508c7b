package revisit.verification;

/**
 * Settings of dense depth from a rectified stereo pair ({@link StereoDepth}).
 *
 * @param minDisparityPx   smallest disparity searched, pixels; typical 0 .. 10; default 1 (disparity 0 is infinitely
 *                         far and carries no depth)
 * @param disparityRangePx number of disparities searched, pixels; typical 32 .. 256; default 96 (common practice for
 *                         VGA stereo with a 10 cm baseline: down to about 0.5 m)
 * @param blockRadiusPx    radius of the matched block, pixels; typical 2 .. 7; default 3 (BoofCV's default block)
 * @param metresPerUnit    unit of the 16-bit depth written, metres; typical 1e-4 .. 1e-3; default 0.001 (millimetres,
 *                         common practice for 16-bit depth)
 */
public record StereoDepthConfig(int minDisparityPx, int disparityRangePx, int blockRadiusPx, double metresPerUnit) {

    public StereoDepthConfig {
        if (minDisparityPx < 0 || disparityRangePx < 1 || blockRadiusPx < 1) {
            throw new IllegalArgumentException("need minDisparityPx >= 0, disparityRangePx >= 1, blockRadiusPx >= 1; were "
                    + minDisparityPx + ", " + disparityRangePx + ", " + blockRadiusPx);
        }
        if (!(metresPerUnit > 0) || !Double.isFinite(metresPerUnit)) {
            throw new IllegalArgumentException("metresPerUnit must be positive and finite, was " + metresPerUnit);
        }
    }

    /** The documented defaults. */
    public static StereoDepthConfig defaults() {
        return new StereoDepthConfig(1, 96, 3, 0.001);
    }

    public StereoDepthConfig withDisparities(int minPx, int rangePx) {
        return new StereoDepthConfig(minPx, rangePx, blockRadiusPx, metresPerUnit);
    }

    public StereoDepthConfig withBlockRadiusPx(int value) {
        return new StereoDepthConfig(minDisparityPx, disparityRangePx, value, metresPerUnit);
    }

    public StereoDepthConfig withMetresPerUnit(double value) {
        return new StereoDepthConfig(minDisparityPx, disparityRangePx, blockRadiusPx, value);
    }
}
