package revisit.io;

import boofcv.struct.image.GrayU8;

import java.awt.color.ColorSpace;
import java.awt.image.BufferedImage;
import java.awt.image.ColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.IndexColorModel;
import java.awt.image.Raster;

/**
 * Turns a decoded image into 8-bit grey by fixed, documented rules (see {@code docs/FORMAT-frames.md}).
 *
 * <ul>
 *   <li>Grey samples of {@code b} bits (maximum {@code M = 2^b - 1}) become {@code round(v * 255 / M)}, halves
 *       rounded up; for 16-bit samples that is {@code round(v / 257)}, so 0 stays 0 and 65535 becomes 255.</li>
 *   <li>Colour becomes luma {@code Y = 0.299 R + 0.587 G + 0.114 B}, the weights of ITU-R BT.601 (Studio encoding
 *       parameters of digital television, luminance equation), computed in integers on the stored samples and
 *       rounded once: {@code Y = round((299 R + 587 G + 114 B) * 255 / (1000 M))}.</li>
 *   <li>Palette images take the luma of each palette colour.</li>
 *   <li>Alpha is ignored (the stored colour is used, not composited on a background), and no colour management
 *       is applied: stored samples are used as they are (PNG gAMA and iCCP chunks are ignored).</li>
 *   <li>Any other layout (CMYK or YCbCr TIFF, 5-6-5 packed RGB, floating-point samples, ...) is first converted
 *       to 8-bit sRGB by Java's colour model, then to luma as above.</li>
 * </ul>
 */
final class GrayConversion {

    private GrayConversion() {
    }

    /** Grey value of one sample of {@code maxValue} full scale, rounded half up to 0..255. */
    static int scaleGray(int value, int maxValue) {
        long num = 2L * value * 255 + maxValue;
        return (int) (num / (2L * maxValue));
    }

    /** BT.601 luma of one colour sample triple of {@code maxValue} full scale, rounded half up to 0..255. */
    static int luma(int red, int green, int blue, int maxValue) {
        long weighted = (299L * red + 587L * green + 114L * blue) * 255L;
        long den = 1000L * maxValue;
        return (int) ((2 * weighted + den) / (2 * den));
    }

    /** Converts {@code image} to a new 8-bit grey image of the same size. */
    static GrayU8 toGray(BufferedImage image) {
        ColorModel cm = image.getColorModel();
        Raster raster = image.getRaster();
        if (image.getType() == BufferedImage.TYPE_BYTE_GRAY) {
            return fromByteGray(raster);
        }
        if (cm instanceof IndexColorModel palette) {
            return fromPalette(raster, palette);
        }
        int colourBands = cm.getNumColorComponents();
        ColorSpace space = cm.getColorSpace();
        if (!integerSamples(raster, colourBands)) {
            return fromAnyColour(image);
        }
        if (space.getType() == ColorSpace.TYPE_GRAY && colourBands == 1) {
            return fromGraySamples(raster);
        }
        if (space.isCS_sRGB() && colourBands == 3) {
            return fromRgbSamples(raster);
        }
        return fromAnyColour(image);
    }

    private static GrayU8 fromByteGray(Raster raster) {
        int width = raster.getWidth();
        int height = raster.getHeight();
        GrayU8 gray = new GrayU8(width, height);
        raster.getDataElements(0, 0, width, height, gray.data);
        return gray;
    }

    private static GrayU8 fromGraySamples(Raster raster) {
        int width = raster.getWidth();
        int height = raster.getHeight();
        int max = maxValue(raster, 0);
        GrayU8 gray = new GrayU8(width, height);
        int[] row = new int[width];
        for (int y = 0; y < height; y++) {
            raster.getSamples(0, y, width, 1, 0, row);
            int out = gray.startIndex + y * gray.stride;
            for (int x = 0; x < width; x++) {
                gray.data[out + x] = (byte) scaleGray(row[x], max);
            }
        }
        return gray;
    }

    private static GrayU8 fromRgbSamples(Raster raster) {
        int width = raster.getWidth();
        int height = raster.getHeight();
        int max = maxValue(raster, 0);
        GrayU8 gray = new GrayU8(width, height);
        int[] red = new int[width];
        int[] green = new int[width];
        int[] blue = new int[width];
        for (int y = 0; y < height; y++) {
            raster.getSamples(0, y, width, 1, 0, red);
            raster.getSamples(0, y, width, 1, 1, green);
            raster.getSamples(0, y, width, 1, 2, blue);
            int out = gray.startIndex + y * gray.stride;
            for (int x = 0; x < width; x++) {
                gray.data[out + x] = (byte) luma(red[x], green[x], blue[x], max);
            }
        }
        return gray;
    }

    private static GrayU8 fromPalette(Raster raster, IndexColorModel palette) {
        // indices beyond the palette map to black, as Java's own IndexColorModel does
        int size = palette.getMapSize();
        byte[] lumaOfIndex = new byte[1 << raster.getSampleModel().getSampleSize(0)];
        for (int i = 0; i < Math.min(size, lumaOfIndex.length); i++) {
            lumaOfIndex[i] = (byte) luma(palette.getRed(i), palette.getGreen(i), palette.getBlue(i), 255);
        }
        int width = raster.getWidth();
        int height = raster.getHeight();
        GrayU8 gray = new GrayU8(width, height);
        int[] row = new int[width];
        for (int y = 0; y < height; y++) {
            raster.getSamples(0, y, width, 1, 0, row);
            int out = gray.startIndex + y * gray.stride;
            for (int x = 0; x < width; x++) {
                gray.data[out + x] = lumaOfIndex[row[x]];
            }
        }
        return gray;
    }

    private static GrayU8 fromAnyColour(BufferedImage image) {
        int width = image.getWidth();
        int height = image.getHeight();
        GrayU8 gray = new GrayU8(width, height);
        int[] row = new int[width];
        for (int y = 0; y < height; y++) {
            image.getRGB(0, y, width, 1, row, 0, width);
            int out = gray.startIndex + y * gray.stride;
            for (int x = 0; x < width; x++) {
                int argb = row[x];
                gray.data[out + x] = (byte) luma((argb >> 16) & 0xFF, (argb >> 8) & 0xFF, argb & 0xFF, 255);
            }
        }
        return gray;
    }

    /** True when the colour bands hold integers of 1..16 bits, all of one depth. */
    private static boolean integerSamples(Raster raster, int colourBands) {
        int type = raster.getDataBuffer().getDataType();
        if (type != DataBuffer.TYPE_BYTE && type != DataBuffer.TYPE_USHORT && type != DataBuffer.TYPE_INT) {
            return false;
        }
        int bits = raster.getSampleModel().getSampleSize(0);
        for (int band = 1; band < colourBands; band++) {
            if (raster.getSampleModel().getSampleSize(band) != bits) {
                return false;
            }
        }
        return bits >= 1 && bits <= 16;
    }

    private static int maxValue(Raster raster, int band) {
        int bits = raster.getSampleModel().getSampleSize(band);
        return (1 << bits) - 1;
    }
}
