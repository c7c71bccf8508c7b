package revisit.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Opens a {@link FrameSource} for an input path: a folder of images, a frame-list file (see
 * {@link FrameListFile}) or a video file ({@code .mp4}, {@code .mov}, {@code .m4v}).
 */
public final class FrameSources {

    /** File-name extensions (lower case) taken from an image folder; other files are ignored. */
    public static final Set<String> IMAGE_EXTENSIONS = Set.of("png", "jpg", "jpeg", "bmp", "pgm", "ppm", "tif",
            "tiff");
    /** File-name extensions (lower case) opened as video. */
    public static final Set<String> VIDEO_EXTENSIONS = Set.of("mp4", "mov", "m4v");
    /** Video containers that are recognised by name but not read. */
    private static final Set<String> OTHER_VIDEO_EXTENSIONS = Set.of("avi", "mkv", "webm", "mpg", "mpeg", "ts",
            "wmv", "flv", "3gp");

    private FrameSources() {
    }

    /**
     * Opens all frames of {@code input}.
     *
     * @param input              folder, frame list or video
     * @param defaultFrameRateHz rate giving image-folder frames their times, Hz (&gt; 0)
     * @throws BadInputException when the input is missing, empty or malformed (one line naming it)
     */
    public static FrameSource open(Path input, double defaultFrameRateHz) {
        return open(input, FrameSourceOptions.defaults().withFrameRateHz(defaultFrameRateHz));
    }

    /**
     * Opens {@code input} with a selection of frames.
     *
     * @throws BadInputException when the input is missing, empty or malformed (one line naming it)
     */
    public static FrameSource open(Path input, FrameSourceOptions options) {
        if (!Files.exists(input)) {
            throw new BadInputException(input + ": not found; give an image folder, a frame list or a video file");
        }
        if (Files.isDirectory(input)) {
            return openFolder(input, options);
        }
        String extension = extension(input);
        if (VIDEO_EXTENSIONS.contains(extension)) {
            return VideoFrameSource.open(input, options);
        }
        if (OTHER_VIDEO_EXTENSIONS.contains(extension)) {
            throw new BadInputException(input + ": ." + extension + " videos are not read (only MP4/MOV with "
                    + "H.264); convert it, e.g. 'ffmpeg -i IN -pix_fmt yuv420p -c:v libx264 OUT.mp4', or extract "
                    + "the frames to a folder");
        }
        if (IMAGE_EXTENSIONS.contains(extension)) {
            throw new BadInputException(input + ": a single image, not a sequence; give the folder that holds "
                    + "the frames, or a frame list");
        }
        List<FrameListFile.Entry> entries = FrameListFile.read(input);
        Path folder = input.toAbsolutePath().normalize().getParent();
        List<ImageSequenceSource.Item> items = new ArrayList<>(entries.size());
        for (FrameListFile.Entry e : entries) {
            Path image = e.image();
            String name = image.startsWith(folder) ? folder.relativize(image).toString() : image.toString();
            items.add(new ImageSequenceSource.Item(e.timeSeconds(), image, name));
        }
        return new ImageSequenceSource("frame list " + input, items, options);
    }

    private static FrameSource openFolder(Path folder, FrameSourceOptions options) {
        List<Path> images = listImages(folder);
        List<ImageSequenceSource.Item> items = new ArrayList<>(images.size());
        for (int i = 0; i < images.size(); i++) {
            Path image = images.get(i);
            items.add(new ImageSequenceSource.Item(i / options.frameRateHz(), image, image.getFileName().toString()));
        }
        return new ImageSequenceSource("image folder " + folder + " at " + options.frameRateHz() + " Hz", items,
                options);
    }

    /** Image files directly in {@code folder} (not hidden, known extension), in natural name order. */
    public static List<Path> listImages(Path folder) {
        List<Path> images = new ArrayList<>();
        int others = 0;
        try (Stream<Path> files = Files.list(folder)) {
            for (Path p : (Iterable<Path>) files::iterator) {
                String name = p.getFileName().toString();
                if (!name.startsWith(".") && Files.isRegularFile(p) && IMAGE_EXTENSIONS.contains(extension(p))) {
                    images.add(p);
                } else {
                    others++;
                }
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new BadInputException(folder + ": folder cannot be listed (" + ImageFiles.oneLine(e)
                    + "); check its permissions", e);
        }
        if (images.isEmpty()) {
            throw new BadInputException(folder + ": no images in the folder (" + others + " other entries); "
                    + "frames must be " + String.join("/", IMAGE_EXTENSIONS.stream().sorted().toList())
                    + " files directly in the folder");
        }
        images.sort((a, b) -> NaturalOrder.INSTANCE.compare(a.getFileName().toString(),
                b.getFileName().toString()));
        return images;
    }

    private static String extension(Path path) {
        String name = path.getFileName() == null ? "" : path.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot < 0 ? "" : name.substring(dot + 1).toLowerCase(Locale.ROOT);
    }
}
