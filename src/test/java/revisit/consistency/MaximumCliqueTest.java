package revisit.consistency;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class MaximumCliqueTest {

    @Test
    void equalsBruteForceOnSmallRandomGraphs() {
        // 300 graphs (seeds 0..299), 2..16 vertices, conflict probability 0.05..0.8.
        for (long seed = 0; seed < 300; seed++) {
            SplittableRandom random = new SplittableRandom(seed);
            int n = 2 + random.nextInt(15);
            List<BitSet> conflicts = randomConflicts(n, 0.05 + 0.75 * random.nextDouble(), random);
            MaximumClique.Result result = MaximumClique.find(conflicts, 300, Long.MAX_VALUE);
            assertTrue(result.exact());
            assertTrue(isClique(conflicts, result.members()), "seed " + seed);
            assertEquals(bruteForce(conflicts), result.members().length, "seed " + seed);
        }
    }

    @Test
    void keepsEveryVertexWithoutConflicts() {
        List<BitSet> conflicts = randomConflicts(6, 0, new SplittableRandom(1));
        conflict(conflicts, 1, 4);
        MaximumClique.Result result = MaximumClique.find(conflicts, 300, Long.MAX_VALUE);
        assertEquals(5, result.members().length);
        for (int v : new int[]{0, 2, 3, 5}) {
            assertTrue(contains(result.members(), v));
        }
    }

    @Test
    void findsTheHandCheckedCliqueOfAPentagonWithAPendant() {
        // Conflicts form a 5-cycle 0-1-2-3-4-0 plus 5-0: the largest conflict-free set is, e.g., {1, 3, 5}, size
        // 3 (the 5-cycle allows 2, vertex 5 adds one when 0 is left out).
        List<BitSet> conflicts = randomConflicts(6, 0, new SplittableRandom(1));
        int[][] edges = {{0, 1}, {1, 2}, {2, 3}, {3, 4}, {4, 0}, {5, 0}};
        for (int[] e : edges) {
            conflict(conflicts, e[0], e[1]);
        }
        MaximumClique.Result result = MaximumClique.find(conflicts, 300, Long.MAX_VALUE);
        assertEquals(3, result.members().length);
        assertTrue(isClique(conflicts, result.members()));
    }

    @Test
    void heuristicAboveTheSizeLimitReturnsAMaximalCliqueAndSaysSo() {
        for (long seed = 0; seed < 50; seed++) {
            SplittableRandom random = new SplittableRandom(seed);
            List<BitSet> conflicts = randomConflicts(14, 0.3, random);
            MaximumClique.Result result = MaximumClique.find(conflicts, 2, Long.MAX_VALUE);
            assertTrue(isClique(conflicts, result.members()), "seed " + seed);
            assertTrue(isMaximal(conflicts, result.members()), "seed " + seed);
            assertTrue(result.members().length <= bruteForce(conflicts));
        }
        assertFalse(MaximumClique.find(randomConflicts(14, 0.3, new SplittableRandom(3)), 2, Long.MAX_VALUE).exact());
    }

    @Test
    void stopsAtTheNodeBudgetWithAValidClique() {
        List<BitSet> conflicts = randomConflicts(60, 0.5, new SplittableRandom(5));
        MaximumClique.Result limited = MaximumClique.find(conflicts, 300, 10);
        assertFalse(limited.exact());
        assertTrue(isClique(conflicts, limited.members()));
    }

    @Test
    void componentsSplitTheConflictGraph() {
        List<BitSet> conflicts = randomConflicts(5, 0, new SplittableRandom(1));
        conflict(conflicts, 0, 3);
        conflict(conflicts, 1, 4);
        List<int[]> parts = MaximumClique.components(conflicts);
        assertEquals(3, parts.size());
        assertArrayEquals(new int[]{0, 3}, parts.get(0));
        assertArrayEquals(new int[]{1, 4}, parts.get(1));
        assertArrayEquals(new int[]{2}, parts.get(2));
    }

    static List<BitSet> randomConflicts(int n, double p, SplittableRandom random) {
        List<BitSet> conflicts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            conflicts.add(new BitSet(n));
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (random.nextDouble() < p) {
                    conflict(conflicts, i, j);
                }
            }
        }
        return conflicts;
    }

    private static void conflict(List<BitSet> conflicts, int i, int j) {
        conflicts.get(i).set(j);
        conflicts.get(j).set(i);
    }

    /** Largest conflict-free subset by enumerating all 2^n subsets. */
    private static int bruteForce(List<BitSet> conflicts) {
        int n = conflicts.size();
        int best = 0;
        for (int mask = 0; mask < (1 << n); mask++) {
            boolean ok = true;
            for (int i = 0; i < n && ok; i++) {
                if ((mask >> i & 1) == 0) {
                    continue;
                }
                for (int j = i + 1; j < n && ok; j++) {
                    ok = (mask >> j & 1) == 0 || !conflicts.get(i).get(j);
                }
            }
            if (ok) {
                best = Math.max(best, Integer.bitCount(mask));
            }
        }
        return best;
    }

    private static boolean isClique(List<BitSet> conflicts, int[] members) {
        for (int a : members) {
            for (int b : members) {
                if (conflicts.get(a).get(b)) {
                    return false;
                }
            }
        }
        return true;
    }

    private static boolean isMaximal(List<BitSet> conflicts, int[] members) {
        for (int v = 0; v < conflicts.size(); v++) {
            if (contains(members, v)) {
                continue;
            }
            boolean free = true;
            for (int m : members) {
                free &= !conflicts.get(v).get(m);
            }
            if (free) {
                return false;
            }
        }
        return true;
    }

    private static boolean contains(int[] members, int v) {
        for (int m : members) {
            if (m == v) {
                return true;
            }
        }
        return false;
    }
}
