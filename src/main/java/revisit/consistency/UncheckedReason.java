package revisit.consistency;

/** Why a closure could not be checked against any other. */
public enum UncheckedReason {
    /** No other closure joins the same two sequences. */
    NO_PARTNER,
    /** Odometry was given, but not for a sequence this closure touches. */
    NO_ODOMETRY_FOR_SEQUENCE,
    /** A frame time lies outside the span of its sequence's odometry. */
    OUTSIDE_ODOMETRY,
    /**
     * Other closures on the same sequences are too far along them: beyond
     * {@link ConsistencyConfig#maxStretchSeconds()} with odometry, beyond
     * {@link ConsistencyConfig#adjacencyWindowSeconds()} without.
     */
    PARTNERS_TOO_FAR,
    /** The odometry stretch to every partner is too uncertain for a first-order test. */
    ODOMETRY_TOO_UNCERTAIN,
    /**
     * Tested, but no partner it agrees with was kept: for example two closures that conflict only with each other,
     * a tie the check cannot break.
     */
    NO_SUPPORT_IN_KEPT_SET
}
