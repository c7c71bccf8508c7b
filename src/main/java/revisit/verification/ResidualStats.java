package revisit.verification;

import java.util.Arrays;

/**
 * Error statistics of the inliers under the final model: Sampson distance for epipolar models and homographies,
 * image transfer distance for a pure rotation.
 *
 * @param medianPx median absolute error, pixels
 * @param rmsPx    root mean square error, pixels
 * @param count    number of residuals summarised
 */
public record ResidualStats(double medianPx, double rmsPx, int count) {

    /** No residuals. */
    public static ResidualStats none() {
        return new ResidualStats(Double.NaN, Double.NaN, 0);
    }

    /** Summarises absolute errors (pixels); the array is not modified. */
    public static ResidualStats of(double[] errorsPx, int count) {
        if (count == 0) {
            return none();
        }
        double[] sorted = Arrays.copyOf(errorsPx, count);
        double sumSq = 0;
        for (int i = 0; i < count; i++) {
            sorted[i] = Math.abs(sorted[i]);
            sumSq += sorted[i] * sorted[i];
        }
        Arrays.sort(sorted);
        double median = count % 2 == 1 ? sorted[count / 2] : 0.5 * (sorted[count / 2 - 1] + sorted[count / 2]);
        return new ResidualStats(median, Math.sqrt(sumSq / count), count);
    }
}
