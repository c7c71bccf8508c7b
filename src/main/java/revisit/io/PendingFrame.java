package revisit.io;

import boofcv.struct.image.GrayU8;
import java.util.Objects;

/**
 * A frame whose position is known but whose pixels may not be decoded yet, so a caller can decode frames on
 * worker threads while keeping their order. {@link #decode()} may be called from any thread, once.
 *
 * @param index       as {@link Frame#index()}
 * @param timeSeconds as {@link Frame#timeSeconds()}
 * @param name        as {@link Frame#name()}
 * @param decoder     reads the pixels; throws {@link BadFrameException} when the frame cannot be used
 */
public record PendingFrame(int index, double timeSeconds, String name, Decoder decoder) {

    /** Reads one frame's pixels. */
    @FunctionalInterface
    public interface Decoder {
        /**
         * @return the frame as 8-bit grey
         * @throws BadFrameException when the frame cannot be used
         */
        GrayU8 decode();
    }

    public PendingFrame {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(decoder, "decoder");
    }

    /** A frame that is already decoded. */
    public static PendingFrame of(Frame frame) {
        return new PendingFrame(frame.index(), frame.timeSeconds(), frame.name(), frame::image);
    }

    /**
     * Decodes the frame.
     *
     * @throws BadFrameException when the frame cannot be used
     */
    public Frame decode() {
        return new Frame(index, timeSeconds, name, decoder.decode());
    }
}
