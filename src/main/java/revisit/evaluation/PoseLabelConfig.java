package revisit.evaluation;

/**
 * How labels are derived from ground-truth poses: two frames show the same place when their camera centres are
 * close and, optionally, they look in similar directions.
 *
 * @param maxDistance        largest distance between camera centres, in the trajectory's unit (metres for most
 *                           data); typical 0.5-1 indoors, 2-10 outdoors. Default 1.0 (common practice for
 *                           hand-held and indoor robot data; raise it for vehicles).
 * @param maxViewAngleDegrees largest angle between the two viewing directions (camera z axes), degrees, in
 *                           (0, 180]; 180 switches the heading test off. Typical 30-60. Default 180 (off). The
 *                           viewing direction is used rather than the full rotation so that a camera rolled about
 *                           its axis (which still sees the same place) still counts.
 * @param window             recent frames never labelled as revisits: the detector's exclusion window
 * @param maxPairs           guard on the number of labelled pairs (a camera resting for a long time produces
 *                           quadratically many); default {@link LabelBuilder#DEFAULT_MAX_PAIRS}
 */
public record PoseLabelConfig(double maxDistance, double maxViewAngleDegrees, ExclusionWindow window, long maxPairs) {

    public PoseLabelConfig {
        if (!(maxDistance > 0) || Double.isInfinite(maxDistance)) {
            throw new IllegalArgumentException("maxDistance must be positive and finite, was " + maxDistance);
        }
        if (!(maxViewAngleDegrees > 0 && maxViewAngleDegrees <= 180)) {
            throw new IllegalArgumentException("maxViewAngleDegrees must be in (0, 180], was " + maxViewAngleDegrees);
        }
        if (window == null) {
            throw new IllegalArgumentException("window must not be null");
        }
        if (maxPairs < 1) {
            throw new IllegalArgumentException("maxPairs must be >= 1, was " + maxPairs);
        }
    }

    /** Defaults: 1.0 unit, no heading test, the default exclusion window. */
    public static PoseLabelConfig defaults() {
        return new PoseLabelConfig(1.0, 180, ExclusionWindow.defaults(), LabelBuilder.DEFAULT_MAX_PAIRS);
    }

    /** Copy with another distance tolerance. */
    public PoseLabelConfig withMaxDistance(double value) {
        return new PoseLabelConfig(value, maxViewAngleDegrees, window, maxPairs);
    }

    /** Copy with another heading tolerance, degrees (180 = off). */
    public PoseLabelConfig withMaxViewAngleDegrees(double value) {
        return new PoseLabelConfig(maxDistance, value, window, maxPairs);
    }

    /** Copy with another exclusion window. */
    public PoseLabelConfig withWindow(ExclusionWindow value) {
        return new PoseLabelConfig(maxDistance, maxViewAngleDegrees, value, maxPairs);
    }

    /** Copy with another pair cap. */
    public PoseLabelConfig withMaxPairs(long value) {
        return new PoseLabelConfig(maxDistance, maxViewAngleDegrees, window, value);
    }
}
