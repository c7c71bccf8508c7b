package revisit.io;

import boofcv.struct.image.GrayU8;

import java.nio.file.Path;

/**
 * Strict reader for the Netpbm grey and colour formats (PGM {@code P2}/{@code P5}, PPM {@code P3}/{@code P6}),
 * which Java's ImageIO does not read. Follows the Netpbm format pages (netpbm.sourceforge.net/doc/pgm.html and
 * ppm.html): header tokens separated by white space, {@code #} comments in the header, one white-space byte after
 * the maximum value, binary samples of one byte (maximum below 256) or two big-endian bytes. Samples are turned
 * into grey by the rules of {@link GrayConversion}. A file shorter than its header promises is rejected.
 */
final class PnmReader {

    private final Path file;
    private final byte[] bytes;
    private int pos;

    private PnmReader(Path file, byte[] bytes) {
        this.file = file;
        this.bytes = bytes;
    }

    /** True when {@code head} starts with a magic number this reader handles. */
    static boolean isPnm(byte[] head, int length) {
        return length >= 2 && head[0] == 'P' && (head[1] == '2' || head[1] == '3' || head[1] == '5' || head[1] == '6');
    }

    /** Decodes the whole file content {@code bytes} of {@code file}. */
    static GrayU8 read(Path file, byte[] bytes) {
        return new PnmReader(file, bytes).decode();
    }

    private GrayU8 decode() {
        char kind = (char) bytes[1];
        pos = 2;
        int width = number("header width");
        int height = number("header height");
        int maxValue = number("header maximum value");
        if (maxValue < 1 || maxValue > 65535) {
            throw bad("maximum sample value " + maxValue + " outside 1..65535");
        }
        ImageFiles.checkSize(file, width, height);
        boolean colour = kind == '3' || kind == '6';
        boolean ascii = kind == '2' || kind == '3';
        int[] samples = ascii ? asciiSamples(width, height, colour, maxValue)
                : binarySamples(width, height, colour, maxValue);
        return toGray(samples, width, height, colour, maxValue);
    }

    private int number(String what) {
        skipSpaceAndComments();
        long value = 0;
        int digits = 0;
        while (pos < bytes.length && Character.isDigit(bytes[pos]) && value <= Integer.MAX_VALUE) {
            value = value * 10 + (bytes[pos++] - '0');
            digits++;
        }
        if (digits == 0 || value > Integer.MAX_VALUE) {
            throw bad(what + " missing or not a whole number at byte " + pos);
        }
        return (int) value;
    }

    private void skipSpaceAndComments() {
        while (pos < bytes.length) {
            byte b = bytes[pos];
            if (b == '#') {
                while (pos < bytes.length && bytes[pos] != '\n' && bytes[pos] != '\r') {
                    pos++;
                }
            } else if (Character.isWhitespace(b)) {
                pos++;
            } else {
                return;
            }
        }
    }

    private int[] binarySamples(int width, int height, boolean colour, int maxValue) {
        if (pos >= bytes.length || !Character.isWhitespace(bytes[pos])) {
            throw bad("no white space after the header");
        }
        pos++;
        int count = width * height * (colour ? 3 : 1);
        int bytesPerSample = maxValue < 256 ? 1 : 2;
        long needed = (long) count * bytesPerSample;
        if (bytes.length - pos < needed) {
            throw bad("truncated: " + (bytes.length - pos) + " bytes of pixel data, header promises " + needed);
        }
        int[] samples = new int[count];
        for (int i = 0; i < count; i++) {
            int v = bytesPerSample == 1 ? bytes[pos++] & 0xFF
                    : ((bytes[pos++] & 0xFF) << 8) | (bytes[pos++] & 0xFF);
            samples[i] = checkedSample(v, maxValue, i);
        }
        return samples;
    }

    private int[] asciiSamples(int width, int height, boolean colour, int maxValue) {
        int count = width * height * (colour ? 3 : 1);
        int[] samples = new int[count];
        for (int i = 0; i < count; i++) {
            skipSpaceAndComments();
            if (pos >= bytes.length) {
                throw bad("truncated: " + i + " samples, header promises " + count);
            }
            samples[i] = checkedSample(number("sample " + i), maxValue, i);
        }
        return samples;
    }

    private int checkedSample(int value, int maxValue, int index) {
        if (value > maxValue) {
            throw bad("sample " + index + " is " + value + ", above the maximum value " + maxValue);
        }
        return value;
    }

    private static GrayU8 toGray(int[] samples, int width, int height, boolean colour, int maxValue) {
        GrayU8 gray = new GrayU8(width, height);
        for (int y = 0; y < height; y++) {
            int out = gray.startIndex + y * gray.stride;
            for (int x = 0; x < width; x++) {
                int i = y * width + x;
                gray.data[out + x] = (byte) (colour
                        ? GrayConversion.luma(samples[3 * i], samples[3 * i + 1], samples[3 * i + 2], maxValue)
                        : GrayConversion.scaleGray(samples[i], maxValue));
            }
        }
        return gray;
    }

    private BadInputException bad(String what) {
        return new BadInputException(file + ": not a valid PGM/PPM image (" + what
                + "); re-export it or convert it to PNG");
    }
}
