package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ParameterSpaceTest {

    @Test
    void gridValuesAreEvenlySpacedOnTheirScale() {
        assertArrayEquals(new double[]{0, 0.25, 0.5, 0.75, 1}, ParameterRange.linear("a", 0, 1, 5).gridValues(), 1e-15);
        assertArrayEquals(new double[]{1, 10, 100, 1000}, ParameterRange.log("b", 1, 1000, 4).gridValues(), 1e-9);
        // 0..3 in 7 steps: 0, 0.5, 1, 1.5, 2, 2.5, 3; rint rounds halves to even: 0, 0, 1, 2, 2, 2, 3 -> 0..3
        assertArrayEquals(new double[]{0, 1, 2, 3},
                new ParameterRange("c", 0, 3, 7, ParameterRange.Scale.LINEAR, true).gridValues());
        assertArrayEquals(new double[]{4}, ParameterRange.fixed("d", 4).gridValues());
    }

    @Test
    void gridIsTheCartesianProductWithTheLastParameterFastest() {
        ParameterSpace space = new ParameterSpace(List.of(ParameterRange.integers("a", 1, 2),
                ParameterRange.integers("b", 5, 7)));
        List<ParameterSetting> grid = space.grid(100);
        assertEquals(6, space.gridSize());
        assertEquals(List.of("a=1, b=5", "a=1, b=6", "a=1, b=7", "a=2, b=5", "a=2, b=6", "a=2, b=7"),
                grid.stream().map(ParameterSetting::toString).toList());
        assertThrows(IllegalArgumentException.class, () -> space.grid(5));
    }

    @Test
    void randomDrawsStayInRangeAndFollowTheSeed() {
        ParameterSpace space = new ParameterSpace(List.of(ParameterRange.log("rate", 0.01, 100, 2),
                ParameterRange.integers("count", 3, 9)));
        List<ParameterSetting> a = space.sample(200, 5);
        assertEquals(a, space.sample(200, 5));
        int belowOne = 0;
        for (ParameterSetting s : a) {
            assertTrue(s.value("rate") >= 0.01 && s.value("rate") <= 100);
            assertTrue(s.intValue("count") >= 3 && s.intValue("count") <= 9);
            belowOne += s.value("rate") < 1 ? 1 : 0;
        }
        // Log-uniform over 1e-2..1e2: half the draws fall below 1 (binomial, 200 draws: 100 +- 3 sigma = 79..121).
        assertTrue(belowOne > 78 && belowOne < 122, "below one: " + belowOne);
        assertEquals(ParameterRange.linear("x", 2, 3, 2).sample(new Random(9)),
                ParameterRange.linear("x", 2, 3, 2).sample(new Random(9)));
    }

    @Test
    void refusesInvalidRangesAndDuplicateNames() {
        assertThrows(IllegalArgumentException.class, () -> ParameterRange.linear("a", 2, 1, 3));
        assertThrows(IllegalArgumentException.class, () -> ParameterRange.log("a", 0, 1, 3));
        assertThrows(IllegalArgumentException.class, () -> ParameterRange.linear("a b", 0, 1, 3));
        assertThrows(IllegalArgumentException.class, () -> new ParameterSpace(List.of(
                ParameterRange.fixed("a", 1), ParameterRange.fixed("a", 2))));
        assertThrows(IllegalArgumentException.class, () -> new ParameterSetting(java.util.Map.of("a", 1.0)).value("b"));
    }
}
