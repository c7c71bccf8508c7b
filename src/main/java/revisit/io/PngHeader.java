package revisit.io;

import java.nio.file.Path;

/**
 * The IHDR chunk of a PNG file (PNG specification, ISO/IEC 15948:2004, 11.2.2), validated.
 *
 * @param width      pixels, 1 .. 2^31 - 1
 * @param height     pixels, 1 .. 2^31 - 1
 * @param bitDepth   bits per sample: 1, 2, 4, 8 or 16 as the colour type allows
 * @param colourType 0 grey, 2 RGB, 3 palette, 4 grey + alpha, 6 RGBA
 * @param interlaced true for Adam7 interlacing
 */
record PngHeader(int width, int height, int bitDepth, int colourType, boolean interlaced) {

    /** Samples per pixel of a colour type (palette: 1 index). */
    int channels() {
        return switch (colourType) {
            case 2 -> 3;
            case 4 -> 2;
            case 6 -> 4;
            default -> 1;
        };
    }

    /** Bytes per complete pixel, the filter's left distance (at least 1). */
    int bytesPerPixel() {
        return Math.max(1, channels() * bitDepth / 8);
    }

    /** Bytes of one row of samples, without the filter-type byte. */
    int rowBytes() {
        return Math.toIntExact(((long) width * channels() * bitDepth + 7) / 8);
    }

    /** True for the layouts {@link PngReader} decodes itself: non-interlaced, no palette, 8 or 16 bits. */
    boolean fastPath() {
        return !interlaced && colourType != 3 && (bitDepth == 8 || bitDepth == 16);
    }

    /** Parses and validates the 13 data bytes of IHDR at {@code offset}. */
    static PngHeader parse(Path file, byte[] bytes, int offset, int length) {
        if (length != 13) {
            throw damaged(file, "IHDR chunk of " + length + " bytes, expected 13");
        }
        int width = readInt(bytes, offset);
        int height = readInt(bytes, offset + 4);
        int depth = bytes[offset + 8] & 0xFF;
        int colour = bytes[offset + 9] & 0xFF;
        int compression = bytes[offset + 10] & 0xFF;
        int filter = bytes[offset + 11] & 0xFF;
        int interlace = bytes[offset + 12] & 0xFF;
        if (width <= 0 || height <= 0) {
            throw damaged(file, "header size " + Integer.toUnsignedString(width) + "x"
                    + Integer.toUnsignedString(height) + " pixels; PNG needs at least 1x1");
        }
        ImageFiles.checkSize(file, width, height);
        if (!allowedDepth(colour, depth)) {
            throw damaged(file, "header bit depth " + depth + " with colour type " + colour + " is not allowed");
        }
        if (compression != 0 || filter != 0 || interlace > 1) {
            throw damaged(file, "header methods compression " + compression + ", filter " + filter + ", interlace "
                    + interlace + "; PNG defines only 0, 0 and 0 or 1");
        }
        return new PngHeader(width, height, depth, colour, interlace == 1);
    }

    private static boolean allowedDepth(int colour, int depth) {
        return switch (colour) {
            case 0 -> depth == 1 || depth == 2 || depth == 4 || depth == 8 || depth == 16;
            case 3 -> depth == 1 || depth == 2 || depth == 4 || depth == 8;
            case 2, 4, 6 -> depth == 8 || depth == 16;
            default -> false;
        };
    }

    private static int readInt(byte[] b, int pos) {
        return ((b[pos] & 0xFF) << 24) | ((b[pos + 1] & 0xFF) << 16) | ((b[pos + 2] & 0xFF) << 8) | (b[pos + 3] & 0xFF);
    }

    /** The one-line error for a damaged PNG file. */
    static BadInputException damaged(Path file, String what) {
        return new BadInputException(file + ": cannot be decoded (PNG " + what + "); the file is damaged or "
                + "truncated; re-export the file or remove it from the sequence");
    }
}
