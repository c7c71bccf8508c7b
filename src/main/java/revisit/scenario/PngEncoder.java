package revisit.scenario;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferByte;
import java.awt.image.DataBufferUShort;
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
 * files besides the atomic one) and with light compression.
 */
final class PngEncoder {

    /**
     * ImageIO compression quality. Measured on one noisy 640x480 scenario frame (thread CPU time, mean of 20
     * encodes): quality 0.6 gave 229 KB in 14.1 ms, 0.9 gave 223 KB in 8.3 ms, 1.0 (stored) 300 KB in 3.2 ms;
     * sensor noise leaves little to compress, so 0.9 is the cheap point with near-full compression.
     */
    static final float QUALITY = 0.9f;

    private PngEncoder() {
    }

    /** Writes an 8-bit grey image. */
    static void writeGrey(Path file, int width, int height, byte[] grey) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_BYTE_GRAY);
        byte[] data = ((DataBufferByte) img.getRaster().getDataBuffer()).getData();
        System.arraycopy(grey, 0, data, 0, width * height);
        write(file, img);
    }

    /** Writes a 16-bit grey image (unsigned values in the shorts). */
    static void writeGrey16(Path file, int width, int height, short[] values) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_USHORT_GRAY);
        short[] data = ((DataBufferUShort) img.getRaster().getDataBuffer()).getData();
        System.arraycopy(values, 0, data, 0, width * height);
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
