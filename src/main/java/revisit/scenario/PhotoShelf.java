package revisit.scenario;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import revisit.io.BadInputException;

/**
 * Real photos used as posters on some facades. Photos are chosen by seed from a folder tree (sorted by path, so
 * the choice is reproducible), turned grey and kept with one credit line each for the scenario's README.
 *
 * @param photos  the chosen photos as textures
 * @param credits one line per photo: relative path, author, licence
 */
record PhotoShelf(List<Texture> photos, List<String> credits) {

    /** A shelf with no photos: every poster is painted. */
    static PhotoShelf empty() {
        return new PhotoShelf(List.of(), List.of());
    }

    /**
     * Picks up to {@code count} photos (.jpg, .jpeg, .png) from {@code folder} and its subfolders.
     *
     * @throws BadInputException when the folder cannot be listed or a chosen photo cannot be decoded
     */
    static PhotoShelf load(Path folder, int count, long seed) {
        List<Path> files = list(folder);
        if (files.isEmpty()) {
            throw new BadInputException(folder + ": no .jpg or .png photos found; point --photos at a folder of "
                    + "photos or leave the option out");
        }
        SplittableRandom rnd = new SplittableRandom(seed);
        List<Path> pool = new ArrayList<>(files);
        List<Texture> photos = new ArrayList<>();
        List<String> credits = new ArrayList<>();
        while (photos.size() < count && !pool.isEmpty()) {
            Path file = pool.remove(rnd.nextInt(pool.size()));
            photos.add(grey(file));
            credits.add(folder.relativize(file).toString().replace('\\', '/') + ": " + credit(folder, file));
        }
        return new PhotoShelf(List.copyOf(photos), List.copyOf(credits));
    }

    private static List<Path> list(Path folder) {
        try (Stream<Path> walk = Files.walk(folder)) {
            return walk.filter(Files::isRegularFile).filter(p -> {
                String n = p.getFileName().toString().toLowerCase(Locale.ROOT);
                return n.endsWith(".jpg") || n.endsWith(".jpeg") || n.endsWith(".png");
            }).sorted().toList();
        } catch (IOException e) {
            throw new BadInputException(folder + ": cannot list photos (" + e.getMessage() + "); check the path", e);
        }
    }

    /** Credit from the folder the photo sits in (licences as recorded in the photo collection's README). */
    private static String credit(Path root, Path file) {
        String top = root.relativize(file).getName(0).toString();
        return switch (top) {
            case "pixabay" -> "Pixabay, CC0 public domain";
            case "stitch", "chair" -> "P. Abeles, BoofCV-Data, CC BY 4.0";
            default -> "licence as stated in " + root.resolve(top) + " (check before sharing)";
        };
    }

    private static Texture grey(Path file) {
        BufferedImage img;
        try {
            img = ImageIO.read(file.toFile());
        } catch (IOException e) {
            throw new BadInputException(file + ": photo cannot be decoded (" + e.getMessage()
                    + "); remove it from the photo folder", e);
        }
        if (img == null) {
            throw new BadInputException(file + ": not an image ImageIO can read; remove it from the photo folder");
        }
        int w = img.getWidth();
        int h = img.getHeight();
        float[] g = new float[w * h];
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                int rgb = img.getRGB(x, y);
                g[y * w + x] = (0.299f * (rgb >> 16 & 255) + 0.587f * (rgb >> 8 & 255) + 0.114f * (rgb & 255)) / 255f;
            }
        }
        return new Texture(w, h, g);
    }
}
