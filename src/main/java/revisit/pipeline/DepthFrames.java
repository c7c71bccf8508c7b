package revisit.pipeline;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import revisit.io.BadInputException;
import revisit.io.FrameSources;
import revisit.io.ImageFiles;
import revisit.verification.DepthImage;

/**
 * Depth images registered to the frames of some sequences: one folder per sequence whose images, in natural name
 * order, pair with the sequence's frames by index (the n-th depth image belongs to the frame with index n, counted
 * before any stride or limit). Images are read when a closure needs them and not kept.
 *
 * <p>Thread-safe: the lists are fixed at construction.
 */
public final class DepthFrames {

    private final Map<Integer, List<Path>> images = new HashMap<>();
    private final double metresPerUnit;

    /**
     * @param folders       depth folder per sequence id; sequences without one get no metric closures
     * @param metresPerUnit metres per stored depth unit, e.g. 0.001 for millimetres
     * @throws BadInputException when a folder is missing or holds no images
     */
    public DepthFrames(Map<Integer, Path> folders, double metresPerUnit) {
        if (!(metresPerUnit > 0) || !Double.isFinite(metresPerUnit)) {
            throw new BadInputException("depth unit must be a positive number of metres, was " + metresPerUnit
                    + "; give e.g. 0.001 for millimetres");
        }
        this.metresPerUnit = metresPerUnit;
        folders.forEach((seq, folder) -> {
            if (!Files.isDirectory(folder)) {
                throw new BadInputException(folder + ": depth folder not found; give one folder of 16-bit depth "
                        + "images per sequence");
            }
            List<Path> list = FrameSources.listImages(folder);
            if (list.isEmpty()) {
                throw new BadInputException(folder + ": no depth images in the folder; give one folder of 16-bit "
                        + "depth images per sequence");
            }
            images.put(seq, List.copyOf(list));
        });
    }

    /** True when the sequence has a depth folder. */
    public boolean covers(int sequence) {
        return images.containsKey(sequence);
    }

    /**
     * The depth image of one frame.
     *
     * @return the image, or empty when the sequence has no depth folder or the folder has no image at that index
     * @throws BadInputException when the image exists but cannot be read as 16-bit depth
     */
    public Optional<DepthImage> depthOf(int sequence, int frameIndex) {
        List<Path> list = images.get(sequence);
        if (list == null || frameIndex < 0 || frameIndex >= list.size()) {
            return Optional.empty();
        }
        return Optional.of(new DepthImage(ImageFiles.readGray16(list.get(frameIndex)), metresPerUnit));
    }
}
