package revisit.io;

import boofcv.struct.image.GrayU16;
import boofcv.struct.image.GrayU8;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;
import java.awt.Transparency;
import java.awt.color.ColorSpace;
import java.awt.image.BufferedImage;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.WritableRaster;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Our PNG decoder against the reference decoder of the JDK (javax.imageio's PNG reader, followed by the same grey
 * rules): every layout and filter type must give the same pixels, and damaged files must be refused.
 */
class PngReaderTest {

    @TempDir
    Path dir;

    @Test
    void imageIoWrittenLayoutsDecodeLikeImageIo() throws IOException {
        for (int[] size : new int[][]{{1, 1}, {70, 41}, {640, 480}}) {
            for (BufferedImage image : List.of(grey8(size[0], size[1]), grey16(size[0], size[1]),
                    rgb(size[0], size[1], BufferedImage.TYPE_INT_RGB), rgb(size[0], size[1],
                            BufferedImage.TYPE_INT_ARGB), greyAlpha(size[0], size[1]), rgb16(size[0], size[1]))) {
                assertSameAsImageIo(write(ImageFilesTest.encode(image, "png"), "w.png"));
            }
        }
    }

    @Test
    void everyFilterTypeDecodesLikeImageIo() throws IOException {
        // hand-encoded files with one filter type on all rows (PNG specification, clause 9), 1 and 3 bytes per pixel
        Random random = new Random(11L);
        for (int filter = 0; filter <= 4; filter++) {
            for (int colourType : new int[]{0, 2}) {
                int channels = colourType == 0 ? 1 : 3;
                byte[] samples = smoothSamples(37 * channels, 23, random);
                byte[] png = PngTestFiles.encode(37, 23, colourType, 8, samples, filter);
                Path file = write(png, "f" + filter + "c" + colourType + ".png");
                assertTrue(PngReader.readGray(file, png).isPresent(), "our reader takes filter " + filter);
                assertSameAsImageIo(file);
            }
        }
    }

    @Test
    void paletteAndInterlacedFilesFallBackToImageIo() throws IOException {
        byte[] interlaced = writeInterlaced(grey8(33, 17));
        Path file = write(interlaced, "adam7.png");
        assertTrue(PngReader.readGray(file, interlaced).isEmpty(), "interlaced is left to ImageIO");
        assertSameAsImageIo(file);
        BufferedImage palette = new BufferedImage(20, 10, BufferedImage.TYPE_BYTE_INDEXED);
        byte[] bytes = ImageFilesTest.encode(palette, "png");
        assertTrue(PngReader.readGray(write(bytes, "p.png"), bytes).isEmpty(), "palette is left to ImageIO");
    }

    @Test
    void sixteenBitGreyKeepsRawSamples() throws IOException {
        BufferedImage image = grey16(50, 9);
        Path file = write(ImageFilesTest.encode(image, "png"), "d.png");
        GrayU16 ours = ImageFiles.readGray16(file);
        int[] expected = image.getRaster().getPixels(0, 0, 50, 9, (int[]) null);
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], ours.data[i] & 0xFFFF, "sample " + i);
        }
    }

    @Test
    void realPhotographsDecodeLikeImageIo() throws IOException {
        // Middlebury multi-view data (Seitz et al., CVPR 2006): 640x480 RGB PNGs written by another encoder
        Path ring = Path.of("..", "shared", "data", "middlebury", "dinoRing");
        Assumptions.assumeTrue(Files.isDirectory(ring), "skipped: ../shared/data/middlebury/dinoRing is absent");
        List<Path> pngs;
        try (Stream<Path> s = Files.list(ring)) {
            pngs = s.filter(p -> p.toString().endsWith(".png")).sorted().limit(4).toList();
        }
        assertTrue(!pngs.isEmpty(), "PNG files in " + ring);
        for (Path p : pngs) {
            assertTrue(PngReader.readGray(p, Files.readAllBytes(p)).isPresent(), p + " takes our path");
            assertSameAsImageIo(p);
        }
    }

    @Test
    void truncatedFilesAreRefusedWherever() throws IOException {
        byte[] png = ImageFilesTest.encode(grey8(64, 48), "png");
        for (int cut = 9; cut < png.length; cut += Math.max(1, png.length / 23)) {
            Path file = write(Arrays.copyOf(png, cut), "cut" + cut + ".png");
            assertRefused(file, "cannot be decoded (PNG");
        }
        assertRefused(write(Arrays.copyOf(png, png.length - 12), "noend.png"), "before IEND");
    }

    @Test
    void damagedBytesAreRefused() throws IOException {
        byte[] png = ImageFilesTest.encode(grey8(64, 48), "png");
        Random random = new Random(5L);
        for (int i = 0; i < 20; i++) {
            byte[] bad = png.clone();
            int at = 8 + random.nextInt(png.length - 8);
            bad[at] ^= (byte) (1 + random.nextInt(255));
            assertRefused(write(bad, "bad" + i + ".png"), "cannot be decoded");
        }
    }

    @Test
    void wrongImageDataIsRefusedEvenWithGoodCrcs() throws IOException {
        byte[] samples = smoothSamples(30, 20, new Random(2L));
        byte[] tooLong = PngTestFiles.encode(30, 20, 0, 8, Arrays.copyOf(samples, 30 * 21), 0, 30, 21);
        assertRefused(write(tooLong, "long.png"), "more image data than the header's 30x20");
        byte[] tooShort = PngTestFiles.encode(30, 20, 0, 8, Arrays.copyOf(samples, 30 * 19), 0, 30, 19);
        assertRefused(write(tooShort, "short.png"), "image data ends after 589 of 620 bytes");
        byte[] badFilter = PngTestFiles.encode(30, 20, 0, 8, samples, 7);
        assertRefused(write(badFilter, "filter.png"), "unknown filter type 7 on row 0");
    }

    private void assertSameAsImageIo(Path file) throws IOException {
        GrayU8 reference = GrayConversion.toGray(ImageIO.read(file.toFile()));
        GrayU8 ours = ImageFiles.readGray(file);
        assertEquals(reference.width, ours.width, file.toString());
        assertEquals(reference.height, ours.height, file.toString());
        assertArrayEquals(ImageFilesTest.values(reference), ImageFilesTest.values(ours), file.toString());
    }

    private static void assertRefused(Path file, String fragment) {
        BadInputException e = assertThrows(BadInputException.class, () -> ImageFiles.readGray(file), file.toString());
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        assertTrue(e.getMessage().contains(fragment), e.getMessage());
        assertTrue(!e.getMessage().contains("\n"), e.getMessage());
    }

    private Path write(byte[] bytes, String name) throws IOException {
        Path file = dir.resolve(name);
        Files.write(file, bytes);
        return file;
    }

    /** Smooth gradients plus noise, so encoders pick different filters from row to row. */
    private static byte[] smoothSamples(int rowBytes, int height, Random random) {
        byte[] out = new byte[rowBytes * height];
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < rowBytes; x++) {
                out[y * rowBytes + x] = (byte) (3 * x + 5 * y + random.nextInt(9));
            }
        }
        return out;
    }

    private static BufferedImage grey8(int w, int h) {
        BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_BYTE_GRAY);
        image.getRaster().setDataElements(0, 0, w, h, smoothSamples(w, h, new Random(w * 31L + h)));
        return image;
    }

    private static BufferedImage grey16(int w, int h) {
        BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_USHORT_GRAY);
        image.getRaster().setPixels(0, 0, w, h, new Random(7L).ints((long) w * h, 0, 65536).toArray());
        return image;
    }

    private static BufferedImage rgb(int w, int h, int type) {
        BufferedImage image = new BufferedImage(w, h, type);
        Random random = new Random(3L);
        for (int y = 0; y < h; y++) {
            for (int x = 0; x < w; x++) {
                image.setRGB(x, y, random.nextInt());
            }
        }
        return image;
    }

    private static BufferedImage greyAlpha(int w, int h) {
        ComponentColorModel cm = new ComponentColorModel(ColorSpace.getInstance(ColorSpace.CS_GRAY), true, false,
                Transparency.TRANSLUCENT, DataBuffer.TYPE_BYTE);
        WritableRaster raster = cm.createCompatibleWritableRaster(w, h);
        raster.setPixels(0, 0, w, h, new Random(4L).ints(2L * w * h, 0, 256).toArray());
        return new BufferedImage(cm, raster, false, null);
    }

    private static BufferedImage rgb16(int w, int h) {
        ComponentColorModel cm = new ComponentColorModel(ColorSpace.getInstance(ColorSpace.CS_sRGB), false, false,
                Transparency.OPAQUE, DataBuffer.TYPE_USHORT);
        WritableRaster raster = cm.createCompatibleWritableRaster(w, h);
        raster.setPixels(0, 0, w, h, new Random(8L).ints(3L * w * h, 0, 65536).toArray());
        return new BufferedImage(cm, raster, false, null);
    }

    private static byte[] writeInterlaced(BufferedImage image) throws IOException {
        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        ImageWriteParam param = writer.getDefaultWriteParam();
        param.setProgressiveMode(ImageWriteParam.MODE_DEFAULT);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
            writer.setOutput(ios);
            writer.write(null, new IIOImage(image, null, null), param);
        } finally {
            writer.dispose();
        }
        return out.toByteArray();
    }
}
