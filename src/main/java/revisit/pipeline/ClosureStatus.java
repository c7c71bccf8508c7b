package revisit.pipeline;

/** Where a closure stands after verification and the consistency check. */
public enum ClosureStatus {
    /** Verified geometrically and consistent with the other closures (or no check could object). */
    TRUSTED,
    /** Verified geometrically, but the consistency check could not test it (no partner closure, no odometry). */
    UNCHECKED,
    /** Verified geometrically, but it contradicts the largest mutually consistent set of closures. */
    CONFLICTING,
    /** A candidate that failed verification; exported only when rejected candidates are asked for. */
    REJECTED
}
