package revisit.evaluation;

import java.util.List;

/**
 * Precision and recall as the acceptance threshold sweeps down over the distinct scores of verified queries.
 *
 * <p>Point k reports every verified query with score {@code >=} the k-th highest distinct score; tied scores enter
 * together, since no threshold separates them. Definitions follow Manning, Raghavan and Schütze, Introduction to
 * Information Retrieval (Cambridge University Press 2008), chapter 8, with "documents ranked by score" read as
 * "verified queries ranked by score" and "relevant" as "match is a labelled revisit".
 *
 * @param points    operating points, threshold strictly decreasing (may be empty)
 * @param positives number of positive queries
 */
public record PrecisionRecallCurve(List<OperatingPoint> points, int positives) {

    public PrecisionRecallCurve {
        points = List.copyOf(points);
        for (int i = 1; i < points.size(); i++) {
            if (!(points.get(i).threshold() < points.get(i - 1).threshold())) {
                throw new IllegalArgumentException("curve thresholds must strictly decrease");
            }
        }
    }

    /**
     * The operating point with the highest recall among those with precision {@code >= minPrecision} (ties: higher
     * precision, then higher threshold); the nothing-reported point when no threshold reaches that precision.
     *
     * @param minPrecision required precision in [0, 1], e.g. 1.0 for "recall at 100% precision"
     */
    public OperatingPoint atPrecision(double minPrecision) {
        OperatingPoint best = OperatingPoint.nothingReported(positives);
        for (OperatingPoint p : points) {
            if (p.precision() >= minPrecision - 1e-12 && (p.recall() > best.recall()
                    || (p.recall() == best.recall() && p.precision() > best.precision()))) {
                best = p;
            }
        }
        return best;
    }

    /** The operating point of an acceptance threshold: every verified query with score {@code >= threshold}. */
    public OperatingPoint at(double threshold) {
        OperatingPoint found = OperatingPoint.nothingReported(positives);
        for (OperatingPoint p : points) {
            if (p.threshold() >= threshold) {
                found = new OperatingPoint(threshold, p.truePositives(), p.falsePositives(), positives);
            }
        }
        return found;
    }

    /**
     * Average precision (IIR section 8.4): the mean over all positives of the precision at the rank where each is
     * found, a positive never found contributing 0: {@code AP = (1/P) sum_k precision(R_k)}. Tied scores share the
     * precision at the end of their group. 0 when there are no positives.
     */
    public double averagePrecision() {
        if (positives == 0) {
            return 0;
        }
        double sum = 0;
        int previousTp = 0;
        for (OperatingPoint p : points) {
            sum += (p.truePositives() - previousTp) * p.precision();
            previousTp = p.truePositives();
        }
        return sum / positives;
    }

    /**
     * Interpolated precision (IIR section 8.4): the highest precision at any recall {@code >= recall};
     * 0 when no point reaches that recall.
     */
    public double interpolatedPrecision(double recall) {
        double best = 0;
        for (OperatingPoint p : points) {
            if (p.recall() >= recall - 1e-12) {
                best = Math.max(best, p.precision());
            }
        }
        return best;
    }

    /** Eleven-point interpolated average precision (IIR section 8.4): mean of interpolated precision at 0, 0.1..1. */
    public double elevenPointAveragePrecision() {
        double sum = 0;
        for (int i = 0; i <= 10; i++) {
            sum += interpolatedPrecision(i / 10.0);
        }
        return sum / 11;
    }
}
