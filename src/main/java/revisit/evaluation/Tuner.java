package revisit.evaluation;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * Sweeps a parameter space: runs the detector once per setting through a user-supplied function, evaluates the
 * outcomes against labels, and keeps the setting with the highest recall at the target precision (ties broken by
 * F1 at that point, then by average precision, then by sweep order). The acceptance threshold is not a sweep
 * parameter: for each setting the curve gives the best threshold directly.
 */
public final class Tuner {

    private Tuner() {
    }

    /**
     * Runs a sweep and hands the winner to {@code writer} (e.g. to write the scan's config file).
     *
     * @param space  parameters and ranges
     * @param config grid or random, seed, target precision
     * @param run    runs the detector with one setting and returns one outcome per queried frame
     * @param labels labels of the frames {@code run} queries
     * @param writer receives the chosen setting once, after the sweep
     */
    public static TuningResult tune(ParameterSpace space, SweepConfig config,
                                    Function<ParameterSetting, List<QueryOutcome>> run, RevisitLabels labels,
                                    Consumer<TunedSetting> writer) {
        List<ParameterSetting> settings = config.mode() == SweepConfig.Mode.GRID ? space.grid(config.maxTrials())
                : space.sample(Math.min(config.samples(), config.maxTrials()), config.seed());
        List<Trial> trials = new ArrayList<>(settings.size());
        Trial best = null;
        List<QueryOutcome> bestOutcomes = List.of();
        EvaluationConfig everyVerified = new EvaluationConfig(config.frameTolerance(), Double.NEGATIVE_INFINITY);
        for (ParameterSetting s : settings) {
            List<QueryOutcome> outcomes = outcomesOf(run, s);
            EvaluationResult r = Evaluator.evaluate(outcomes, labels, everyVerified);
            Trial t = new Trial(trials.size(), s, r.curve().atPrecision(config.targetPrecision()),
                    r.averagePrecision());
            trials.add(t);
            if (best == null || t.beats(best)) {
                best = t;
                bestOutcomes = outcomes;
            }
        }
        TunedSetting tuned = new TunedSetting(best.setting(), best.chosen().threshold());
        EvaluationResult atChosen = Evaluator.evaluate(bestOutcomes, labels,
                everyVerified.withAcceptanceThreshold(tuned.acceptanceThreshold()));
        writer.accept(tuned);
        return new TuningResult(trials, best, tuned, atChosen);
    }

    /**
     * Tunes on one scan and tests the chosen setting on another (different sequences).
     *
     * @param runTune    runs the detector on the tuning sequences
     * @param tuneLabels labels of the tuning sequences
     * @param runTest    runs the detector on the held-out sequences
     * @param testLabels labels of the held-out sequences
     */
    public static HeldOutResult tuneAndTest(ParameterSpace space, SweepConfig config,
                                            Function<ParameterSetting, List<QueryOutcome>> runTune,
                                            RevisitLabels tuneLabels,
                                            Function<ParameterSetting, List<QueryOutcome>> runTest,
                                            RevisitLabels testLabels, Consumer<TunedSetting> writer) {
        TuningResult tuning = tune(space, config, runTune, tuneLabels, writer);
        EvaluationResult heldOut = Evaluator.evaluate(outcomesOf(runTest, tuning.chosen().setting()), testLabels,
                new EvaluationConfig(config.frameTolerance(), tuning.chosen().acceptanceThreshold()));
        return new HeldOutResult(tuning, heldOut);
    }

    /**
     * Tunes and tests within one multi-sequence scan: queries from {@code tuneSequences} are scored while tuning,
     * queries from all other sequences in the held-out test (matches may lie in any sequence). The chosen setting
     * is run once more for the test.
     */
    public static HeldOutResult tuneAndTest(ParameterSpace space, SweepConfig config,
                                            Function<ParameterSetting, List<QueryOutcome>> run, RevisitLabels labels,
                                            Set<String> tuneSequences, Consumer<TunedSetting> writer) {
        Set<String> testSequences = new HashSet<>(labels.timeline().sequenceIds());
        testSequences.removeAll(tuneSequences);
        if (testSequences.isEmpty() || testSequences.size() == labels.timeline().sequenceIds().size()) {
            throw new IllegalArgumentException("tuning sequences " + tuneSequences + " must be a proper, non-empty"
                    + " subset of the scan's sequences " + labels.timeline().sequenceIds());
        }
        return tuneAndTest(space, config, s -> onlyQueriesIn(run.apply(s), tuneSequences),
                labels.restrictedToQueriesIn(tuneSequences), s -> onlyQueriesIn(run.apply(s), testSequences),
                labels.restrictedToQueriesIn(testSequences), writer);
    }

    /** The outcomes whose query lies in one of the given sequences. */
    public static List<QueryOutcome> onlyQueriesIn(List<QueryOutcome> outcomes, Set<String> sequenceIds) {
        List<QueryOutcome> out = new ArrayList<>();
        for (QueryOutcome o : outcomes) {
            if (sequenceIds.contains(o.query().sequenceId())) {
                out.add(o);
            }
        }
        return out;
    }

    private static List<QueryOutcome> outcomesOf(Function<ParameterSetting, List<QueryOutcome>> run,
                                                 ParameterSetting s) {
        List<QueryOutcome> outcomes = run.apply(s);
        if (outcomes == null) {
            throw new IllegalStateException("the run function returned no outcome list for setting " + s);
        }
        return outcomes;
    }
}
