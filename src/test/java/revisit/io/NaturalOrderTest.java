package revisit.io;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class NaturalOrderTest {

    private static int compare(String a, String b) {
        return NaturalOrder.INSTANCE.compare(a, b);
    }

    @Test
    void numbersCompareByValueNotByCharacters() {
        assertTrue(compare("frame2.png", "frame10.png") < 0);
        assertTrue(compare("frame10.png", "frame2.png") > 0);
        assertTrue(compare("img_9_b", "img_10_a") < 0);
        assertTrue(compare("a99999999999999999999999", "a100000000000000000000000") < 0, "longer than a long");
    }

    @Test
    void textComparesIgnoringCaseAndShorterPrefixFirst() {
        assertTrue(compare("Frame3", "frame4") < 0);
        assertTrue(compare("frame", "frame1") < 0);
        assertTrue(compare("left_1", "right_0") < 0);
    }

    @Test
    void namesEqualByValueAreStillStrictlyOrdered() {
        assertTrue(compare("f1", "f01") < 0, "fewer leading zeros first");
        assertTrue(compare("F1", "f1") < 0, "then plain string order");
        assertEquals(0, compare("f01", "f01"));
    }

    @Test
    void sortingAnyShuffleGivesOneOrder() {
        List<String> expected = List.of("cam0_frame1.png", "cam0_frame2.png", "cam0_frame10.png",
                "cam0_frame100.png", "cam1_frame1.png", "cam10_frame1.png");
        Random random = new Random(11L);
        for (int trial = 0; trial < 20; trial++) {
            List<String> shuffled = new ArrayList<>(expected);
            Collections.shuffle(shuffled, random);
            shuffled.sort(NaturalOrder.INSTANCE);
            assertEquals(expected, shuffled, "seed 11, trial " + trial);
        }
    }
}
