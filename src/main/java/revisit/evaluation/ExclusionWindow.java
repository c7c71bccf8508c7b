package revisit.evaluation;

/**
 * The recent past of a query that may not be reported as a revisit: frames just before the query look alike
 * because the camera has barely moved, so matching them proves nothing. The same window is applied to detections
 * and to labels, so that the labels never ask for a revisit the detector is not allowed to report.
 *
 * <p>For a query frame q and an earlier frame m of the same sequence, m is excluded when
 * {@code q - m <= frames} or {@code t(q) - t(m) <= seconds}. Frames of other sequences are never excluded.
 * A value of 0 switches that half of the window off (times strictly increase, so a gap is never 0).
 *
 * @param seconds time window, seconds; 0 = off; typical 1-30 s. Default 0 (the frame window is used instead).
 * @param frames  frame window, frames; 0 = off; typical 10-300. Default 30, about one second at 30 frames per
 *                second (common practice: skip at least the last second of frames).
 */
public record ExclusionWindow(double seconds, int frames) {

    public ExclusionWindow {
        if (!(seconds >= 0) || Double.isInfinite(seconds)) {
            throw new IllegalArgumentException("exclusion window seconds must be >= 0 and finite, was " + seconds);
        }
        if (frames < 0) {
            throw new IllegalArgumentException("exclusion window frames must be >= 0, was " + frames);
        }
    }

    /** Defaults: 30 frames, no time window. */
    public static ExclusionWindow defaults() {
        return new ExclusionWindow(0, 30);
    }

    /** No exclusion at all (every earlier frame may be matched). */
    public static ExclusionWindow none() {
        return new ExclusionWindow(0, 0);
    }

    /** Copy with another time window, seconds. */
    public ExclusionWindow withSeconds(double newSeconds) {
        return new ExclusionWindow(newSeconds, frames);
    }

    /** Copy with another frame window, frames. */
    public ExclusionWindow withFrames(int newFrames) {
        return new ExclusionWindow(seconds, newFrames);
    }

    /**
     * Whether an earlier frame of the query's own sequence is too recent to be reported.
     *
     * @param frameGap       query frame number minus candidate frame number, frames (at least 1)
     * @param timeGapSeconds query time minus candidate time, seconds (positive)
     * @return true when the candidate lies inside the window
     */
    public boolean excludes(int frameGap, double timeGapSeconds) {
        return (frames > 0 && frameGap <= frames) || (seconds > 0 && timeGapSeconds <= seconds);
    }
}
