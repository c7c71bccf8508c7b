package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import revisit.features.FrameFeatures;
import revisit.features.Hamming;

class DescriptorMatcherTest {

    private final DescriptorMatcher matcher = new DescriptorMatcher(VerificationConfig.defaults());

    /** Frame b holds copies of a's descriptors with a few flipped bits, shuffled, plus random extra features. */
    private static FrameFeatures[] plantedPair(long seed, int shared, int extra) {
        Random rnd = new Random(seed);
        long[] da = new long[shared * 4];
        for (int i = 0; i < da.length; i++) {
            da[i] = rnd.nextLong();
        }
        int nb = shared + extra;
        long[] db = new long[nb * 4];
        for (int i = 0; i < shared; i++) {
            int j = (i * 7 + 3) % shared;
            System.arraycopy(da, i * 4, db, j * 4, 4);
            for (int flip = 0; flip < 10; flip++) {
                int bit = rnd.nextInt(256);
                db[j * 4 + bit / 64] ^= 1L << (bit % 64);
            }
        }
        for (int i = shared * 4; i < db.length; i++) {
            db[i] = rnd.nextLong();
        }
        return new FrameFeatures[]{withDescriptors(da), withDescriptors(db)};
    }

    private static FrameFeatures withDescriptors(long[] d) {
        int n = d.length / 4;
        return new FrameFeatures(n, new float[n], new float[n], new float[n], new int[n], new float[n],
                new float[n], d);
    }

    @Test
    void bruteForceFindsEveryPlantedPair() {
        FrameFeatures[] p = plantedPair(3, 200, 100);
        Correspondences m = matcher.matchAll(p[0], p[1]);
        assertEquals(200, m.count());
        for (int k = 0; k < m.count(); k++) {
            assertEquals((m.indexA()[k] * 7 + 3) % 200, m.indexB()[k]);
            assertEquals(Hamming.distance(p[0].descriptors(), m.indexA()[k], p[1].descriptors(), m.indexB()[k]),
                    m.distanceBits()[k]);
        }
    }

    @Test
    void singleNodeEqualsBruteForce() {
        FrameFeatures[] p = plantedPair(5, 150, 150);
        Correspondences all = matcher.matchAll(p[0], p[1]);
        Correspondences nodes = matcher.matchWithinNodes(p[0], new int[p[0].count()], p[1], new int[p[1].count()]);
        assertArrayEquals(all.indexA(), nodes.indexA());
        assertArrayEquals(all.indexB(), nodes.indexB());
        assertArrayEquals(all.distanceBits(), nodes.distanceBits());
    }

    @Test
    void nodeRestrictionOnlyPairsFeaturesOfTheSameNode() {
        FrameFeatures[] p = plantedPair(9, 300, 0);
        int[] nodesA = new int[300];
        int[] nodesB = new int[300];
        for (int i = 0; i < 300; i++) {
            nodesA[i] = i % 10;
            nodesB[(i * 7 + 3) % 300] = i % 10;
        }
        nodesB[(5 * 7 + 3) % 300] = 99;
        Correspondences m = matcher.matchWithinNodes(p[0], nodesA, p[1], nodesB);
        assertEquals(299, m.count());
        for (int k = 0; k < m.count(); k++) {
            assertEquals(nodesA[m.indexA()[k]], nodesB[m.indexB()[k]]);
        }
    }

    @Test
    void ratioTestDropsAmbiguousMatches() {
        long[] da = {0, 0, 0, 0};
        long[] db = {0xFFL, 0, 0, 0, 0x1FFL, 0, 0, 0};
        Correspondences strict = matcher.matchAll(withDescriptors(da), withDescriptors(db));
        assertEquals(0, strict.count(), "8 vs 9 bits fails 8 < 0.8 * 9");
        Correspondences loose = new DescriptorMatcher(VerificationConfig.defaults().withRatio(0.9))
                .matchAll(withDescriptors(da), withDescriptors(db));
        assertEquals(1, loose.count());
        assertEquals(8, loose.distanceBits()[0]);
    }

    @Test
    void mutualCheckDropsOneSidedMatches() {
        long[] da = {0, 0, 0, 0, 0x3L, 0, 0, 0};
        long[] db = {0x1L, 0, 0, 0};
        Correspondences m = new DescriptorMatcher(VerificationConfig.defaults().withRatio(1.0))
                .matchAll(withDescriptors(da), withDescriptors(db));
        assertEquals(1, m.count(), "both a features pick b0, b0 picks only one of them");
        assertTrue(m.indexA()[0] == 0);
    }

    @Test
    void rejectsShortNodeArrays() {
        FrameFeatures[] p = plantedPair(1, 10, 0);
        assertThrows(IllegalArgumentException.class,
                () -> matcher.matchWithinNodes(p[0], new int[3], p[1], new int[10]));
    }
}
