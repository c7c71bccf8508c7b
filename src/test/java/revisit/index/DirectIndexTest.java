package revisit.index;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

class DirectIndexTest {

    @Test
    void groupsFeatureIndicesByNode() {
        NodeFeatures f = DirectIndex.decode(DirectIndex.encode(new int[]{5, 3, 5, 1_000_000, 3, 0}));
        assertArrayEquals(new int[]{0, 3, 5, 1_000_000}, f.nodes());
        assertArrayEquals(new int[]{5}, f.featuresOf(0));
        assertArrayEquals(new int[]{1, 4}, f.featuresOf(3));
        assertArrayEquals(new int[]{0, 2}, f.featuresOf(5));
        assertArrayEquals(new int[]{3}, f.featuresOf(1_000_000));
        assertArrayEquals(new int[0], f.featuresOf(7));
    }

    @Test
    void roundTripsRandomFramesCompactly() {
        Random random = new Random(31L);
        for (int trial = 0; trial < 200; trial++) {
            int[] nodes = new int[random.nextInt(600)];
            for (int i = 0; i < nodes.length; i++) {
                nodes[i] = random.nextInt(trial % 2 == 0 ? 100 : Integer.MAX_VALUE);
            }
            byte[] encoded = DirectIndex.encode(nodes);
            NodeFeatures f = DirectIndex.decode(encoded);
            int[] back = new int[nodes.length];
            Arrays.fill(back, -1);
            for (int k = 0; k < f.nodeCount(); k++) {
                for (int i = f.offsets()[k]; i < f.offsets()[k + 1]; i++) {
                    back[f.features()[i]] = f.nodes()[k];
                }
            }
            assertArrayEquals(nodes, back, "seed 31 trial " + trial);
            if (trial % 2 == 0 && nodes.length > 100) {
                assertTrue(encoded.length < 2.5 * nodes.length, encoded.length + " bytes for " + nodes.length);
            }
        }
    }

    @Test
    void rejectsMalformedEntries() {
        byte[] good = DirectIndex.encode(new int[]{4, 4, 9});
        assertThrows(IllegalArgumentException.class, () -> DirectIndex.decode(Arrays.copyOf(good, good.length - 1)));
        assertThrows(IllegalArgumentException.class, () -> DirectIndex.decode(Arrays.copyOf(good, good.length + 1)));
        assertThrows(IllegalArgumentException.class, () -> DirectIndex.decode(new byte[]{(byte) 0xFF, (byte) 0xFF,
                (byte) 0xFF, (byte) 0xFF, (byte) 0xFF, 0x01}));
    }

    @Test
    void databaseKeepsEachFramesNodes() {
        RevisitDatabase db = new RevisitDatabase(new WordWeights(50, TestFrames.idf(50, 0, 1L)),
                IndexConfig.defaults());
        db.add(new FrameWords(2, 7, 0.0, new int[]{1, 2, 3}, new int[]{8, 6, 8}));
        NodeFeatures f = db.featuresByNode(2, 7).orElseThrow();
        assertArrayEquals(new int[]{0, 2}, f.featuresOf(8));
        assertEquals(1, f.featuresOf(6)[0]);
        assertTrue(db.featuresByNode(2, 8).isEmpty());
    }
}
