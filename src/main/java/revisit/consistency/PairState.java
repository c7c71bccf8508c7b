package revisit.consistency;

/** Result of testing two closures against each other. */
public enum PairState {
    /** The loop through both closures and the odometry closes within its uncertainty. */
    CONSISTENT,
    /** The loop misses the identity by more than the chi-square gate. */
    CONFLICTING,
    /** The two closures could not be tested (see the reason). */
    UNTESTED
}
