package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import revisit.features.FrameFeatures;

class BitCounterTest {

    /** Straightforward reference: tests each bit of each member. */
    private static int naiveCount(long[] data, int[] cluster, int c, int bit) {
        int n = 0;
        for (int i = 0; i < cluster.length; i++) {
            if (cluster[i] == c && (data[i * FrameFeatures.STRIDE + bit / 64] >>> (bit % 64) & 1L) != 0) {
                n++;
            }
        }
        return n;
    }

    @Test
    void countsEveryBitLikeANaiveLoopAcrossLaneFlushes() {
        int n = 1500;
        long[] data = SyntheticDescriptors.random(n, 11);
        int[] cluster = new int[n];
        BitCounter counter = new BitCounter(3);
        for (int i = 0; i < n; i++) {
            cluster[i] = (i * 7) % 3;
            counter.add(cluster[i], data, i);
        }
        for (int c = 0; c < 3; c++) {
            assertEquals(n / 3, counter.members(c));
            for (int bit = 0; bit < FrameFeatures.DESCRIPTOR_BITS; bit++) {
                assertEquals(naiveCount(data, cluster, c, bit), counter.count(c, bit), "cluster " + c + " bit " + bit);
            }
        }
    }

    @Test
    void mergedCountersEqualOneCounterOverAllMembers() {
        int n = 900;
        long[] data = SyntheticDescriptors.random(n, 12);
        BitCounter whole = new BitCounter(2);
        BitCounter first = new BitCounter(2);
        BitCounter second = new BitCounter(2);
        for (int i = 0; i < n; i++) {
            whole.add(i % 2, data, i);
            (i < 400 ? first : second).add(i % 2, data, i);
        }
        first.addAll(second);
        long[] a = new long[2 * FrameFeatures.STRIDE];
        long[] b = new long[2 * FrameFeatures.STRIDE];
        for (int c = 0; c < 2; c++) {
            whole.majority(c, a);
            first.majority(c, b);
            assertEquals(whole.members(c), first.members(c));
        }
        assertArrayEquals(a, b);
    }

    @Test
    void majoritySetsABitOnlyWhenMoreThanHalfTheMembersHaveIt() {
        // Hand-made: 4 members; bit 0 set in 3 (majority), bit 1 in 2 (tie -> cleared), bit 64 in all 4,
        // bit 255 in 1.
        long[] data = {
            0b11L, 1L, 0, 0,
            0b11L, 1L, 0, 0,
            0b01L, 1L, 0, 0,
            0b00L, 1L, 0, Long.MIN_VALUE,
        };
        BitCounter counter = new BitCounter(1);
        for (int i = 0; i < 4; i++) {
            counter.add(0, data, i);
        }
        long[] centre = new long[FrameFeatures.STRIDE];
        counter.majority(0, centre);
        assertArrayEquals(new long[]{0b01L, 1L, 0, 0}, centre);
    }

    @Test
    void majorityLeavesTheCentreOfAnEmptyClusterAlone() {
        BitCounter counter = new BitCounter(2);
        long[] centres = {1, 2, 3, 4, 5, 6, 7, 8};
        counter.majority(1, centres);
        assertArrayEquals(new long[]{1, 2, 3, 4, 5, 6, 7, 8}, centres);
    }
}
