package revisit.evaluation;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import javax.imageio.ImageIO;
import revisit.io.AtomicFiles;

/** Scaled PNG copies of frame images for the report, so that the report folder stands on its own. */
final class Thumbnails {

    private Thumbnails() {
    }

    /**
     * Writes a thumbnail {@code width} pixels wide (height in proportion).
     *
     * @return empty when written, else why the image could not be used (shown in the report instead)
     */
    static Optional<String> write(Path image, Path target, int width) {
        if (!Files.isRegularFile(image)) {
            return Optional.of(image + ": file not found");
        }
        BufferedImage source;
        try {
            source = ImageIO.read(image.toFile());
        } catch (IOException e) {
            return Optional.of(image + ": cannot be decoded (" + e.getMessage() + ")");
        }
        if (source == null) {
            return Optional.of(image + ": not an image format Java can read (use PNG or JPEG)");
        }
        int height = Math.max(1, (int) Math.round((double) source.getHeight() * width / source.getWidth()));
        BufferedImage small = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = small.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
        g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
        g.drawImage(source, 0, 0, width, height, null);
        g.dispose();
        AtomicFiles.write(target, out -> ImageIO.write(small, "png", out));
        return Optional.empty();
    }
}
