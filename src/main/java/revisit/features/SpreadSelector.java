package revisit.features;

import java.util.Arrays;

/**
 * Picks a level's quota of corners so that they cover the image: the level is cut into square cells, and
 * corners are taken round by round, each round taking up to {@code cellCap} of the best remaining corners of every
 * cell, rounds in order and corners within a round by score. A textured part of the image cannot use up the whole
 * quota, yet a cell of weak corners does not displace strong ones before other cells have given {@code cellCap}
 * each (with a cap of 1 every cell gives its best corner first, which cost about a fifth of the repeatability on
 * graf1/graf3; docs/FEATURES.md). Ties are broken by candidate index, so the choice is deterministic.
 *
 * <p>Both orderings are counting sorts when they can be: FAST scores are whole numbers below
 * {@value #COUNTING_LIMIT}, and rounds are small whole numbers. Sorting packed keys instead took about 2 ms per
 * frame on a densely textured 640x480 photo with 41,000 candidates (docs/FEATURES.md). Not thread-safe: one
 * instance per extractor.
 */
final class SpreadSelector {

    /** Scores that are whole numbers in [0, this) are ranked by counting; the FAST score is at most 16 x 255. */
    static final int COUNTING_LIMIT = 4096;

    private final int cellPx;
    private final int cellCap;
    private long[] keys = new long[256];
    private int[] byRank = new int[256];
    private int[] rounds = new int[256];
    private int[] cellCount = new int[64];
    private final int[] scoreCount = new int[COUNTING_LIMIT];

    /**
     * @param cellPx  side of a cell, level pixels
     * @param cellCap corners a cell gives per round
     */
    SpreadSelector(int cellPx, int cellCap) {
        this.cellPx = cellPx;
        this.cellCap = cellCap;
    }

    /**
     * @param corners     candidates of one level
     * @param quota       how many to keep
     * @param levelWidth  level width, pixels
     * @param levelHeight level height, pixels
     * @param chosen      receives the chosen candidate indices, best first; length at least {@code quota}
     * @return number chosen: {@code min(quota, corners.count())}
     */
    int select(LevelCorners corners, int quota, int levelWidth, int levelHeight, int[] chosen) {
        int n = corners.count();
        int keep = Math.min(quota, n);
        if (keep <= 0) {
            return 0;
        }
        if (byRank.length < n) {
            int size = Math.max(n, 2 * byRank.length);
            keys = new long[size];
            byRank = new int[size];
            rounds = new int[size + 1];
        }
        if (!rankByCounting(corners, n)) {
            rankBySorting(corners, n);
        }
        int cellsX = (levelWidth + cellPx - 1) / cellPx;
        int cells = cellsX * ((levelHeight + cellPx - 1) / cellPx);
        if (cellCount.length < cells) {
            cellCount = new int[cells];
        }
        Arrays.fill(cellCount, 0, cells, 0);
        int lastRound = 0;
        for (int r = 0; r < n; r++) {
            int i = byRank[r];
            int cell = (corners.y(i) / cellPx) * cellsX + corners.x(i) / cellPx;
            int round = cellCount[cell]++ / cellCap;
            keys[r] = round;
            lastRound = Math.max(lastRound, round);
        }
        takeByRound(n, lastRound, keep, chosen);
        return keep;
    }

    /**
     * Writes the first {@code keep} candidates in order of (round, rank) to {@code chosen}: a counting sort on the
     * rounds in {@link #keys}, stable in rank.
     */
    private void takeByRound(int n, int lastRound, int keep, int[] chosen) {
        int[] start = rounds;
        Arrays.fill(start, 0, lastRound + 2, 0);
        for (int r = 0; r < n; r++) {
            start[(int) keys[r] + 1]++;
        }
        for (int k = 1; k <= lastRound + 1; k++) {
            start[k] += start[k - 1];
        }
        for (int r = 0; r < n; r++) {
            int position = start[(int) keys[r]]++;
            if (position < keep) {
                chosen[position] = byRank[r];
            }
        }
    }

    /**
     * Fills {@link #byRank} with the candidates by descending score, ties by index, with a counting sort.
     *
     * @return false, touching nothing, if some score is not a whole number in [0, {@value #COUNTING_LIMIT}) (or is
     *         -0, which the sorted order puts after +0)
     */
    private boolean rankByCounting(LevelCorners corners, int n) {
        for (int i = 0; i < n; i++) {
            float s = corners.score(i);
            if (!(s < COUNTING_LIMIT && s == (int) s && Float.floatToIntBits(s) >= 0)) {
                return false;
            }
        }
        int[] count = scoreCount;
        Arrays.fill(count, 0);
        for (int i = 0; i < n; i++) {
            count[COUNTING_LIMIT - 1 - (int) corners.score(i)]++;
        }
        int position = 0;
        for (int v = 0; v < COUNTING_LIMIT; v++) {
            int c = count[v];
            count[v] = position;
            position += c;
        }
        for (int i = 0; i < n; i++) {
            byRank[count[COUNTING_LIMIT - 1 - (int) corners.score(i)]++] = i;
        }
        return true;
    }

    /** Fills {@link #byRank} with the candidates by descending score, ties by index, by sorting packed keys. */
    private void rankBySorting(LevelCorners corners, int n) {
        for (int i = 0; i < n; i++) {
            keys[i] = ((long) descending(corners.score(i)) << 32) | i;
        }
        Arrays.sort(keys, 0, n);
        for (int r = 0; r < n; r++) {
            byRank[r] = (int) keys[r];
        }
    }

    /** Signed int whose natural order is the descending order of {@code score}. */
    static int descending(float score) {
        int bits = Float.floatToIntBits(score);
        int ascending = bits ^ ((bits >> 31) & 0x7FFFFFFF);
        return ~ascending;
    }
}
