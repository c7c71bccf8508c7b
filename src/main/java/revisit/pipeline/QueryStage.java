package revisit.pipeline;

/** The furthest stage one query frame reached in the scan. */
public enum QueryStage {
    /** The index proposed no frame outside the exclusion window. */
    NO_CANDIDATE,
    /** Candidates came back, but the temporal consistency check did not confirm a revisit. */
    PROPOSED,
    /** A revisit was confirmed over time, but geometric verification refused it. */
    CONSISTENT,
    /** Geometric verification accepted the revisit, but the consistency check found it contradicts others. */
    CONFLICTING,
    /**
     * Geometric verification accepted the revisit, but no partner closure or odometry could corroborate it: listed
     * in JSON Lines and CSV, written as an edge only on request.
     */
    UNCHECKED,
    /** Geometric verification accepted the revisit and the consistency check corroborated it: a trusted closure. */
    VERIFIED
}
