package revisit.evaluation;

/**
 * How far a query got through the detector, in pipeline order. Each later stage implies the earlier ones passed.
 */
public enum StageReached {
    /** The index was queried but proposed no candidate (nothing scored above its floor, or all were excluded). */
    LOOKED_UP,
    /** A candidate was proposed but failed the check for consistency with the neighbouring queries in time. */
    PROPOSED,
    /** The candidate was consistent in time but geometric verification rejected it. */
    CONSISTENT,
    /** The candidate passed geometric verification; the acceptance threshold on its score decides the rest. */
    VERIFIED
}
