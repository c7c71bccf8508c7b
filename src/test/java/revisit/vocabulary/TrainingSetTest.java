package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class TrainingSetTest {

    @Test
    void builderKeepsImagesApartAndGrowsPastItsFirstBuffer() {
        TrainingSet.Builder builder = new TrainingSet.Builder();
        long[] big = SyntheticDescriptors.random(3000, 1);
        builder.add(big, 3000);
        builder.add(new long[0], 0);
        builder.add(SyntheticDescriptors.random(2, 2), 2);
        TrainingSet set = builder.build();
        assertEquals(3002, set.count());
        assertEquals(3, set.imageCount());
        assertArrayEquals(new int[]{0, 3000, 3000}, set.imageStarts());
        assertArrayEquals(big, Arrays.copyOf(set.descriptors(), 3000 * 4));
        int[] image = set.imageOfDescriptor();
        assertEquals(0, image[2999]);
        assertEquals(2, image[3000]);
        assertEquals(2, image[3001]);
    }

    @Test
    void rejectsImageStartsThatDoNotAscendFromZero() {
        long[] d = new long[40];
        assertThrows(IllegalArgumentException.class, () -> new TrainingSet(d, 10, new int[]{1, 5}));
        assertThrows(IllegalArgumentException.class, () -> new TrainingSet(d, 10, new int[]{0, 6, 5}));
        assertThrows(IllegalArgumentException.class, () -> new TrainingSet(d, 10, new int[]{0, 11}));
        assertThrows(IllegalArgumentException.class, () -> new TrainingSet(d, 11, new int[]{0}));
    }
}
