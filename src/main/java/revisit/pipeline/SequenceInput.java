package revisit.pipeline;

import java.nio.file.Path;

/**
 * One sequence to scan.
 *
 * @param path an image folder, a frame-list file or a video file
 * @param name a short name for reports (defaults to the file name)
 */
public record SequenceInput(Path path, String name) {

    /** A sequence named after its file or folder. */
    public static SequenceInput of(Path path) {
        Path fn = path.toAbsolutePath().normalize().getFileName();
        return new SequenceInput(path, fn == null ? path.toString() : fn.toString());
    }
}
