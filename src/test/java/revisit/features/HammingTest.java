package revisit.features;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Equivalence: the packed Hamming distance equals a bit-by-bit count over the documented bit layout. */
class HammingTest {

    @Test
    void equalsBitByBitCountOnRandomDescriptors() {
        SplittableRandom random = new SplittableRandom(20240611L);
        int n = 200;
        long[] a = new long[n * FrameFeatures.STRIDE];
        long[] b = new long[n * FrameFeatures.STRIDE];
        for (int k = 0; k < a.length; k++) {
            a[k] = random.nextLong();
            b[k] = k % 7 == 0 ? a[k] : random.nextLong();
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j += 13) {
                assertEquals(bitByBit(a, i, b, j), Hamming.distance(a, i, b, j), "pair " + i + "," + j);
            }
        }
    }

    @Test
    void identicalAndComplementaryDescriptorsGiveZeroAndAllBits() {
        long[] a = {1L, -5L, 42L, Long.MIN_VALUE};
        long[] c = {~1L, ~-5L, ~42L, ~Long.MIN_VALUE};
        assertEquals(0, Hamming.distance(a, 0, a, 0));
        assertEquals(256, Hamming.distance(a, 0, c, 0));
    }

    /** Bit b of descriptor i is bit b % 64 of long i * 4 + b / 64 (FrameFeatures layout). */
    private static int bitByBit(long[] a, int i, long[] b, int j) {
        int count = 0;
        for (int bit = 0; bit < FrameFeatures.DESCRIPTOR_BITS; bit++) {
            long x = (a[i * FrameFeatures.STRIDE + bit / 64] >>> (bit % 64)) & 1;
            long y = (b[j * FrameFeatures.STRIDE + bit / 64] >>> (bit % 64)) & 1;
            count += x != y ? 1 : 0;
        }
        return count;
    }
}
