package revisit.io;

import boofcv.struct.image.GrayU8;
import org.jcodec.common.model.Picture;

import java.util.ArrayDeque;
import java.util.Comparator;
import java.util.Optional;
import java.util.PriorityQueue;

/**
 * Puts frames decoded in decode order back into presentation order. With B-frames an H.264 decoder outputs
 * pictures out of order (times 0.000, 0.100, 0.067, 0.033 ... in the shared test videos); holding up to
 * {@link #DEPTH} frames and releasing the earliest is enough for any conforming stream, since a decoder never
 * needs more than 16 frames of reordering (ITU-T H.264 Annex A, MaxDpbFrames at most 16). A frame whose time is
 * not after the one released before it becomes a failure rather than going backwards.
 */
final class DisplayOrder {

    /** Frames held before the earliest is released. */
    static final int DEPTH = 16;

    /** A decoded frame or a decoding failure, at its presentation time. */
    sealed interface Decoded permits Image, Failure {
        double timeSeconds();
    }

    /** A frame that decoded. */
    record Image(double timeSeconds, GrayU8 image) implements Decoded {
    }

    /** A frame that failed to decode, with the reason on one line. */
    record Failure(double timeSeconds, String reason) implements Decoded {
    }

    private final PriorityQueue<Decoded> queue =
            new PriorityQueue<>(DEPTH + 2, Comparator.comparingDouble(Decoded::timeSeconds));
    private final ArrayDeque<GrayU8> spare = new ArrayDeque<>();
    private double lastReleased = Double.NEGATIVE_INFINITY;
    private boolean ended;

    /** Adds a decoded picture; its luma is copied, so the decoder may reuse its buffer. */
    void add(double timeSeconds, Picture picture) {
        GrayU8 image = spare.isEmpty() ? new GrayU8(LumaPlane.width(picture), LumaPlane.height(picture))
                : spare.poll();
        LumaPlane.copy(picture, image);
        queue.add(new Image(timeSeconds, image));
    }

    /** Adds a frame that could not be decoded. */
    void addFailure(double timeSeconds, String reason) {
        queue.add(new Failure(timeSeconds, reason));
    }

    /** No more frames will be added: release all that are held. */
    void endOfStream() {
        ended = true;
    }

    /** True when {@link #poll()} may release a frame. */
    boolean ready() {
        return queue.size() > DEPTH || (ended && !queue.isEmpty());
    }

    /** The earliest frame held, without releasing it. */
    Optional<Decoded> peek() {
        return Optional.ofNullable(queue.peek());
    }

    /** Releases the earliest frame held, or empty when none is held. */
    Optional<Decoded> poll() {
        Decoded next = queue.poll();
        if (next == null) {
            return Optional.empty();
        }
        if (!(next.timeSeconds() > lastReleased)) {
            recycle(next);
            next = new Failure(next.timeSeconds(), "presentation time " + next.timeSeconds()
                    + " s is not after the previous frame's " + lastReleased + " s");
        }
        lastReleased = next.timeSeconds();
        return Optional.of(next);
    }

    /** Gives the image of a frame that was not delivered back for reuse. */
    void recycle(Decoded frame) {
        if (frame instanceof Image image) {
            spare.add(image.image());
        }
    }
}
