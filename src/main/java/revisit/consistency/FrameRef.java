package revisit.consistency;

/**
 * One end of a closure: a frame of a sequence and its time.
 *
 * @param sequence    name of the sequence (e.g. the folder or video it came from), not blank
 * @param frame       frame index within the sequence, >= 0
 * @param timeSeconds time stamp of the frame in the sequence's clock, seconds (the clock of its odometry, if any)
 */
public record FrameRef(String sequence, int frame, double timeSeconds) {

    public FrameRef {
        if (sequence == null || sequence.isBlank()) {
            throw new IllegalArgumentException("sequence name must not be blank");
        }
        if (frame < 0) {
            throw new IllegalArgumentException("frame index must be >= 0, was " + frame);
        }
        if (!Double.isFinite(timeSeconds)) {
            throw new IllegalArgumentException("frame time must be finite, was " + timeSeconds);
        }
    }
}
