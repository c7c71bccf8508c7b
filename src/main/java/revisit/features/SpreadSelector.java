package revisit.features;

import java.util.Arrays;

/**
 * Picks a level's quota of corners so that they cover the image: the level is cut into square cells, and
 * corners are taken round by round, each round taking up to {@code cellCap} of the best remaining corners of every
 * cell, rounds in order and corners within a round by score. A textured part of the image cannot use up the whole
 * quota, yet a cell of weak corners does not displace strong ones before other cells have given {@code cellCap}
 * each (with a cap of 1 every cell gives its best corner first, which cost about a fifth of the repeatability on
 * graf1/graf3; docs/FEATURES.md). Ties are broken by candidate index, so the choice is deterministic.
 * Not thread-safe: one instance per extractor.
 */
final class SpreadSelector {

    private final int cellPx;
    private final int cellCap;
    private long[] keys = new long[256];
    private int[] byRank = new int[256];
    private int[] cellCount = new int[64];

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
        if (keys.length < n) {
            keys = new long[Math.max(n, 2 * keys.length)];
            byRank = new int[keys.length];
        }
        for (int i = 0; i < n; i++) {
            keys[i] = ((long) descending(corners.score(i)) << 32) | i;
        }
        Arrays.sort(keys, 0, n);
        int cellsX = (levelWidth + cellPx - 1) / cellPx;
        int cells = cellsX * ((levelHeight + cellPx - 1) / cellPx);
        if (cellCount.length < cells) {
            cellCount = new int[cells];
        }
        Arrays.fill(cellCount, 0, cells, 0);
        for (int r = 0; r < n; r++) {
            int i = (int) keys[r];
            int cell = (corners.y(i) / cellPx) * cellsX + corners.x(i) / cellPx;
            int round = cellCount[cell]++ / cellCap;
            keys[r] = ((long) round << 32) | r;
            byRank[r] = i;
        }
        Arrays.sort(keys, 0, n);
        for (int k = 0; k < keep; k++) {
            chosen[k] = byRank[(int) keys[k]];
        }
        return keep;
    }

    /** Signed int whose natural order is the descending order of {@code score}. */
    static int descending(float score) {
        int bits = Float.floatToIntBits(score);
        int ascending = bits ^ ((bits >> 31) & 0x7FFFFFFF);
        return ~ascending;
    }
}
