package revisit.io;

import java.util.function.Function;

/**
 * Reverses PNG's per-row filters in place (PNG specification, ISO/IEC 15948:2004, clause 9: None, Sub, Up,
 * Average, Paeth). Each row is one filter-type byte followed by {@code rowBytes} filtered bytes; arithmetic is
 * modulo 256 and the left neighbour is {@code bytesPerPixel} bytes back.
 */
final class PngFilters {

    private PngFilters() {
    }

    /**
     * @param raw      filtered rows, replaced by the unfiltered samples (filter bytes are left in place)
     * @param damaged  makes the error for an unknown filter type
     */
    static void undo(byte[] raw, int height, int rowBytes, int bytesPerPixel,
                     Function<String, BadInputException> damaged) {
        int stride = rowBytes + 1;
        for (int y = 0; y < height; y++) {
            int row = y * stride + 1;
            int above = row - stride;
            int type = raw[row - 1];
            switch (type) {
                case 0 -> { }
                case 1 -> sub(raw, row, rowBytes, bytesPerPixel);
                case 2 -> { if (y > 0) { up(raw, row, above, rowBytes); } }
                case 3 -> average(raw, row, above, y > 0, rowBytes, bytesPerPixel);
                case 4 -> paeth(raw, row, above, y > 0, rowBytes, bytesPerPixel);
                default -> throw damaged.apply("unknown filter type " + (type & 0xFF) + " on row " + y);
            }
        }
    }

    private static void sub(byte[] raw, int row, int n, int bpp) {
        for (int i = bpp; i < n; i++) {
            raw[row + i] += raw[row + i - bpp];
        }
    }

    private static void up(byte[] raw, int row, int above, int n) {
        for (int i = 0; i < n; i++) {
            raw[row + i] += raw[above + i];
        }
    }

    private static void average(byte[] raw, int row, int above, boolean hasAbove, int n, int bpp) {
        for (int i = 0; i < n; i++) {
            int left = i >= bpp ? raw[row + i - bpp] & 0xFF : 0;
            int up = hasAbove ? raw[above + i] & 0xFF : 0;
            raw[row + i] += (byte) ((left + up) >>> 1);
        }
    }

    private static void paeth(byte[] raw, int row, int above, boolean hasAbove, int n, int bpp) {
        if (!hasAbove) {
            sub(raw, row, n, bpp); // with no row above, Paeth's predictor is the left neighbour
            return;
        }
        for (int i = 0; i < bpp; i++) {
            raw[row + i] += raw[above + i]; // no left neighbour: the predictor is the byte above
        }
        for (int i = bpp; i < n; i++) {
            int a = raw[row + i - bpp] & 0xFF;
            int b = raw[above + i] & 0xFF;
            int c = raw[above + i - bpp] & 0xFF;
            int pa = Math.abs(b - c);
            int pb = Math.abs(a - c);
            int pc = Math.abs(a + b - 2 * c);
            int predictor = pa <= pb && pa <= pc ? a : pb <= pc ? b : c;
            raw[row + i] += (byte) predictor;
        }
    }
}
