package revisit.verification;

/** Why no metric relative pose was produced. */
public enum MetricRejection {
    /** A pose was produced. */
    NONE,
    /** Fewer matches with valid depth than the minimum inlier count. */
    TOO_FEW_POINTS_WITH_DEPTH,
    /** No hypothesis gathered the minimum inlier count. */
    NO_CONSENSUS,
    /** The inliers do not fix all six degrees of freedom (information matrix not positive definite). */
    DEGENERATE_GEOMETRY
}
