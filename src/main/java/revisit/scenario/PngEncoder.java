package revisit.scenario;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.MemoryCacheImageOutputStream;
import revisit.io.AtomicFiles;

/**
 * Writes 8-bit and 16-bit grey PNG files atomically through ImageIO's PNG writer, caching in memory (no temporary
 * files besides the atomic one) and with a moderate deflate level.
 */
final class PngEncoder {

    /**
     * ImageIO compression quality: the JDK's PNG writer maps quality q to deflate level round(9 (1 - q)), so 0.6
     * is level 4 (faster than the default level 9, files a few percent larger; common practice for bulk image
     * output).
     */
    static final float QUALITY = 0.6f;

    private PngEncoder() {
    }

    /** Writes an 8-bit grey image. */
    static void writeGrey(Path file, int width, int height, byte[] grey) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_BYTE_GRAY);
        img.getRaster().setDataElements(0, 0, width, height, grey);
        write(file, img);
    }

    /** Writes a 16-bit grey image (unsigned values in the shorts). */
    static void writeGrey16(Path file, int width, int height, short[] values) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_USHORT_GRAY);
        img.getRaster().setDataElements(0, 0, width, height, values);
        write(file, img);
    }

    private static void write(Path file, BufferedImage img) {
        AtomicFiles.write(file, out -> encode(img, out));
    }

    private static void encode(BufferedImage img, OutputStream out) throws IOException {
        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        try (MemoryCacheImageOutputStream ios = new MemoryCacheImageOutputStream(out)) {
            writer.setOutput(ios);
            ImageWriteParam param = writer.getDefaultWriteParam();
            param.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
            param.setCompressionQuality(QUALITY);
            writer.write(null, new IIOImage(img, null, null), param);
        } finally {
            writer.dispose();
        }
    }
}
