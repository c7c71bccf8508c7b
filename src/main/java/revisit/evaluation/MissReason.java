package revisit.evaluation;

/**
 * Why a positive query (one with a labelled revisit) produced no true detection: the stage that lost it.
 */
public enum MissReason {
    /** The pipeline returned no outcome for the query (e.g. the frame could not be read). */
    NOT_QUERIED,
    /** The index proposed no candidate. */
    NO_CANDIDATE,
    /** A candidate was proposed but failed the temporal consistency check. */
    TEMPORAL_CHECK,
    /** The candidate passed the temporal check but failed geometric verification. */
    VERIFICATION,
    /** The candidate was verified but its score was below the acceptance threshold. */
    BELOW_THRESHOLD,
    /** A detection was reported, but to a frame that is not a labelled revisit (it also counts as false). */
    WRONG_MATCH;

    /** The reason for a positive query that reached {@code stage} and was not reported. */
    static MissReason unreportedAt(StageReached stage) {
        return switch (stage) {
            case LOOKED_UP -> NO_CANDIDATE;
            case PROPOSED -> TEMPORAL_CHECK;
            case CONSISTENT -> VERIFICATION;
            case VERIFIED -> BELOW_THRESHOLD;
        };
    }
}
