package revisit.evaluation;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import revisit.io.BadInputException;

/**
 * Scores query outcomes against labels (definitions in docs/EVALUATION.md).
 *
 * <p>A query is positive when its labelled set is non-empty. A reported query is a true positive when its match
 * is a labelled revisit (within the frame tolerance), otherwise a false positive, whether or not the query is
 * positive. Recall divides true positives by all positive queries, including positives the pipeline never
 * returned an outcome for.
 */
public final class Evaluator {

    private Evaluator() {
    }

    /**
     * Evaluates outcomes.
     *
     * @param outcomes one per queried frame (order free; no frame twice)
     * @param labels   labels over the scan's frames
     * @param config   frame tolerance and acceptance threshold
     * @throws BadInputException when an outcome names a frame the labels do not cover
     */
    public static EvaluationResult evaluate(List<QueryOutcome> outcomes, RevisitLabels labels,
                                            EvaluationConfig config) {
        BitSet seen = new BitSet(labels.timeline().size());
        List<JudgedDetection> verified = new ArrayList<>();
        Map<MissReason, Integer> misses = new EnumMap<>(MissReason.class);
        int tp = 0;
        int fp = 0;
        for (QueryOutcome o : outcomes) {
            int q = globalIndexOf(labels, o.query());
            if (seen.get(q)) {
                throw new IllegalArgumentException("two outcomes for query " + o.query());
            }
            seen.set(q);
            boolean positive = labels.isPositive(o.query());
            boolean correct = o.candidate().isPresent()
                    && labels.isTrueMatch(o.query(), o.candidate().get().match(), config.frameTolerance());
            if (o.verified()) {
                verified.add(new JudgedDetection(o.query(), o.candidate().get().match(),
                        o.candidate().get().score(), correct, positive));
            }
            boolean reported = o.reportedAt(config.acceptanceThreshold());
            tp += reported && correct ? 1 : 0;
            fp += reported && !correct ? 1 : 0;
            if (positive && !(reported && correct)) {
                misses.merge(reported ? MissReason.WRONG_MATCH : MissReason.unreportedAt(o.stage()), 1, Integer::sum);
            }
        }
        int positives = labels.positiveCount();
        int notQueried = positives - tp - misses.values().stream().mapToInt(Integer::intValue).sum();
        misses.put(MissReason.NOT_QUERIED, notQueried);
        PrecisionRecallCurve curve = curve(verified, positives);
        return new EvaluationResult(config, outcomes.size(), positives,
                new OperatingPoint(config.acceptanceThreshold(), tp, fp, positives), curve.atPrecision(1.0),
                curve.atPrecision(0.95), curve.averagePrecision(), curve, misses, verified);
    }

    /** The curve over the distinct scores of verified queries, highest first, ties entering together. */
    static PrecisionRecallCurve curve(List<JudgedDetection> verified, int positives) {
        List<JudgedDetection> ranked = new ArrayList<>(verified);
        ranked.sort(Comparator.comparingDouble(JudgedDetection::score).reversed());
        List<OperatingPoint> points = new ArrayList<>();
        int tp = 0;
        int fp = 0;
        for (int i = 0; i < ranked.size(); i++) {
            JudgedDetection d = ranked.get(i);
            tp += d.correct() ? 1 : 0;
            fp += d.correct() ? 0 : 1;
            if (i + 1 == ranked.size() || ranked.get(i + 1).score() != d.score()) {
                points.add(new OperatingPoint(d.score(), tp, fp, positives));
            }
        }
        return new PrecisionRecallCurve(points, positives);
    }

    private static int globalIndexOf(RevisitLabels labels, FrameKey query) {
        if (!labels.timeline().contains(query)) {
            throw new BadInputException("outcome for frame " + query + " but the labels cover only sequences "
                    + labels.timeline().sequenceIds() + " with " + labels.timeline().size()
                    + " frames; check the labels belong to this scan");
        }
        return labels.timeline().globalIndex(query);
    }
}
