package revisit.evaluation;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Everything measured for one set of outcomes against one set of labels.
 *
 * @param config           how detections were judged
 * @param queries          number of outcomes (queried frames)
 * @param positives        positive queries in the labels (including ones without an outcome)
 * @param atThreshold      counts and rates at the configured acceptance threshold
 * @param atFullPrecision  best operating point with precision 1 (the headline: recall at 100% precision)
 * @param at95Precision    best operating point with precision >= 0.95
 * @param averagePrecision average precision over the whole curve (IIR section 8.4)
 * @param curve            the precision-recall curve over the acceptance threshold
 * @param missReasons      for each reason, positive queries lost there at the configured threshold (every reason
 *                         present, zero when none; the counts add up to the false negatives)
 * @param detections       every verified query with its verdict
 */
public record EvaluationResult(EvaluationConfig config, int queries, int positives, OperatingPoint atThreshold,
                               OperatingPoint atFullPrecision, OperatingPoint at95Precision, double averagePrecision,
                               PrecisionRecallCurve curve, Map<MissReason, Integer> missReasons,
                               List<JudgedDetection> detections) {

    public EvaluationResult {
        EnumMap<MissReason, Integer> copy = new EnumMap<>(MissReason.class);
        for (MissReason r : MissReason.values()) {
            copy.put(r, missReasons.getOrDefault(r, 0));
        }
        missReasons = Collections.unmodifiableMap(copy);
        detections = List.copyOf(detections);
    }
}
