package revisit.verification;

/** Verdict of a pair verification: accepted, or the reason it was rejected. */
public enum Outcome {
    /** Enough inliers to a consistent two-view model. */
    ACCEPTED,
    /** Fewer putative matches than the minimum inlier count: no model was tried. */
    TOO_FEW_MATCHES,
    /** The best model has fewer inliers than the minimum. */
    TOO_FEW_INLIERS,
    /**
     * No epipolar model with the acceptance bar's support ({@link VerificationConfig#minSupport}) turned up within
     * the samples that find one with the configured confidence (Fischler &amp; Bolles 1981): RANSAC stopped early.
     */
    NO_CONSENSUS,
    /** No sample gave a usable model (collinear or coincident points, solver failure). */
    DEGENERATE,
    /** Too few inliers lie in front of both cameras for any pose that fits the model. */
    POINTS_BEHIND_CAMERA;

    /** True for {@link #ACCEPTED}. */
    public boolean accepted() {
        return this == ACCEPTED;
    }
}
