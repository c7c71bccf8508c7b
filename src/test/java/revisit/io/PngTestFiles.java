package revisit.io;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.zip.CRC32;
import java.util.zip.Deflater;

/**
 * Writes small PNG files with a chosen filter type on every row (PNG specification, ISO/IEC 15948:2004: chunk
 * layout 5.3, IHDR 11.2.2, filters 9.2), so tests can reach layouts and damage an encoder would not produce.
 */
final class PngTestFiles {

    private PngTestFiles() {
    }

    /** A PNG whose data holds exactly the header's rows. */
    static byte[] encode(int width, int height, int colourType, int bitDepth, byte[] samples, int filter) {
        return encode(width, height, colourType, bitDepth, samples, filter, width, height);
    }

    /**
     * A PNG whose header says {@code width x height} but whose image data holds {@code dataWidth x dataHeight}
     * samples' rows, each filtered with {@code filter} (0-4; other values are written as they are).
     */
    static byte[] encode(int width, int height, int colourType, int bitDepth, byte[] samples, int filter,
                         int dataWidth, int dataHeight) {
        int channels = colourType == 2 ? 3 : 1;
        int bpp = Math.max(1, channels * bitDepth / 8);
        int rowBytes = dataWidth * channels * bitDepth / 8;
        byte[] rows = new byte[dataHeight * (rowBytes + 1)];
        for (int y = 0; y < dataHeight; y++) {
            rows[y * (rowBytes + 1)] = (byte) filter;
            for (int i = 0; i < rowBytes; i++) {
                int x = samples[y * rowBytes + i] & 0xFF;
                int a = i >= bpp ? samples[y * rowBytes + i - bpp] & 0xFF : 0;
                int b = y > 0 ? samples[(y - 1) * rowBytes + i] & 0xFF : 0;
                int c = y > 0 && i >= bpp ? samples[(y - 1) * rowBytes + i - bpp] & 0xFF : 0;
                rows[y * (rowBytes + 1) + 1 + i] = (byte) (x - predict(filter, a, b, c));
            }
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes(new byte[]{(byte) 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A});
        chunk(out, "IHDR", ByteBuffer.allocate(13).putInt(width).putInt(height).put((byte) bitDepth)
                .put((byte) colourType).put(new byte[3]).array());
        chunk(out, "IDAT", deflate(rows));
        chunk(out, "IEND", new byte[0]);
        return out.toByteArray();
    }

    private static int predict(int filter, int a, int b, int c) {
        return switch (filter) {
            case 1 -> a;
            case 2 -> b;
            case 3 -> (a + b) / 2;
            case 4 -> paeth(a, b, c);
            default -> 0;
        };
    }

    private static int paeth(int a, int b, int c) {
        int p = a + b - c;
        int pa = Math.abs(p - a);
        int pb = Math.abs(p - b);
        int pc = Math.abs(p - c);
        if (pa <= pb && pa <= pc) {
            return a;
        }
        return pb <= pc ? b : c;
    }

    private static byte[] deflate(byte[] data) {
        Deflater deflater = new Deflater();
        deflater.setInput(data);
        deflater.finish();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] buf = new byte[4096];
        while (!deflater.finished()) {
            out.write(buf, 0, deflater.deflate(buf));
        }
        deflater.end();
        return out.toByteArray();
    }

    private static void chunk(ByteArrayOutputStream out, String type, byte[] data) {
        byte[] typeBytes = type.getBytes(StandardCharsets.US_ASCII);
        CRC32 crc = new CRC32();
        crc.update(typeBytes);
        crc.update(data);
        out.writeBytes(ByteBuffer.allocate(4).putInt(data.length).array());
        out.writeBytes(typeBytes);
        out.writeBytes(data);
        out.writeBytes(ByteBuffer.allocate(4).putInt((int) crc.getValue()).array());
    }
}
