package revisit.verification;

import java.util.Optional;

/**
 * Result of verifying one frame pair.
 *
 * @param outcome       accepted, or why not
 * @param model         the model kind chosen by model selection ({@link ModelKind#NONE} when none was fitted)
 * @param matchCount    putative matches given to RANSAC
 * @param inlierMatches indices into the putative matches (not feature indices) of the final inliers, ascending
 * @param model3x3      the fitted matrix, row-major: F (pixels, undistorted when a camera was given), E (normalised
 *                      coordinates, {@code [t]x R} of the refined pose when accepted), H (pixels, undistorted
 *                      when a camera was given) or R; empty when no model
 * @param pose          relative pose with information matrix; present only for accepted calibrated pairs
 * @param errors        inlier error statistics under the final model
 * @param selection     model-selection scores (GRIC) of the candidate models
 * @param iterations    RANSAC samples drawn, over all candidate models
 */
public record Verification(Outcome outcome, ModelKind model, int matchCount, int[] inlierMatches,
                           double[] model3x3, Optional<RelativePose> pose, ResidualStats errors,
                           ModelScores selection, int iterations) {

    /** Number of final inliers. */
    public int inlierCount() {
        return inlierMatches.length;
    }

    /** Inliers over putative matches, in [0, 1]; 0 when there were no matches. */
    public double inlierRatio() {
        return matchCount == 0 ? 0 : (double) inlierMatches.length / matchCount;
    }

    /** True when the pair was accepted. */
    public boolean accepted() {
        return outcome.accepted();
    }

    /** A rejection before or without a usable model. */
    static Verification rejected(Outcome outcome, int matchCount, ModelScores scores, int iterations) {
        return new Verification(outcome, ModelKind.NONE, matchCount, new int[0], new double[0], Optional.empty(),
                ResidualStats.none(), scores, iterations);
    }
}
