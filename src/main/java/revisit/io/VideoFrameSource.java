package revisit.io;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Frames of an MP4/MOV video with H.264 video (Baseline, Main or High profile, 8-bit 4:2:0, progressive), decoded
 * by jcodec ({@link H264Track}). The grey image is the decoder's luma plane (Y as coded, no range expansion),
 * cropped to the picture size; times are the container's presentation times in seconds. A {@link DisplayOrder}
 * buffer turns decode order into presentation order. Every frame is decoded (later frames depend on earlier
 * ones), so a start time or stride saves only the copy, not the decoding.
 */
final class VideoFrameSource implements FrameSource {

    private final Path file;
    private final String fileName;
    private final H264Track track;
    private final DisplayOrder order = new DisplayOrder();
    private final FrameSourceOptions.Selector selector;
    private final OptionalInt frameCount;
    private final String description;
    private int nextIndex;
    private boolean endOfStream;
    private Optional<BadInputException> readFailure = Optional.empty();

    private VideoFrameSource(Path file, H264Track track, FrameSourceOptions options) {
        this.file = file;
        this.fileName = String.valueOf(file.getFileName());
        this.track = track;
        this.selector = new FrameSourceOptions.Selector(options);
        int total = track.totalFrames();
        this.frameCount = options.startSeconds() > 0 || total <= 0 ? OptionalInt.empty()
                : OptionalInt.of((int) Math.min(options.maxFrames(),
                (total + options.stride() - 1L) / options.stride()));
        this.description = "video " + file + ": " + total + " frames, "
                + String.format(Locale.ROOT, "%.2f", track.durationSeconds()) + " s";
    }

    /** Opens {@code file} and decodes its first frame, so that an unusable video fails here with one line. */
    static VideoFrameSource open(Path file, FrameSourceOptions options) {
        H264Track track = H264Track.open(file);
        VideoFrameSource source = new VideoFrameSource(file, track, options);
        try {
            source.checkFirstFrame();
            return source;
        } catch (BadInputException e) {
            closeAfterFailure(source, e);
            throw e;
        } catch (IOException | RuntimeException e) {
            BadInputException bad = new BadInputException(file + ": the first frame cannot be read ("
                    + ImageFiles.oneLine(e) + "); the file is damaged: re-copy it", e);
            closeAfterFailure(source, bad);
            throw bad;
        }
    }

    private void checkFirstFrame() throws IOException {
        track.decodeNext(order);
        Optional<DisplayOrder.Decoded> first = order.peek();
        if (first.isEmpty()) {
            throw new BadInputException(file + ": the video track holds no frames; give a video with frames");
        }
        if (first.get() instanceof DisplayOrder.Failure failure) {
            throw new BadInputException(file + ": the first frame cannot be decoded (" + failure.reason() + "); "
                    + H264Track.CONVERT);
        }
    }

    @Override
    public OptionalInt frameCount() {
        return frameCount;
    }

    @Override
    public String describe() {
        return description;
    }

    @Override
    public Optional<Frame> next() {
        while (!selector.done()) {
            fill();
            Optional<DisplayOrder.Decoded> polled = order.poll();
            if (polled.isEmpty()) {
                return endOrFailure();
            }
            DisplayOrder.Decoded decoded = polled.get();
            int index = nextIndex++;
            if (!selector.accept(decoded.timeSeconds())) {
                order.recycle(decoded);
                continue;
            }
            String name = fileName + "#" + index;
            if (decoded instanceof DisplayOrder.Failure failure) {
                throw new BadFrameException(index, name, file + ": frame " + index + " at "
                        + String.format(Locale.ROOT, "%.3f", decoded.timeSeconds()) + " s cannot be decoded (" + failure.reason() + "); the video is damaged: re-copy or "
                        + "re-encode it", null);
            }
            return Optional.of(new Frame(index, decoded.timeSeconds(), name, ((DisplayOrder.Image) decoded).image()));
        }
        return Optional.empty();
    }

    /** After the last frame: the read failure that ended the track early (reported once), else empty. */
    private Optional<Frame> endOrFailure() {
        if (readFailure.isPresent()) {
            BadInputException failure = readFailure.get();
            readFailure = Optional.empty();
            throw failure;
        }
        return Optional.empty();
    }

    /** Decodes until the display-order buffer can release a frame or the track ends. */
    private void fill() {
        try {
            while (!endOfStream && !order.ready()) {
                endOfStream = !track.decodeNext(order);
            }
        } catch (BadInputException e) {
            stopAfter(e);
        } catch (IOException | RuntimeException e) {
            stopAfter(new BadInputException(file + ": read error after " + nextIndex + " frames ("
                    + ImageFiles.oneLine(e) + "); the file is truncated or damaged: re-copy it", e));
        }
    }

    private void stopAfter(BadInputException failure) {
        endOfStream = true;
        order.endOfStream();
        readFailure = Optional.of(failure);
    }

    @Override
    public void close() {
        endOfStream = true;
        try {
            track.close();
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": could not close the video file", e);
        }
    }

    private static void closeAfterFailure(VideoFrameSource source, BadInputException failure) {
        try {
            source.track.close();
        } catch (IOException e) {
            failure.addSuppressed(e);
        }
    }
}
