package revisit.index;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Answer to one query.
 *
 * @param candidates       best frames by score, best first, at most {@link IndexConfig#maxCandidates()}; none lies
 *                         inside the exclusion window
 * @param groups           groups of the candidates reaching {@link IndexConfig#minNormalisedScore()}, best (highest
 *                         summed score) first; the first is the query's chosen group
 * @param predecessorScore {@code s(q, q_prev)} against the previous query of the same sequence, empty for the first
 * @param normaliser       denominator used for the normalised scores: predecessor score, floored at
 *                         {@link IndexConfig#minPredecessorScore()}
 * @param stopWordWeight   the query's weight on its stop words (see {@link IndexConfig#maxWordFrameFraction()}),
 *                         which no score of this query includes; 0 when every posting list was walked
 * @param consistency      temporal consistency state with its reason
 */
public record QueryResult(List<Candidate> candidates, List<MatchGroup> groups, OptionalDouble predecessorScore,
                          double normaliser, double stopWordWeight, Consistency consistency) {

    public QueryResult {
        candidates = List.copyOf(candidates);
        groups = List.copyOf(groups);
    }

    /** The best group, if any candidate reached the threshold. */
    public Optional<MatchGroup> chosenGroup() {
        return groups.isEmpty() ? Optional.empty() : Optional.of(groups.get(0));
    }

    /** The chosen group's best frame when the consistency check confirmed it: the revisit to verify. */
    public Optional<Candidate> confirmedMatch() {
        return consistency.state() == ConsistencyState.CONFIRMED
                ? chosenGroup().map(MatchGroup::best) : Optional.empty();
    }
}
