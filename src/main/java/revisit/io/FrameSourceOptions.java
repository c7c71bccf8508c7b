package revisit.io;

/**
 * Which frames of a source to deliver, and the time base of image folders.
 *
 * <p>Selection order: frames before {@code startSeconds} are dropped; of the rest, the 1st, (1+stride)-th,
 * (1+2 stride)-th ... are kept; delivery stops after {@code maxFrames} (bad frames count, since they are reported).
 *
 * @param frameRateHz  frame rate that gives image-folder frames their times ({@code index / frameRateHz}), Hz;
 *                     unused for frame lists and videos, which carry their own times; typical 1..60; default
 *                     30 Hz, the common video rate (common practice)
 * @param stride       keep every {@code stride}-th frame, 1 = all; typical 1..10 (thin out a high-rate log);
 *                     default 1
 * @param maxFrames    deliver at most this many frames, 1..{@link Integer#MAX_VALUE}; default
 *                     {@link Integer#MAX_VALUE} (no limit)
 * @param startSeconds drop frames whose time is below this, seconds, &gt;= 0; default 0 (from the start)
 */
public record FrameSourceOptions(double frameRateHz, int stride, int maxFrames, double startSeconds) {

    public FrameSourceOptions {
        if (!(frameRateHz > 0) || !Double.isFinite(frameRateHz)) {
            throw new IllegalArgumentException("frameRateHz must be a positive finite number, was " + frameRateHz);
        }
        if (stride < 1) {
            throw new IllegalArgumentException("stride must be >= 1, was " + stride);
        }
        if (maxFrames < 1) {
            throw new IllegalArgumentException("maxFrames must be >= 1, was " + maxFrames);
        }
        if (!(startSeconds >= 0) || !Double.isFinite(startSeconds)) {
            throw new IllegalArgumentException("startSeconds must be a finite number >= 0, was " + startSeconds);
        }
    }

    /** All frames from the start, folders at 30 Hz. */
    public static FrameSourceOptions defaults() {
        return new FrameSourceOptions(30.0, 1, Integer.MAX_VALUE, 0.0);
    }

    public FrameSourceOptions withFrameRateHz(double value) {
        return new FrameSourceOptions(value, stride, maxFrames, startSeconds);
    }

    public FrameSourceOptions withStride(int value) {
        return new FrameSourceOptions(frameRateHz, value, maxFrames, startSeconds);
    }

    public FrameSourceOptions withMaxFrames(int value) {
        return new FrameSourceOptions(frameRateHz, stride, value, startSeconds);
    }

    public FrameSourceOptions withStartSeconds(double value) {
        return new FrameSourceOptions(frameRateHz, stride, maxFrames, value);
    }

    /** Keeps a running count of frames seen and taken and decides for each frame in time order. */
    static final class Selector {
        private final FrameSourceOptions options;
        private long seenAfterStart;
        private int taken;

        Selector(FrameSourceOptions options) {
            this.options = options;
        }

        /** True when the frame at {@code timeSeconds} (the next in time order) is to be delivered. */
        boolean accept(double timeSeconds) {
            if (timeSeconds < options.startSeconds || done()) {
                return false;
            }
            boolean keep = seenAfterStart % options.stride == 0;
            seenAfterStart++;
            if (keep) {
                taken++;
            }
            return keep;
        }

        /** True once {@code maxFrames} frames have been accepted. */
        boolean done() {
            return taken >= options.maxFrames;
        }
    }
}
