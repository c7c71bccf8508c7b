package revisit.io;

import boofcv.struct.image.GrayU8;

import java.util.Objects;

/**
 * One frame of a sequence.
 *
 * @param index       position of the frame in the whole source (folder order, list line order or video display
 *                    order), counted from 0 before any start time, stride or maximum is applied, so the same
 *                    frame keeps its index whatever selection is used
 * @param timeSeconds time of the frame, seconds: index / frame rate for a folder, the listed time for a frame
 *                    list, the container's presentation time for a video
 * @param name        short name for reports: the file name relative to the folder or list, or
 *                    {@code video.mp4#index} for a video frame
 * @param image       the frame as 8-bit grey; the source does not keep or reuse it
 */
public record Frame(int index, double timeSeconds, String name, GrayU8 image) {

    public Frame {
        if (index < 0) {
            throw new IllegalArgumentException("frame index must be >= 0, was " + index);
        }
        if (!Double.isFinite(timeSeconds)) {
            throw new IllegalArgumentException("frame time must be finite, was " + timeSeconds);
        }
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(image, "image");
    }
}
