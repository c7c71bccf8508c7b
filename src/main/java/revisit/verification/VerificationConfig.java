package revisit.verification;

/**
 * Settings of descriptor matching and geometric verification of one frame pair.
 *
 * @param ratio              Hamming ratio test: a match is kept when best &lt; ratio * second best. Unitless,
 *                           typical 0.6-0.9; default 0.8 (Lowe, IJCV 2004, whose figure 11 puts the cut at 0.8)
 * @param maxHammingBits     largest accepted descriptor distance, bits of 256, typical 50-100; default 80
 *                           (common practice for 256-bit binary descriptors)
 * @param minInliers         fewest RANSAC inliers for an accepted pair, typical 12-30; default 20, stricter than
 *                           the 12 of Galvez-Lopez &amp; Tardos, IEEE T-RO 2012: on the Middlebury dino ring
 *                           (Seitz et al., CVPR 2006) wrong pairs reached 12-19 inliers and true ones 25 and more
 *                           (docs/SCAN.md); on the invented yard every trusted closure had at least 22
 * @param minInlierRatio     fewest inliers as a share of the putative matches, in [0, 1), typical 0.1-0.5;
 *                           default 0.3, measured here: on the Middlebury dino ring (Seitz et al., CVPR 2006)
 *                           wrong pairs that passed 12 inliers had ratios 0.15-0.24 and true ones 0.31-0.91
 *                           (docs/SCAN.md). Guards against chance support in large match sets (300 random
 *                           matches gave 13 essential-matrix inliers here). The one inlier-ratio bar of the
 *                           project: the scan applies it too (it replaced the scan section's own setting)
 * @param inlierThresholdPx  inlier cut on the Sampson distance of epipolar models, pixels, typical 1-4; default
 *                           2.0 = sqrt(3.84) sigma for sigma = 1 px (Hartley &amp; Zisserman 2004, Table 4.2). The
 *                           homography cut is this times sqrt(5.99 / 3.84) (two degrees of freedom), and the
 *                           noise level used in model selection is this / sqrt(3.84)
 * @param confidence         probability that RANSAC draws at least one all-inlier sample, in (0, 1), typical
 *                           0.99-0.999; default 0.99 (Hartley &amp; Zisserman 2004, sec. 4.7.1)
 * @param maxIterations      cap on RANSAC samples per model, typical 200-5000; default 250, measured
 *                           (docs/VERIFICATION.md, "The sample cap"): a pair below the acceptance bar draws the
 *                           whole cap at one five-point solve (7-10 us) each, so the cap sets the worst case:
 *                           7.5-9 ms at 1000 samples, 2.0-2.5 ms at 250 (VerificationCpuTime). 250 samples still
 *                           hold an all-inlier sample of a model with 40% inliers with probability 92% (50%:
 *                           99.96%; at the 30% bar 45%, against 91% at 1000). Scans of both generated scenarios
 *                           gave the same closures at caps 1000, 350, 300 and 250 on the demo and one trusted
 *                           closure fewer of 156 at 640x480, same recall; the Middlebury pair table was identical
 * @param refineIterations   cap on Levenberg-Marquardt steps of the pose refinement, typical 5-50; default 20
 *                           (common practice)
 * @param fundamentalSolver  minimal solver for the uncalibrated model; default seven points (fewer samples)
 * @param seed               RANSAC random seed; the same seed and input give the same result
 */
public record VerificationConfig(double ratio, int maxHammingBits, int minInliers, double minInlierRatio,
                                 double inlierThresholdPx,
                                 double confidence, int maxIterations, int refineIterations,
                                 FundamentalSolver fundamentalSolver, long seed) {

    /** Minimal solver for the fundamental matrix (BoofCV implementations). */
    public enum FundamentalSolver {
        /** Seven-point algorithm, up to three solutions per sample (H&amp;Z sec. 11.1.2). */
        SEVEN_POINT,
        /** Normalised eight-point algorithm (Hartley, PAMI 1997). */
        EIGHT_POINT
    }

    public VerificationConfig {
        if (!(ratio > 0 && ratio <= 1)) {
            throw new IllegalArgumentException("ratio must be in (0, 1], was " + ratio);
        }
        if (maxHammingBits < 0 || maxHammingBits > 256) {
            throw new IllegalArgumentException("maxHammingBits must be in 0..256, was " + maxHammingBits);
        }
        if (minInliers < 8) {
            throw new IllegalArgumentException("minInliers must be >= 8 (the largest minimal sample), was "
                    + minInliers);
        }
        if (!(minInlierRatio >= 0 && minInlierRatio < 1)) {
            throw new IllegalArgumentException("minInlierRatio must be in [0, 1), was " + minInlierRatio);
        }
        if (!(inlierThresholdPx > 0) || !Double.isFinite(inlierThresholdPx)) {
            throw new IllegalArgumentException("inlierThresholdPx must be positive, was " + inlierThresholdPx);
        }
        if (!(confidence > 0 && confidence < 1)) {
            throw new IllegalArgumentException("confidence must be in (0, 1), was " + confidence);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("maxIterations must be >= 1, was " + maxIterations);
        }
        if (refineIterations < 0) {
            throw new IllegalArgumentException("refineIterations must be >= 0, was " + refineIterations);
        }
        if (fundamentalSolver == null) {
            throw new IllegalArgumentException("fundamentalSolver must be given");
        }
    }

    /** The documented defaults. */
    public static VerificationConfig defaults() {
        return new VerificationConfig(0.8, 80, 20, 0.3, 2.0, 0.99, 250, 20, FundamentalSolver.SEVEN_POINT,
                20120601L);
    }

    public VerificationConfig withRatio(double v) {
        return new VerificationConfig(v, maxHammingBits, minInliers, minInlierRatio, inlierThresholdPx, confidence,
                maxIterations, refineIterations, fundamentalSolver, seed);
    }

    public VerificationConfig withMaxHammingBits(int v) {
        return new VerificationConfig(ratio, v, minInliers, minInlierRatio, inlierThresholdPx, confidence,
                maxIterations, refineIterations, fundamentalSolver, seed);
    }

    public VerificationConfig withMinInliers(int v) {
        return new VerificationConfig(ratio, maxHammingBits, v, minInlierRatio, inlierThresholdPx, confidence,
                maxIterations, refineIterations, fundamentalSolver, seed);
    }

    public VerificationConfig withMinInlierRatio(double v) {
        return new VerificationConfig(ratio, maxHammingBits, minInliers, v, inlierThresholdPx, confidence,
                maxIterations, refineIterations, fundamentalSolver, seed);
    }

    public VerificationConfig withInlierThresholdPx(double v) {
        return new VerificationConfig(ratio, maxHammingBits, minInliers, minInlierRatio, v, confidence,
                maxIterations, refineIterations, fundamentalSolver, seed);
    }

    public VerificationConfig withConfidence(double v) {
        return new VerificationConfig(ratio, maxHammingBits, minInliers, minInlierRatio, inlierThresholdPx, v,
                maxIterations, refineIterations, fundamentalSolver, seed);
    }

    public VerificationConfig withMaxIterations(int v) {
        return new VerificationConfig(ratio, maxHammingBits, minInliers, minInlierRatio, inlierThresholdPx,
                confidence, v, refineIterations, fundamentalSolver, seed);
    }

    public VerificationConfig withRefineIterations(int v) {
        return new VerificationConfig(ratio, maxHammingBits, minInliers, minInlierRatio, inlierThresholdPx,
                confidence, maxIterations, v, fundamentalSolver, seed);
    }

    public VerificationConfig withFundamentalSolver(FundamentalSolver v) {
        return new VerificationConfig(ratio, maxHammingBits, minInliers, minInlierRatio, inlierThresholdPx,
                confidence, maxIterations, refineIterations, v, seed);
    }

    public VerificationConfig withSeed(long v) {
        return new VerificationConfig(ratio, maxHammingBits, minInliers, minInlierRatio, inlierThresholdPx,
                confidence, maxIterations, refineIterations, fundamentalSolver, v);
    }

    /**
     * Fewest inliers an accepted pair needs among {@code matchCount} putative matches: at least
     * {@link #minInliers} and a share of at least {@link #minInlierRatio}. RANSAC uses it to stop early on
     * hopeless pairs.
     */
    public int minSupport(int matchCount) {
        int k = (int) Math.ceil(minInlierRatio * matchCount);
        while (k > 0 && (double) (k - 1) / matchCount >= minInlierRatio) {
            k--;
        }
        while (k < matchCount && (double) k / matchCount < minInlierRatio) {
            k++;
        }
        return Math.max(minInliers, k);
    }

    /** Inlier cut of the homography and rotation models, pixels (two degrees of freedom). */
    public double homographyThresholdPx() {
        return inlierThresholdPx * Math.sqrt(5.99 / 3.84);
    }

    /** Pixel noise standard deviation implied by the inlier cut, pixels. */
    public double noiseSigmaPx() {
        return inlierThresholdPx / Math.sqrt(3.84);
    }
}
