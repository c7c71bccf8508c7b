package revisit.index;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class WordVectorTest {

    /*
     * Hand-worked example (worked here, checkable on paper). Vocabulary of 4 words, idf = {1.0, 2.0, 0.5, 0.0}.
     *   A = words [0, 0, 1, 2] -> counts (2, 1, 1, 0) -> n_i * idf_i = (2, 2, 0.5, 0)
     *   B = words [0, 1, 1, 3] -> counts (1, 2, 0, 1) -> n_i * idf_i = (1, 4, 0, 0)   (word 3 has idf 0: dropped)
     * L1: Z_A = 4.5, A = (4/9, 4/9, 1/9); Z_B = 5, B = (1/5, 4/5, 0).
     *   s = 1 - |A - B|_1 / 2 = 1 - (11/45 + 16/45 + 5/45) / 2 = 1 - 16/45 = 29/45 = 0.644444...
     *   (equivalently sum of minima: 1/5 + 4/9 = 29/45)
     * L2: |A| = sqrt(8.25) = sqrt(33)/2, |B| = sqrt(17); A.B = (2*1 + 2*4) / (sqrt(33)/2 * sqrt(17))
     *   = 20 / sqrt(561) = 0.844401...
     */
    private static final WordWeights WEIGHTS = new WordWeights(4, new double[]{1.0, 2.0, 0.5, 0.0});
    private static final int[] A = {0, 0, 1, 2};
    private static final int[] B = {0, 1, 1, 3};

    @Test
    void scoresHandWorkedExampleWithL1() {
        WordVector a = WordVector.of(A, WEIGHTS, ScoreNorm.L1);
        WordVector b = WordVector.of(B, WEIGHTS, ScoreNorm.L1);
        assertArrayEquals(new int[]{0, 1, 2}, a.words());
        assertArrayEquals(new int[]{2, 1, 1}, a.counts());
        assertArrayEquals(new float[]{4f / 9, 4f / 9, 1f / 9}, a.weights(), 1e-7f);
        assertArrayEquals(new int[]{0, 1}, b.words());
        assertEquals(29.0 / 45, a.similarity(b), 1e-7);
        assertEquals(29.0 / 45, b.similarity(a), 1e-7);
    }

    @Test
    void scoresHandWorkedExampleWithL2() {
        WordVector a = WordVector.of(A, WEIGHTS, ScoreNorm.L2);
        WordVector b = WordVector.of(B, WEIGHTS, ScoreNorm.L2);
        assertEquals(20 / Math.sqrt(561), a.similarity(b), 1e-7);
        assertEquals(1.0, a.similarity(a), 1e-6);
    }

    @Test
    void identicalFramesScoreOne() {
        WordVector a = WordVector.of(A, WEIGHTS, ScoreNorm.L1);
        WordVector shuffled = WordVector.of(new int[]{2, 0, 1, 0}, WEIGHTS, ScoreNorm.L1);
        assertEquals(1.0, a.similarity(shuffled), 1e-6);
    }

    @Test
    void frameOfOnlyZeroWeightWordsIsEmpty() {
        WordVector v = WordVector.of(new int[]{3, 3}, WEIGHTS, ScoreNorm.L1);
        assertEquals(0, v.size());
        assertEquals(0.0, v.similarity(WordVector.of(A, WEIGHTS, ScoreNorm.L1)));
    }

    @Test
    void rejectsWordOutsideVocabulary() {
        assertThrows(IllegalArgumentException.class, () -> WordVector.of(new int[]{0, 4}, WEIGHTS, ScoreNorm.L1));
        assertThrows(IllegalArgumentException.class, () -> WordVector.of(new int[]{-1}, WEIGHTS, ScoreNorm.L1));
    }

    @Test
    void rejectsInvalidWeightTable() {
        assertThrows(IllegalArgumentException.class, () -> new WordWeights(2, new double[]{1.0}));
        assertThrows(IllegalArgumentException.class, () -> new WordWeights(2, new double[]{1.0, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> new WordWeights(2, new double[]{1.0, -0.5}));
    }
}
