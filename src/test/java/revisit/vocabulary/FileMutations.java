package revisit.vocabulary;

import java.nio.ByteBuffer;
import java.util.Arrays;
import java.util.SplittableRandom;

/** Seeded damage to a file's bytes for fuzz tests: flips, hostile integers, cuts, insertions. */
final class FileMutations {

    private static final int[] HOSTILE = {0, 1, -1, 2, 3, 255, 256, 65535, Integer.MAX_VALUE, Integer.MIN_VALUE,
        0x7FFFFFF0, 1 << 24};

    private FileMutations() {
    }

    /**
     * One to three random edits of {@code original}; in half of the cases the trailing CRC32 is then recomputed so
     * that the damage reaches the checks behind the checksum.
     */
    static byte[] mutate(byte[] original, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        byte[] b = original.clone();
        int edits = 1 + rnd.nextInt(3);
        for (int e = 0; e < edits && b.length > 8; e++) {
            b = edit(b, rnd);
        }
        if (rnd.nextBoolean() && b.length >= 4) {
            VocabularyFileTest.fixCrc(b);
        }
        return b;
    }

    private static byte[] edit(byte[] b, SplittableRandom rnd) {
        switch (rnd.nextInt(5)) {
            case 0 -> {
                int at = rnd.nextInt(b.length);
                b[at] ^= (byte) (1 << rnd.nextInt(8));
                return b;
            }
            case 1 -> {
                int at = rnd.nextInt(b.length - 3);
                ByteBuffer.wrap(b).putInt(at, HOSTILE[rnd.nextInt(HOSTILE.length)]);
                return b;
            }
            case 2 -> {
                return Arrays.copyOf(b, rnd.nextInt(b.length));
            }
            case 3 -> {
                int at = rnd.nextInt(b.length);
                int n = 1 + rnd.nextInt(16);
                byte[] out = new byte[b.length + n];
                System.arraycopy(b, 0, out, 0, at);
                for (int i = 0; i < n; i++) {
                    out[at + i] = (byte) rnd.nextInt(256);
                }
                System.arraycopy(b, at, out, at + n, b.length - at);
                return out;
            }
            default -> {
                int at = rnd.nextInt(b.length);
                int n = Math.min(b.length - at, 1 + rnd.nextInt(16));
                byte[] out = new byte[b.length - n];
                System.arraycopy(b, 0, out, 0, at);
                System.arraycopy(b, at + n, out, at, b.length - at - n);
                return out;
            }
        }
    }
}
