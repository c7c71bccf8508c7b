package revisit.index;

/** Where the temporal consistency check stands after a query. */
public enum ConsistencyState {
    /** The chosen group continues a chain of nearby groups over the required number of previous queries. */
    CONFIRMED,
    /** The chosen group starts or continues a chain that is not yet long enough. */
    GATHERING,
    /** No candidate reached the normalised score threshold; the chain is broken. */
    NO_GROUP,
    /**
     * The query's score against its predecessor is missing or below the floor, so normalised scores are unreliable:
     * the query neither extends nor breaks the chain.
     */
    WEAK_PREDECESSOR
}
