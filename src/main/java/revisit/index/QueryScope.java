package revisit.index;

/** Which sequences of the database a query may match. */
public enum QueryScope {
    /** Every sequence, the query's own included (its recent frames stay excluded by the exclusion window). */
    ALL_SEQUENCES,
    /** Only sequences other than the query's own: merging one session's map into another's. */
    OTHER_SEQUENCES,
    /** Only the query's own sequence: revisits within one session. */
    SAME_SEQUENCE;

    /** Whether a frame of {@code frameSequence} may answer a query from {@code querySequence}. */
    boolean admits(int querySequence, int frameSequence) {
        return switch (this) {
            case ALL_SEQUENCES -> true;
            case OTHER_SEQUENCES -> querySequence != frameSequence;
            case SAME_SEQUENCE -> querySequence == frameSequence;
        };
    }
}
