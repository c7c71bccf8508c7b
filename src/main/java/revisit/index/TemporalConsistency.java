package revisit.index;

import java.util.Locale;
import java.util.Optional;

/**
 * Temporal consistency of chosen groups across queries (Gálvez-López and Tardós, IEEE T-RO 2012): a revisit is
 * confirmed when the groups chosen for the current query and each of the previous {@code k} queries form a chain in
 * which every group overlaps, or lies within {@code gapSeconds} of, the group chosen for the query before it.
 */
final class TemporalConsistency {

    private final int requiredPrevious;
    private final double gapSeconds;
    private MatchGroup last;
    private int chain;

    /**
     * @param requiredPrevious {@code k}, previous queries that must agree
     * @param gapSeconds       largest gap between consecutive chosen groups, seconds
     */
    TemporalConsistency(int requiredPrevious, double gapSeconds) {
        this.requiredPrevious = requiredPrevious;
        this.gapSeconds = gapSeconds;
    }

    /** Forgets the chain (a new query sequence starts). */
    void reset() {
        last = null;
        chain = 0;
    }

    /**
     * @param chosen     the query's chosen group
     * @param weakReason why the query's normalisation is unreliable, or empty when it is sound
     * @param minScore   the threshold groups had to reach, for the message
     */
    Consistency update(Optional<MatchGroup> chosen, Optional<String> weakReason, double minScore) {
        if (weakReason.isPresent()) {
            return new Consistency(ConsistencyState.WEAK_PREDECESSOR, chain, weakReason.get());
        }
        if (chosen.isEmpty()) {
            String was = chain > 0 ? "; chain of " + chain + " broken" : "";
            reset();
            return new Consistency(ConsistencyState.NO_GROUP, 0,
                    "no candidate reached normalised score " + minScore + was);
        }
        MatchGroup group = chosen.get();
        String how;
        if (last == null) {
            chain = 1;
            how = "chain started";
        } else if (last.gapSeconds(group) <= gapSeconds) {
            chain++;
            how = "group lies " + fmt(last.gapSeconds(group)) + " s from the previous one";
        } else {
            how = "chain restarted: " + (last.sequenceId() != group.sequenceId()
                    ? "group is in sequence " + group.sequenceId() + ", the previous one in " + last.sequenceId()
                    : "group is " + fmt(last.gapSeconds(group)) + " s from the previous one (allowed " + gapSeconds
                    + " s)");
            chain = 1;
        }
        last = group;
        if (chain > requiredPrevious) {
            return new Consistency(ConsistencyState.CONFIRMED, chain,
                    how + "; " + chain + " consecutive queries agree (needed " + (requiredPrevious + 1) + ")");
        }
        return new Consistency(ConsistencyState.GATHERING, chain,
                how + "; " + chain + " of " + (requiredPrevious + 1) + " consecutive queries agree");
    }

    private static String fmt(double seconds) {
        return String.format(Locale.ROOT, "%.3f", seconds);
    }
}
