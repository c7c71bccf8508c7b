package revisit.evaluation;

/**
 * Counts and rates at one acceptance threshold.
 *
 * <p>precision = TP / (TP + FP), taken as 1 when nothing is reported (no false revisit was made; our convention,
 * so that "recall at 100% precision" is defined and is 0 for a detector that must stay silent);
 * recall = TP / P, taken as 0 when there are no positives; F1 = 2 precision recall / (precision + recall), 0 when
 * both are 0.
 *
 * @param threshold      acceptance threshold on the score; {@code +Infinity} means nothing is reported
 * @param truePositives  reported queries whose match is a labelled revisit
 * @param falsePositives reported queries whose match is not
 * @param positives      positive queries (non-empty labelled set), reported or not
 */
public record OperatingPoint(double threshold, int truePositives, int falsePositives, int positives) {

    public OperatingPoint {
        if (Double.isNaN(threshold)) {
            throw new IllegalArgumentException("threshold must not be NaN");
        }
        if (truePositives < 0 || falsePositives < 0 || positives < truePositives) {
            throw new IllegalArgumentException("need 0 <= TP <= P and FP >= 0, were TP=" + truePositives + " FP="
                    + falsePositives + " P=" + positives);
        }
    }

    /** The point where nothing is reported. */
    public static OperatingPoint nothingReported(int positives) {
        return new OperatingPoint(Double.POSITIVE_INFINITY, 0, 0, positives);
    }

    /** Number of reported queries. */
    public int reported() {
        return truePositives + falsePositives;
    }

    /** Positive queries without a true detection. */
    public int falseNegatives() {
        return positives - truePositives;
    }

    /** TP / (TP + FP); 1 when nothing is reported. */
    public double precision() {
        return reported() == 0 ? 1.0 : (double) truePositives / reported();
    }

    /** TP / P; 0 when there are no positives. */
    public double recall() {
        return positives == 0 ? 0.0 : (double) truePositives / positives;
    }

    /** Harmonic mean of precision and recall; 0 when both are 0. */
    public double f1() {
        double p = precision();
        double r = recall();
        return p + r == 0 ? 0.0 : 2 * p * r / (p + r);
    }
}
