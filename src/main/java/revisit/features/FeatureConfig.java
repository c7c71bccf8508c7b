package revisit.features;

import java.util.Objects;

/**
 * Settings of the ORB-style front end ({@link FeatureExtractor}): oriented FAST corners on a scale pyramid
 * described by steered BRIEF (Rublee, Rabaud, Konolige and Bradski, "ORB: an efficient alternative to SIFT or
 * SURF", ICCV 2011).
 *
 * @param maxFeatures   features kept per frame, at most; typical 500..2000. Default 1000: the frame budget the
 *                      project plans for at 640x480 (DESIGN.md).
 * @param levels        pyramid levels including the full-resolution one; 1..16, typical 4..8. Default 8, the level
 *                      count of OpenCV's ORB (from memory).
 * @param scaleFactor   ratio of image sizes between neighbouring levels; 1.05..2.0, typical 1.2..1.5. Default
 *                      1.2, as in OpenCV's ORB (from memory).
 * @param fastThreshold FAST intensity difference, grey levels (0..255 scale); 1..254, typical 7..40. Default 20,
 *                      the default of BoofCV's {@code ConfigFastCorner}.
 * @param fastArc       contiguous arc length of the FAST test, pixels on the 16-pixel circle; 9..12. Default 9
 *                      (FAST-9, the variant ORB uses; Rosten, Porter and Drummond, IEEE TPAMI 2010).
 * @param borderPx      margin at each level, level pixels, inside which no feature is placed; at least
 *                      {@link #MIN_BORDER_PX} so that the orientation patch (radius 15) and the rotated BRIEF
 *                      pattern stay inside the image; typical 16..31. Default 16, that minimum.
 * @param gridCellPx    side of the square cells used to spread features over each level, level pixels;
 *                      8..512, typical 16..64. Default 32 (with {@code cellCap} 4), chosen on graf1/graf3 and
 *                      rotated photos (docs/FEATURES.md).
 * @param cellCap       corners a cell gives per round of the spreading before other cells have their turn;
 *                      1..1024, typical 1..8; 1 is strict round robin, large values mean strongest first. Default
 *                      4: repeatability on graf1/graf3 0.89 against 0.70 with 1 and 0.91 with no grid
 *                      (docs/FEATURES.md).
 * @param cornerScore   how candidates are ranked; default {@link CornerScore#HARRIS}, as in ORB.
 * @param harrisK       Harris sensitivity k in det(M) - k trace(M)^2; 0.01..0.2. Default 0.04, common practice
 *                      (Harris and Stephens, Alvey Vision Conference 1988, suggest 0.04..0.06).
 * @param blurSigma     standard deviation of the Gaussian that smooths each level before the BRIEF tests,
 *                      level pixels; 0.5..2.5 (the kernel has 7 taps, as ORB's 7x7 blur). Default 2.0, the value of
 *                      Calonder et al., ECCV 2010 (from memory).
 * @param angleBins     number of discrete orientations for which the BRIEF pattern is pre-rotated; 8..360.
 *                      Default 90 (4 degree steps): Rublee et al. 2011 use 30, but on rotated photos 90 bins gave
 *                      about 20% more correct matches at 30 and 45 degrees than 30 bins (docs/FEATURES.md); the
 *                      table is 90 x 256 longs (184 KB).
 * @param patternSeed   seed of the random BRIEF test pattern; any value. Default fixed so that descriptors of
 *                      different runs and machines are comparable; changing it invalidates trained vocabularies.
 */
public record FeatureConfig(int maxFeatures, int levels, double scaleFactor, int fastThreshold, int fastArc,
                            int borderPx, int gridCellPx, int cellCap, CornerScore cornerScore,
                            double harrisK, double blurSigma, int angleBins, long patternSeed) {

    /** Smallest {@link #borderPx}: orientation patch radius (15) plus one pixel of rounding. */
    public static final int MIN_BORDER_PX = 16;
    /** Default {@link #patternSeed}. */
    public static final long DEFAULT_PATTERN_SEED = 0x52455649534954L;

    /** Ranking of corner candidates before the per-level quota is filled. */
    public enum CornerScore {
        /** Harris corner measure on a 7x7 window (as ORB ranks its FAST corners). */
        HARRIS,
        /** FAST score: summed absolute difference of the arc pixels from the centre (BoofCV's score). */
        FAST
    }

    public FeatureConfig {
        Objects.requireNonNull(cornerScore, "cornerScore");
        check(maxFeatures >= 1 && maxFeatures <= 100_000, "maxFeatures", maxFeatures, "1..100000");
        check(levels >= 1 && levels <= 16, "levels", levels, "1..16");
        check(scaleFactor >= 1.05 && scaleFactor <= 2.0, "scaleFactor", scaleFactor, "1.05..2.0");
        check(fastThreshold >= 1 && fastThreshold <= 254, "fastThreshold", fastThreshold, "1..254");
        check(fastArc >= 9 && fastArc <= 12, "fastArc", fastArc, "9..12");
        check(borderPx >= MIN_BORDER_PX && borderPx <= 256, "borderPx", borderPx, MIN_BORDER_PX + "..256");
        check(gridCellPx >= 8 && gridCellPx <= 512, "gridCellPx", gridCellPx, "8..512");
        check(cellCap >= 1 && cellCap <= 1024, "cellCap", cellCap, "1..1024");
        check(harrisK >= 0.01 && harrisK <= 0.2, "harrisK", harrisK, "0.01..0.2");
        check(blurSigma >= 0.5 && blurSigma <= 2.5, "blurSigma", blurSigma, "0.5..2.5");
        check(angleBins >= 8 && angleBins <= 360, "angleBins", angleBins, "8..360");
    }

    private static void check(boolean ok, String name, double value, String range) {
        if (!ok) {
            String shown = value == Math.rint(value) ? Long.toString((long) value) : Double.toString(value);
            throw new IllegalArgumentException("feature setting " + name + " = " + shown + " is out of range; use "
                    + range);
        }
    }

    /** The defaults documented on each field. */
    public static FeatureConfig defaults() {
        return new FeatureConfig(1000, 8, 1.2, 20, 9, MIN_BORDER_PX, 32, 4, CornerScore.HARRIS, 0.04, 2.0, 90,
                DEFAULT_PATTERN_SEED);
    }

    public FeatureConfig withMaxFeatures(int v) {
        return new FeatureConfig(v, levels, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withLevels(int v) {
        return new FeatureConfig(maxFeatures, v, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withScaleFactor(double v) {
        return new FeatureConfig(maxFeatures, levels, v, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withFastThreshold(int v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, v, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withFastArc(int v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, v, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withBorderPx(int v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, v, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withGridCellPx(int v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, borderPx, v,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withCellCap(int v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                v, cornerScore, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withCornerScore(CornerScore v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, v, harrisK, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withHarrisK(double v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, v, blurSigma, angleBins, patternSeed);
    }

    public FeatureConfig withBlurSigma(double v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, v, angleBins, patternSeed);
    }

    public FeatureConfig withAngleBins(int v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, v, patternSeed);
    }

    public FeatureConfig withPatternSeed(long v) {
        return new FeatureConfig(maxFeatures, levels, scaleFactor, fastThreshold, fastArc, borderPx, gridCellPx,
                cellCap, cornerScore, harrisK, blurSigma, angleBins, v);
    }
}
