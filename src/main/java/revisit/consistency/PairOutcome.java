package revisit.consistency;

import java.util.Optional;

/**
 * The test of one pair of closures.
 *
 * @param firstId           id of the first closure
 * @param secondId          id of the second closure
 * @param state             consistent, conflicting or untested
 * @param reason            why untested (present exactly when state is UNTESTED)
 * @param distanceSquared   squared Mahalanobis distance of the loop error (0 when untested)
 * @param degreesOfFreedom  6 for two metric closures, 5 for metric with monocular, 4 for two monocular ones
 *                          (rotation 3 + direction 2, minus 1 for the fitted scale), 3 when a monocular closure
 *                          has no direction, 0 when untested
 * @param threshold         chi-square gate the distance was compared with (0 when untested)
 */
public record PairOutcome(String firstId, String secondId, PairState state, Optional<UncheckedReason> reason,
                          double distanceSquared, int degreesOfFreedom, double threshold) {

    public PairOutcome {
        if (reason.isPresent() != (state == PairState.UNTESTED)) {
            throw new IllegalArgumentException("a reason goes with UNTESTED and only then, state was " + state);
        }
    }

    static PairOutcome untested(String firstId, String secondId, UncheckedReason reason) {
        return new PairOutcome(firstId, secondId, PairState.UNTESTED, Optional.of(reason), 0, 0, 0);
    }

    static PairOutcome tested(String firstId, String secondId, double distanceSquared, int dof, double threshold) {
        PairState state = distanceSquared <= threshold ? PairState.CONSISTENT : PairState.CONFLICTING;
        return new PairOutcome(firstId, secondId, state, Optional.empty(), distanceSquared, dof, threshold);
    }
}
