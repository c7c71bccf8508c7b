package revisit.io;

import java.util.Optional;
import java.util.OptionalInt;

/**
 * A sequence of grey frames read one at a time: an image folder, a frame-list file or a video (see
 * {@link FrameSources#open}). Not thread-safe; frames come in increasing time order.
 */
public interface FrameSource extends AutoCloseable {

    /**
     * Number of frames {@link #next()} will deliver or report as bad, after the start time, stride and maximum
     * are applied; empty when it is only known by reading the whole source.
     */
    OptionalInt frameCount();

    /** One line for logs and reports: the kind of source, its path and what it holds. */
    String describe();

    /**
     * Reads the next frame.
     *
     * @return the frame, or empty after the last one
     * @throws BadFrameException when this frame cannot be used; calling again continues with the next frame
     * @throws BadInputException when the source as a whole cannot be read further
     */
    Optional<Frame> next();

    /**
     * The next frame with its pixels possibly still to be decoded ({@link PendingFrame#decode()}, callable on
     * another thread). Sources that must decode in order (video) decode here; image folders and lists defer it.
     *
     * @return the frame, or empty after the last one
     * @throws BadFrameException when this frame is known to be unusable already
     * @throws BadInputException when the source as a whole cannot be read further
     */
    default Optional<PendingFrame> nextPending() {
        return next().map(PendingFrame::of);
    }

    /** Releases files and decoders; no exception beyond unchecked ones. */
    @Override
    void close();
}
