package revisit.consistency;

/** What the consistency check concluded about one closure. */
public enum Verdict {
    /** In the largest mutually consistent set, and agreeing with at least one other member in a tested loop. */
    CONSISTENT,
    /** Outside the largest mutually consistent set: it conflicts with closures that agree among themselves. */
    CONFLICTING,
    /** Not tested against any partner, or only against ones it conflicts with in a tie (see the reason). */
    UNCHECKED
}
