package revisit.io;

import boofcv.struct.image.GrayU8;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.Transparency;
import java.awt.color.ColorSpace;
import java.awt.image.BufferedImage;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.IndexColorModel;
import java.awt.image.WritableRaster;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Random;
import java.util.zip.CRC32;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Known-answer tests of the grey rules (docs/FORMAT-frames.md) and of strict rejection of damaged files. */
class ImageFilesTest {

    @TempDir
    Path dir;

    @Test
    void eightBitGreyPngIsReadUnchanged() throws IOException {
        BufferedImage image = new BufferedImage(3, 2, BufferedImage.TYPE_BYTE_GRAY);
        image.getRaster().setPixels(0, 0, 3, 2, new int[]{0, 1, 127, 128, 254, 255});
        GrayU8 gray = ImageFiles.readGray(write(image, "png", "g8.png"));
        assertArrayEquals(new int[]{0, 1, 127, 128, 254, 255}, values(gray));
    }

    @Test
    void sixteenBitGreyScalesByRoundedDivisionBy257() throws IOException {
        // rule round(v / 257) = round(v * 255 / 65535), worked by hand at the rounding boundaries:
        // 128/257 = 0.498 -> 0, 129/257 = 0.502 -> 1, 385/257 = 1.498 -> 1, 386/257 = 1.502 -> 2,
        // 32767/257 = 127.498 -> 127, 32768/257 = 127.502 -> 128, 65535/257 = 255
        int[] stored = {0, 128, 129, 385, 386, 32767, 32768, 65535};
        BufferedImage image = new BufferedImage(stored.length, 1, BufferedImage.TYPE_USHORT_GRAY);
        image.getRaster().setPixels(0, 0, stored.length, 1, stored);
        GrayU8 gray = ImageFiles.readGray(write(image, "png", "g16.png"));
        assertArrayEquals(new int[]{0, 0, 1, 1, 2, 127, 128, 255}, values(gray));
    }

    @Test
    void colourPngBecomesBt601Luma() throws IOException {
        // ITU-R BT.601 luma Y = 0.299 R + 0.587 G + 0.114 B, worked by hand:
        // red 76.245 -> 76, green 149.685 -> 150, blue 29.07 -> 29, white 255, (10,200,30) 123.81 -> 124
        int[] rgb = {0xFF0000, 0x00FF00, 0x0000FF, 0xFFFFFF, 0x0AC81E};
        BufferedImage image = new BufferedImage(rgb.length, 1, BufferedImage.TYPE_INT_RGB);
        image.setRGB(0, 0, rgb.length, 1, rgb, 0, rgb.length);
        GrayU8 gray = ImageFiles.readGray(write(image, "png", "rgb.png"));
        assertArrayEquals(new int[]{76, 150, 29, 255, 124}, values(gray));
    }

    @Test
    void alphaIsIgnoredInArgbPng() throws IOException {
        // same colours at alpha 0, 128 and 255 give the same luma: 0.299*200 + 0.587*100 + 0.114*50 = 124.2 -> 124
        int[] argb = {0x00C86432, 0x80C86432, 0xFFC86432};
        BufferedImage image = new BufferedImage(argb.length, 1, BufferedImage.TYPE_INT_ARGB);
        image.setRGB(0, 0, argb.length, 1, argb, 0, argb.length);
        GrayU8 gray = ImageFiles.readGray(write(image, "png", "argb.png"));
        assertArrayEquals(new int[]{124, 124, 124}, values(gray));
    }

    @Test
    void sixteenBitColourPngBecomesLumaScaledOnce() throws IOException {
        // (65535, 0, 0): 0.299 * 255 = 76.245 -> 76;
        // (1000, 20000, 60000): (299*1000 + 587*20000 + 114*60000) * 255 / (1000 * 65535) = 73.46 -> 73
        ComponentColorModel model = new ComponentColorModel(ColorSpace.getInstance(ColorSpace.CS_sRGB), false, false,
                Transparency.OPAQUE, DataBuffer.TYPE_USHORT);
        WritableRaster raster = model.createCompatibleWritableRaster(2, 1);
        raster.setPixels(0, 0, 2, 1, new int[]{65535, 0, 0, 1000, 20000, 60000});
        BufferedImage image = new BufferedImage(model, raster, false, null);
        GrayU8 gray = ImageFiles.readGray(write(image, "png", "rgb16.png"));
        assertArrayEquals(new int[]{76, 73}, values(gray));
    }

    @Test
    void palettePngTakesLumaOfEachPaletteColour() throws IOException {
        // palette: black 0, (255,0,0) 76, (0,0,255) 29, (100,150,200) 0.299*100 + 0.587*150 + 0.114*200 = 140.75 -> 141
        IndexColorModel palette = new IndexColorModel(2, 4, new byte[]{0, (byte) 255, 0, 100},
                new byte[]{0, 0, 0, (byte) 150}, new byte[]{0, 0, (byte) 255, (byte) 200});
        BufferedImage image = new BufferedImage(4, 1, BufferedImage.TYPE_BYTE_BINARY, palette);
        image.getRaster().setPixels(0, 0, 4, 1, new int[]{3, 2, 1, 0});
        GrayU8 gray = ImageFiles.readGray(write(image, "png", "palette.png"));
        assertArrayEquals(new int[]{141, 29, 76, 0}, values(gray));
    }

    @Test
    void bmpAndTiffColourGiveTheSameLumaAsPng() throws IOException {
        BufferedImage image = randomRgb(17, 9, 5L);
        int[] fromPng = values(ImageFiles.readGray(write(image, "png", "same.png")));
        assertArrayEquals(fromPng, values(ImageFiles.readGray(write(image, "bmp", "same.bmp"))));
        assertArrayEquals(fromPng, values(ImageFiles.readGray(write(image, "tiff", "same.tif"))));
    }

    @Test
    void netpbmGreyAndColourFollowTheSameRules() throws IOException {
        // P5 8-bit, P5 16-bit big-endian (257 -> 1, 65535 -> 255), P2 with a comment, P6 red -> 76
        assertArrayEquals(new int[]{0, 9, 255}, values(ImageFiles.readGray(
                writeBytes("a.pgm", concat(ascii("P5\n3 1\n255\n"), new byte[]{0, 9, (byte) 255})))));
        assertArrayEquals(new int[]{1, 255}, values(ImageFiles.readGray(
                writeBytes("b.pgm", concat(ascii("P5 2 1 65535\n"), new byte[]{1, 1, (byte) 255, (byte) 255})))));
        // maximum 10: 5 -> 5 * 255 / 10 = 127.5 -> 128 (halves round up), 10 -> 255
        assertArrayEquals(new int[]{0, 128, 255}, values(ImageFiles.readGray(
                writeBytes("c.pgm", ascii("P2\n# made by hand\n3 1\n10\n0 5\n10\n")))));
        assertArrayEquals(new int[]{76}, values(ImageFiles.readGray(
                writeBytes("d.ppm", concat(ascii("P6\n1 1\n255\n"), new byte[]{(byte) 255, 0, 0})))));
    }

    @Test
    void damagedNetpbmFilesAreRejected() throws IOException {
        Path truncated = writeBytes("t.pgm", concat(ascii("P5\n4 4\n255\n"), new byte[10]));
        assertRejected(truncated, "truncated");
        assertRejected(writeBytes("over.pgm", ascii("P2 2 1 10 3 11\n")), "above the maximum");
        assertRejected(writeBytes("zero.pgm", ascii("P5 0 4 255\n")), "zero size");
    }

    @Test
    void truncatedJpegIsRejectedNotHalfDecoded() throws IOException {
        byte[] jpeg = encode(randomRgb(64, 64, 1L), "jpg");
        Path cut = writeBytes("cut.jpg", Arrays.copyOf(jpeg, jpeg.length * 6 / 10));
        // ImageIO decodes this file with grey padding and only a warning ("Truncated File - Missing EOI marker")
        assertRejected(cut, "damaged image (decoder warning");
    }

    @Test
    void truncatedPngIsRejected() throws IOException {
        byte[] png = encode(randomRgb(64, 64, 2L), "png");
        Path cut = writeBytes("cut.png", Arrays.copyOf(png, png.length * 6 / 10));
        assertRejected(cut, "cannot be decoded");
    }

    @Test
    void randomBytesEmptyAndMissingFilesAreRejected() throws IOException {
        byte[] noise = new byte[4096];
        new Random(3L).nextBytes(noise);
        noise[0] = 0x13; // keep the seeded noise from starting with a Netpbm or image magic number
        assertRejected(writeBytes("noise.png", noise), "not a recognised image");
        assertRejected(writeBytes("empty.jpg", new byte[0]), "empty file");
        assertRejected(dir.resolve("absent.png"), "not found");
    }

    @Test
    void zeroWidthPngHeaderIsRejected() throws IOException {
        assertRejected(writeBytes("zero.png", pngWithSize(0, 5)), "cannot be decoded");
    }

    @Test
    void colourLumaAgreesWithOpenCvWithinOneLevel() throws IOException {
        // reference: OpenCV 4.9 imread + cvtColor(BGR2GRAY), BT.601 weights in fixed point (rounding may differ by 1)
        nu.pattern.OpenCV.loadLocally();
        Path file = write(randomRgb(40, 30, 4L), "png", "cv.png");
        org.opencv.core.Mat bgr = org.opencv.imgcodecs.Imgcodecs.imread(file.toString());
        org.opencv.core.Mat grey = new org.opencv.core.Mat();
        org.opencv.imgproc.Imgproc.cvtColor(bgr, grey, org.opencv.imgproc.Imgproc.COLOR_BGR2GRAY);
        byte[] reference = new byte[40 * 30];
        grey.get(0, 0, reference);
        int[] ours = values(ImageFiles.readGray(file));
        for (int i = 0; i < ours.length; i++) {
            assertTrue(Math.abs(ours[i] - (reference[i] & 0xFF)) <= 1, "pixel " + i);
        }
    }

    @Test
    void sixteenBitGreyAgreesWithOpenCvScaling() throws IOException {
        // reference: OpenCV 4.9 imread(ANYDEPTH) + convertTo(CV_8U, 1/257), which rounds to nearest
        nu.pattern.OpenCV.loadLocally();
        BufferedImage image = new BufferedImage(64, 16, BufferedImage.TYPE_USHORT_GRAY);
        int[] stored = new Random(6L).ints(64 * 16, 0, 65536).toArray();
        image.getRaster().setPixels(0, 0, 64, 16, stored);
        Path file = write(image, "png", "cv16.png");
        org.opencv.core.Mat wide = org.opencv.imgcodecs.Imgcodecs.imread(file.toString(),
                org.opencv.imgcodecs.Imgcodecs.IMREAD_ANYDEPTH);
        org.opencv.core.Mat narrow = new org.opencv.core.Mat();
        wide.convertTo(narrow, org.opencv.core.CvType.CV_8U, 1.0 / 257.0);
        byte[] reference = new byte[64 * 16];
        narrow.get(0, 0, reference);
        int[] expected = new int[reference.length];
        for (int i = 0; i < expected.length; i++) {
            expected[i] = reference[i] & 0xFF;
        }
        assertArrayEquals(expected, values(ImageFiles.readGray(file)));
    }

    private void assertRejected(Path file, String expectedFragment) {
        BadInputException e = assertThrows(BadInputException.class, () -> ImageFiles.readGray(file));
        assertTrue(e.getMessage().contains(file.getFileName().toString()), e.getMessage());
        assertTrue(e.getMessage().contains(expectedFragment), e.getMessage());
        assertTrue(!e.getMessage().contains("\n"), "one line: " + e.getMessage());
    }

    static int[] values(GrayU8 gray) {
        int[] out = new int[gray.width * gray.height];
        for (int y = 0; y < gray.height; y++) {
            for (int x = 0; x < gray.width; x++) {
                out[y * gray.width + x] = gray.get(x, y);
            }
        }
        return out;
    }

    static BufferedImage randomRgb(int width, int height, long seed) {
        Random random = new Random(seed);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                image.setRGB(x, y, random.nextInt(1 << 24));
            }
        }
        return image;
    }

    private Path write(BufferedImage image, String format, String name) throws IOException {
        return writeBytes(name, encode(image, format));
    }

    private Path writeBytes(String name, byte[] bytes) throws IOException {
        Path file = dir.resolve(name);
        Files.write(file, bytes);
        return file;
    }

    static byte[] encode(BufferedImage image, String format) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        assertTrue(ImageIO.write(image, format, out), "ImageIO has a " + format + " writer");
        return out.toByteArray();
    }

    private static byte[] ascii(String text) {
        return text.getBytes(StandardCharsets.US_ASCII);
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] out = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    /** A PNG signature and IHDR chunk (8-bit grey) with the given size, then IEND (PNG specification, 11.2.2). */
    private static byte[] pngWithSize(int width, int height) {
        ByteBuffer ihdr = ByteBuffer.allocate(17).put(ascii("IHDR")).putInt(width).putInt(height)
                .put(new byte[]{8, 0, 0, 0, 0});
        ByteBuffer out = ByteBuffer.allocate(8 + 25 + 12)
                .put(new byte[]{(byte) 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A});
        out.putInt(13).put(ihdr.array()).putInt(crc(ihdr.array()));
        out.putInt(0).put(ascii("IEND")).putInt(crc(ascii("IEND")));
        return out.array();
    }

    private static int crc(byte[] bytes) {
        CRC32 crc = new CRC32();
        crc.update(bytes);
        return (int) crc.getValue();
    }
}
