package revisit.index;

/**
 * Outcome of the temporal consistency check for one query.
 *
 * @param state       where the check stands
 * @param chainLength consecutive queries, this one included, whose chosen groups lie near each other
 * @param reason      one line saying why, with the numbers involved
 */
public record Consistency(ConsistencyState state, int chainLength, String reason) {
}
