package revisit.io;

import boofcv.struct.image.GrayU16;
import boofcv.struct.image.GrayU8;
import java.awt.image.Raster;

import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;

/**
 * Strict image reading: a frame is either decoded completely or rejected with a {@link BadInputException} that
 * names the file, says what was wrong and how to fix it. Never returns a partly decoded image.
 *
 * <p>Non-interlaced PNG of 8 or 16 bits without a palette is read by {@link PngReader} (CRC, length and checksum
 * checked; faster than ImageIO). Other PNG, JPEG, BMP, GIF and TIFF go through {@link ImageReader} with a warning listener: any decoder warning
 * (a truncated JPEG decodes with "Premature end of JPEG file" and grey padding otherwise) rejects the file, as do a
 * decoder exception (some JPEGs fail with a raster band-count error) and a missing image. PGM and PPM are read by
 * {@link PnmReader}. The first image of a multi-image file is used. Grey conversion follows
 * {@link GrayConversion}: 16-bit grey becomes {@code round(v / 257)}, colour becomes ITU-R BT.601 luma.
 */
public final class ImageFiles {

    /**
     * Largest image accepted, in pixels: 2^27 (about 134 megapixels, 11585 x 11585). Far above camera frames
     * (a 50-megapixel still is 5x smaller); it keeps a corrupt header from asking for gigabytes of memory.
     */
    public static final long MAX_PIXELS = 1L << 27;

    private static final String REMOVE = "re-export the file or remove it from the sequence";

    private ImageFiles() {
    }

    /**
     * Reads an image file as 8-bit grey.
     *
     * @param file image file (PNG, JPEG, BMP, GIF, TIFF, PGM or PPM; the format is found from the content)
     * @return a new grey image of the file's size
     * @throws BadInputException when the file is missing, empty, not an image, damaged, of zero size or too large
     */
    public static GrayU8 readGray(Path file) {
        checkReadable(file);
        byte[] head = new byte[8];
        int headLength = readHead(file, head);
        if (headLength == 0) {
            throw new BadInputException(file + ": empty file (0 bytes); " + REMOVE);
        }
        if (PnmReader.isPnm(head, headLength)) {
            return PnmReader.read(file, readAllBounded(file));
        }
        if (PngReader.isPng(head, headLength)) {
            Optional<GrayU8> png = PngReader.readGray(file, readAllBounded(file));
            if (png.isPresent()) {
                return png.get();
            }
        }
        return GrayConversion.toGray(decode(file));
    }

    /**
     * Reads a 16-bit single-channel image, as depth sensors and our scenario write depth (PNG or TIFF).
     *
     * @param file 16-bit grey image file
     * @return the raw 16-bit values, unscaled
     * @throws BadInputException when the file is missing, damaged, too large, or not 16-bit single-channel
     */
    public static GrayU16 readGray16(Path file) {
        checkReadable(file);
        byte[] head = new byte[8];
        int headLength = readHead(file, head);
        if (headLength == 0) {
            throw new BadInputException(file + ": empty file (0 bytes); " + REMOVE);
        }
        if (PngReader.isPng(head, headLength)) {
            Optional<GrayU16> png = PngReader.readGray16(file, readAllBounded(file));
            if (png.isPresent()) {
                return png.get();
            }
        }
        Raster raster = decode(file).getRaster();
        if (raster.getNumBands() != 1 || raster.getSampleModel().getSampleSize(0) != 16) {
            throw new BadInputException(file + ": not a 16-bit single-channel image (" + raster.getNumBands()
                    + " band(s) of " + raster.getSampleModel().getSampleSize(0) + " bits); write depth as 16-bit "
                    + "grey PNG");
        }
        GrayU16 out = new GrayU16(raster.getWidth(), raster.getHeight());
        int[] row = new int[raster.getWidth()];
        for (int y = 0; y < out.height; y++) {
            raster.getSamples(0, y, out.width, 1, 0, row);
            for (int x = 0; x < out.width; x++) {
                out.data[y * out.width + x] = (short) row[x];
            }
        }
        return out;
    }

    /** Rejects an image of zero or excessive size before any pixel memory is allocated. */
    static void checkSize(Path file, int width, int height) {
        if (width <= 0 || height <= 0) {
            throw new BadInputException(file + ": image has zero size (" + width + "x" + height + " pixels); "
                    + REMOVE);
        }
        if ((long) width * height > MAX_PIXELS) {
            throw new BadInputException(file + ": image too large (" + width + "x" + height + " pixels, limit "
                    + MAX_PIXELS + "); downscale the frames before scanning");
        }
    }

    private static void checkReadable(Path file) {
        if (!Files.exists(file)) {
            throw new BadInputException(file + ": image not found; check the path");
        }
        if (!Files.isRegularFile(file) || !Files.isReadable(file)) {
            throw new BadInputException(file + ": not a readable file; check the path and its permissions");
        }
    }

    private static int readHead(Path file, byte[] head) {
        try (InputStream in = Files.newInputStream(file)) {
            return Math.max(0, in.readNBytes(head, 0, head.length));
        } catch (IOException e) {
            throw new BadInputException(file + ": could not be read (" + oneLine(e) + "); check the file's "
                    + "permissions and the disk", e);
        }
    }

    private static byte[] readAllBounded(Path file) {
        try {
            long size = Files.size(file);
            if (size > MAX_PIXELS * 6 + 4096) {
                throw new BadInputException(file + ": image file too large (" + size + " bytes); downscale the "
                        + "frames before scanning");
            }
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new BadInputException(file + ": could not be read (" + oneLine(e) + "); check the file's "
                    + "permissions and the disk", e);
        }
    }

    private static BufferedImage decode(Path file) {
        try (ImageInputStream in = ImageIO.createImageInputStream(file.toFile())) {
            Iterator<ImageReader> readers = in == null ? null : ImageIO.getImageReaders(in);
            if (readers == null || !readers.hasNext()) {
                throw new BadInputException(file + ": not a recognised image format; use PNG, JPEG, BMP, TIFF, "
                        + "PGM or PPM");
            }
            ImageReader reader = readers.next();
            try {
                return readFirstImage(file, reader, in);
            } finally {
                reader.dispose();
            }
        } catch (BadInputException e) {
            throw e;
        } catch (IOException | RuntimeException e) {
            throw new BadInputException(file + ": cannot be decoded (" + oneLine(e) + "); the file is damaged or "
                    + "not an image; " + REMOVE, e);
        }
    }

    private static BufferedImage readFirstImage(Path file, ImageReader reader, ImageInputStream in)
            throws IOException {
        reader.setInput(in, true, true);
        List<String> warnings = new ArrayList<>();
        reader.addIIOReadWarningListener((source, warning) -> warnings.add(warning));
        checkSize(file, reader.getWidth(0), reader.getHeight(0));
        BufferedImage image = reader.read(0);
        if (!warnings.isEmpty()) {
            throw new BadInputException(file + ": damaged image (decoder warning: "
                    + oneLine(warnings.get(0)) + "); " + REMOVE);
        }
        if (image == null) {
            throw new BadInputException(file + ": the decoder returned no image; " + REMOVE);
        }
        checkSize(file, image.getWidth(), image.getHeight());
        return image;
    }

    /** The class and message of {@code e} on one line, for embedding in a {@link BadInputException} message. */
    static String oneLine(Throwable e) {
        String message = e.getMessage();
        String text = message == null || message.isBlank() ? e.getClass().getSimpleName()
                : e.getClass().getSimpleName() + ": " + message;
        return oneLine(text);
    }

    private static String oneLine(String text) {
        return text.replaceAll("\\s+", " ").trim();
    }
}
