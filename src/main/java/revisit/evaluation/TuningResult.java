package revisit.evaluation;

import java.util.List;

/**
 * Every trial of a sweep and the winner.
 *
 * @param trials         all trials in sweep order
 * @param best           the winning trial
 * @param chosen         the winner's setting and acceptance threshold (what was handed to the writer)
 * @param bestEvaluation full evaluation of the winner on the tuning data, at the chosen threshold
 */
public record TuningResult(List<Trial> trials, Trial best, TunedSetting chosen, EvaluationResult bestEvaluation) {

    public TuningResult {
        trials = List.copyOf(trials);
    }
}
