package revisit.io;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.Set;

/**
 * Test helper: box surgery on ISO base media files (ISO/IEC 14496-12). {@link #indexFirst} moves the 'moov' index
 * box in front of the 'mdat' media data and shifts every chunk offset ('stco', 'co64') by the index size, the
 * layout that streaming writers produce, so that a cut file still has its index.
 */
final class Mp4Boxes {

    private static final Set<String> CONTAINERS = Set.of("moov", "trak", "mdia", "minf", "stbl", "edts");

    private Mp4Boxes() {
    }

    /** Offset of the first top-level box of {@code type}. */
    static int topLevelOffset(byte[] file, String type) {
        for (int p = 0; p + 8 <= file.length; p += boxSize(file, p)) {
            if (type(file, p).equals(type)) {
                return p;
            }
        }
        throw new IllegalArgumentException("no top-level '" + type + "' box");
    }

    /** The same file with 'moov' moved directly before 'mdat' and the chunk offsets shifted to match. */
    static byte[] indexFirst(byte[] file) {
        int moov = topLevelOffset(file, "moov");
        int mdat = topLevelOffset(file, "mdat");
        if (moov < mdat) {
            return file.clone();
        }
        int moovSize = boxSize(file, moov);
        byte[] index = java.util.Arrays.copyOfRange(file, moov, moov + moovSize);
        shiftChunkOffsets(ByteBuffer.wrap(index), 8, moovSize, moovSize);
        ByteArrayOutputStream out = new ByteArrayOutputStream(file.length);
        out.write(file, 0, mdat);
        out.write(index, 0, index.length);
        out.write(file, mdat, moov - mdat);
        out.write(file, moov + moovSize, file.length - moov - moovSize);
        return out.toByteArray();
    }

    private static void shiftChunkOffsets(ByteBuffer box, int from, int to, int delta) {
        for (int p = from; p + 8 <= to; p += box.getInt(p)) {
            String type = type(box.array(), p);
            if (CONTAINERS.contains(type)) {
                shiftChunkOffsets(box, p + 8, p + box.getInt(p), delta);
            } else if (type.equals("stco")) {
                int count = box.getInt(p + 12);
                for (int i = 0; i < count; i++) {
                    box.putInt(p + 16 + 4 * i, box.getInt(p + 16 + 4 * i) + delta);
                }
            } else if (type.equals("co64")) {
                int count = box.getInt(p + 12);
                for (int i = 0; i < count; i++) {
                    box.putLong(p + 16 + 8 * i, box.getLong(p + 16 + 8 * i) + delta);
                }
            }
        }
    }

    private static int boxSize(byte[] file, int p) {
        int size = ByteBuffer.wrap(file).getInt(p);
        if (size < 8) {
            throw new IllegalArgumentException("box at " + p + " has size " + size + " (64-bit or open-ended "
                    + "sizes are not handled by this test helper)");
        }
        return size;
    }

    private static String type(byte[] file, int p) {
        return new String(file, p + 4, 4, StandardCharsets.ISO_8859_1);
    }
}
