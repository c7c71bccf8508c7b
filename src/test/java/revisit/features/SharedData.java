package revisit.features;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import boofcv.io.image.ConvertBufferedImage;
import boofcv.struct.image.GrayU8;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;

/**
 * Finds the project's shared real data folder ({@code ../shared/data}, see its README.md for sources and licences)
 * and loads grey images from it; a test that needs a missing file is skipped, not failed.
 */
final class SharedData {

    private SharedData() {
    }

    /** The shared data folder, or skips the calling test when it is absent. */
    static Path root() {
        Path here = Path.of(System.getProperty("user.dir"));
        for (Path candidate : List.of(here.resolve("../shared/data"), here.resolve("../../shared/data"),
                Path.of("/work/shared/data"))) {
            if (Files.isDirectory(candidate)) {
                return candidate.normalize();
            }
        }
        assumeTrue(false, "shared data folder ../shared/data not found; skipping test on real images");
        return here;
    }

    /** A grey image from the shared folder, e.g. {@code "homography/graf1.png"}; skips when missing. */
    static GrayU8 gray(String relative) {
        Path file = root().resolve(relative);
        assumeTrue(Files.isRegularFile(file), file + " not found; skipping test on real images");
        try {
            BufferedImage image = ImageIO.read(file.toFile());
            return ConvertBufferedImage.convertFrom(image, (GrayU8) null);
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": unreadable test image", e);
        }
    }
}
