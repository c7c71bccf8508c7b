package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SimilarityMatrixTest {

    @Test
    void poolsFramesIntoCellsKeepingTheHighestScore() {
        // 10 frames into 4 cells: cell = floor(frame * 4 / 10): frames 0-2 -> 0, 3-4 -> 1, 5-7 -> 2, 8-9 -> 3.
        SimilarityMatrix m = new SimilarityMatrix(10, 4);
        assertEquals(4, m.bins());
        assertEquals(0, m.binOf(2));
        assertEquals(1, m.binOf(3));
        assertEquals(2, m.binOf(7));
        assertEquals(3, m.binOf(9));
        m.record(9, 4, 0.2);
        m.record(8, 0, 0.7);
        m.record(9, 2, 0.4);
        assertTrue(m.isSet(3, 0));
        assertEquals(0.2, m.value(3, 1), 1e-7);
        assertEquals(0.7, m.value(3, 0), 1e-7);
        assertFalse(m.isSet(0, 3));
        assertArrayEquals(new double[]{0.2, 0.7}, m.range(), 1e-7);
        assertThrows(IllegalArgumentException.class, () -> m.record(10, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> m.record(5, 0, Double.NaN));
    }

    @Test
    void keepsOneCellPerFrameForShortScans() {
        SimilarityMatrix m = new SimilarityMatrix(5, 256);
        assertEquals(5, m.bins());
        assertEquals(4, m.binOf(4));
        assertArrayEquals(new double[]{0, 1}, m.range());
    }
}
