package revisit.evaluation;

/**
 * How detections are judged.
 *
 * @param frameTolerance      a reported match counts as true when it lies within this many frames of a labelled
 *                            match in the same sequence; frames, >= 0, typical 0-5. Default 0 (exact frame):
 *                            pose-derived labels already hold every frame within the distance tolerance.
 * @param acceptanceThreshold the score a verified query needs to be reported, in the pipeline's score unit; the
 *                            scalar metrics (precision, recall, F1, miss reasons) are taken here.
 *                            {@code -Infinity} reports every verified query. Default {@code -Infinity}.
 */
public record EvaluationConfig(int frameTolerance, double acceptanceThreshold) {

    public EvaluationConfig {
        if (frameTolerance < 0) {
            throw new IllegalArgumentException("frameTolerance must be >= 0, was " + frameTolerance);
        }
        if (Double.isNaN(acceptanceThreshold)) {
            throw new IllegalArgumentException("acceptanceThreshold must not be NaN");
        }
    }

    /** Defaults: exact frames, every verified query reported. */
    public static EvaluationConfig defaults() {
        return new EvaluationConfig(0, Double.NEGATIVE_INFINITY);
    }

    /** Copy with another frame tolerance, frames. */
    public EvaluationConfig withFrameTolerance(int value) {
        return new EvaluationConfig(value, acceptanceThreshold);
    }

    /** Copy with another acceptance threshold, score units. */
    public EvaluationConfig withAcceptanceThreshold(double value) {
        return new EvaluationConfig(frameTolerance, value);
    }
}
