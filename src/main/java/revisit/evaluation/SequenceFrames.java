package revisit.evaluation;

import java.util.Arrays;

/**
 * The frame times of one sequence, in frame order.
 *
 * @param sequenceId  name of the sequence (see {@link FrameKey})
 * @param timesSeconds time of each frame, seconds, strictly increasing; copied on the way in and out
 */
public record SequenceFrames(String sequenceId, double[] timesSeconds) {

    public SequenceFrames {
        FrameKey.requireValidSequenceId(sequenceId);
        if (timesSeconds == null || timesSeconds.length == 0) {
            throw new IllegalArgumentException("sequence '" + sequenceId + "' has no frames");
        }
        timesSeconds = timesSeconds.clone();
        for (int i = 0; i < timesSeconds.length; i++) {
            if (!Double.isFinite(timesSeconds[i])) {
                throw new IllegalArgumentException("sequence '" + sequenceId + "' frame " + i + ": time is not finite");
            }
            if (i > 0 && timesSeconds[i] <= timesSeconds[i - 1]) {
                throw new IllegalArgumentException("sequence '" + sequenceId + "' frame " + i + ": time "
                        + timesSeconds[i] + " does not increase");
            }
        }
    }

    /**
     * A sequence of {@code count} frames at a constant rate starting at time 0.
     *
     * @param framesPerSecond frame rate, frames per second, positive
     */
    public static SequenceFrames uniform(String sequenceId, int count, double framesPerSecond) {
        if (count <= 0 || !(framesPerSecond > 0) || Double.isInfinite(framesPerSecond)) {
            throw new IllegalArgumentException("need count > 0 and a positive finite frame rate, were " + count
                    + ", " + framesPerSecond);
        }
        double[] t = new double[count];
        for (int i = 0; i < count; i++) {
            t[i] = i / framesPerSecond;
        }
        return new SequenceFrames(sequenceId, t);
    }

    @Override
    public double[] timesSeconds() {
        return timesSeconds.clone();
    }

    /** Number of frames. */
    public int size() {
        return timesSeconds.length;
    }

    /** Time of one frame, seconds. */
    public double timeOf(int frame) {
        return timesSeconds[frame];
    }

    /** Median gap between consecutive frames, seconds; 0 for a single frame. */
    public double medianIntervalSeconds() {
        if (timesSeconds.length < 2) {
            return 0;
        }
        double[] gaps = new double[timesSeconds.length - 1];
        for (int i = 0; i < gaps.length; i++) {
            gaps[i] = timesSeconds[i + 1] - timesSeconds[i];
        }
        Arrays.sort(gaps);
        return gaps[gaps.length / 2];
    }

    /** Index of the frame whose time is nearest to {@code timeSeconds} (the earlier one on a tie). */
    public int nearestFrame(double timeSeconds) {
        int i = Arrays.binarySearch(timesSeconds, timeSeconds);
        if (i >= 0) {
            return i;
        }
        int after = -i - 1;
        if (after == 0) {
            return 0;
        }
        if (after == timesSeconds.length) {
            return timesSeconds.length - 1;
        }
        return timeSeconds - timesSeconds[after - 1] <= timesSeconds[after] - timeSeconds ? after - 1 : after;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SequenceFrames s && s.sequenceId.equals(sequenceId)
                && Arrays.equals(s.timesSeconds, timesSeconds);
    }

    @Override
    public int hashCode() {
        return 31 * sequenceId.hashCode() + Arrays.hashCode(timesSeconds);
    }

    @Override
    public String toString() {
        return "SequenceFrames[" + sequenceId + ", " + timesSeconds.length + " frames]";
    }
}
