package revisit.verification;

/**
 * Geometric robust information criterion (GRIC) of each candidate model on all putative matches; lower is
 * better, NaN when the model was not tried. See {@link ModelSelection}.
 *
 * @param epipolar   essential (calibrated) or fundamental (uncalibrated) model
 * @param homography general homography
 * @param rotation   pure rotation (calibrated only)
 */
public record ModelScores(double epipolar, double homography, double rotation) {

    /** Nothing scored. */
    public static ModelScores none() {
        return new ModelScores(Double.NaN, Double.NaN, Double.NaN);
    }
}
