package revisit.features;

import boofcv.struct.image.GrayU8;
import java.util.Arrays;

/**
 * Corners of one level: FAST ({@link FastSegmentTest}), 3x3 non-maximum suppression on the FAST score over dark
 * and bright corners together, and the Harris measure (Harris and Stephens, "A combined corner and edge
 * detector", Alvey Vision Conference 1988) that ORB ranks its corners by. Corners and FAST scores equal those of
 * BoofCV's {@code FastCornerDetector} (CornerDetectorTest). Not thread-safe: one instance per extractor.
 */
final class CornerDetector {

    /** Radius of the FAST circle, pixels. */
    static final int FAST_RADIUS = 3;
    /** Half side of the Harris window (7x7, as in OpenCV's ORB, from memory). */
    private static final int HARRIS_RADIUS = 3;

    private final FastSegmentTest segmentTest;
    /** The whole-row test for FAST-9 on busy rows; null for other arcs. */
    private final DenseSegmentTest denseTest;
    /** Int copy of the level for {@link #detect(GrayU8, int, LevelCorners)}. */
    private int[][] ownRows = new int[0][];
    private final double harrisK;
    /** Columns the Harris window's gradients read: the window plus one on each side. */
    private static final int HARRIS_SPAN = 2 * HARRIS_RADIUS + 3;
    private final int[] harrisSmooth = new int[HARRIS_SPAN];
    private final int[] harrisDiff = new int[HARRIS_SPAN];
    /** FAST score per level pixel (row stride = level width); zero except at the current candidates. */
    private float[] scores = new float[0];
    private int[] candidates = new int[1024];
    /** Number of corners of the current level recorded in {@link #candidates}. */
    private int found;
    /**
     * Row busyness above which the whole-row test is used: one corner in this many pixels. Over the levels of three
     * 640x480 photos (thread CPU time, docs/FEATURES.md) 16 was about as fast as the pre-tested test alone on sparse
     * chair image000 and as the whole-row test alone on dense stairs01 (8.0 against 13.7 ms).
     */
    static final int DENSE_ROW_PIXELS_PER_CORNER = 16;
    /**
     * The same after a row of the pre-tested test, counted in pixels that passed the pre-tests (about 3.6 per corner
     * on pixabay car01). 3, 4, 6 and 8 gave the same FAST time on chair, car01 and stairs01 within the noise
     * (thread CPU time, docs/FEATURES.md).
     */
    static final int DENSE_ROW_PIXELS_PER_QUEUED = 4;

    CornerDetector(FeatureConfig config) {
        this.segmentTest = new FastSegmentTest(config.fastThreshold(), config.fastArc());
        this.denseTest = config.fastArc() == 9 ? new DenseSegmentTest(config.fastThreshold()) : null;
        this.harrisK = config.harrisK();
    }

    /**
     * Finds the FAST corners of {@code level} at least {@code border} pixels from every edge that survive 3x3
     * non-maximum suppression; their score is the FAST score.
     *
     * @param level  raw level image, not modified
     * @param border margin, level pixels (at least {@value #FAST_RADIUS} + 1)
     * @param out    cleared and filled with the corners in raster order, level pixels
     */
    void detect(GrayU8 level, int border, LevelCorners out) {
        if (ownRows.length < level.height || (level.height > 0 && ownRows[0].length != level.width)) {
            ownRows = new int[level.height][level.width];
        }
        for (int y = 0; y < level.height; y++) {
            for (int x = 0; x < level.width; x++) {
                ownRows[y][x] = level.data[level.startIndex + y * level.stride + x] & 0xFF;
            }
        }
        detect(level, ownRows, border, out);
    }

    /**
     * As {@link #detect(GrayU8, int, LevelCorners)}, with the level's pixels also given as int rows
     * ({@code rows[y][x]}, as {@link ScalePyramid} keeps them) for the whole-row test.
     */
    void detect(GrayU8 level, int[][] rows, int border, LevelCorners out) {
        out.clear();
        int w = level.width;
        if (w - 2 * border < 1 || level.height - 2 * border < 1) {
            return;
        }
        if (scores.length < w * level.height) {
            scores = new float[w * level.height];
        }
        found = 0;
        scanRows(level, rows, border);
        for (int k = 0; k < found; k++) {
            int p = candidates[k];
            if (isPeak(p, w)) {
                out.add(p % w, p / w, scores[p]);
            }
        }
        for (int k = 0; k < found; k++) {
            scores[candidates[k]] = 0;
        }
    }

    /**
     * Runs the segment test on every row, recording the corners in row order: the whole-row test on a row after a
     * busy one, else the pre-tests, whose queued pixels get the full test in one batch before the next whole-row
     * test and at the end (both tests give the same corners).
     */
    private void scanRows(GrayU8 level, int[][] rows, int border) {
        if (denseTest != null) {
            denseTest.startLevel();
        }
        segmentTest.startLevel();
        int w = level.width;
        int xTo = w - border;
        int busy = 0;
        boolean queued = false;
        for (int y = border; y < level.height - border; y++) {
            int rowStart = level.startIndex + y * level.stride;
            if (denseTest != null && busy > xTo - border) {
                if (queued) {
                    flush(level);
                    queued = false;
                }
                int n = denseTest.scanRow(level.data, rowStart, level.stride, rows, y, border, xTo);
                reserve(n);
                for (int k = 0; k < n; k++) {
                    record(y * w + denseTest.x(k), denseTest.score(k));
                }
                busy = n * DENSE_ROW_PIXELS_PER_CORNER;
            } else {
                int n = segmentTest.scanRow(level.data, rowStart, level.stride, rows, y, border, xTo);
                queued |= n > 0;
                busy = n * DENSE_ROW_PIXELS_PER_QUEUED;
            }
        }
        if (queued) {
            flush(level);
        }
    }

    /** Full test of the pixels queued by the pre-tests; records the corners. */
    private void flush(GrayU8 level) {
        int n = segmentTest.flush(level.data);
        reserve(n);
        for (int k = 0; k < n; k++) {
            record(segmentTest.y(k) * level.width + segmentTest.x(k), segmentTest.score(k));
        }
    }

    private void reserve(int more) {
        if (found + more > candidates.length) {
            candidates = Arrays.copyOf(candidates, Math.max(2 * candidates.length, found + more));
        }
    }

    private void record(int p, int score) {
        scores[p] = score;
        candidates[found++] = p;
    }

    /** Strict 3x3 maximum of the score; of equal neighbours the first in raster order wins. */
    private boolean isPeak(int p, int w) {
        float s = scores[p];
        return s > scores[p - w - 1] && s > scores[p - w] && s > scores[p - w + 1] && s > scores[p - 1]
                && s >= scores[p + 1] && s >= scores[p + w - 1] && s >= scores[p + w] && s >= scores[p + w + 1];
    }

    /**
     * Harris measure det(M) - k trace(M)^2 of the 7x7 window of Sobel gradients around (x, y), gradients in grey
     * levels per pixel and M averaged over the window. Per window row the vertical Sobel parts are summed once per
     * column ({@code [1 2 1]} smoothing for gx, the difference for gy) and shared by the three window pixels that
     * use them; all sums are integers, so the result equals the direct 3x3 evaluation exactly.
     */
    double harrisScore(GrayU8 img, int x, int y) {
        byte[] d = img.data;
        int s = img.stride;
        int[] smooth = harrisSmooth;
        int[] diff = harrisDiff;
        long sxx = 0;
        long syy = 0;
        long sxy = 0;
        for (int dy = -HARRIS_RADIUS; dy <= HARRIS_RADIUS; dy++) {
            int row = img.startIndex + (y + dy) * s + x - HARRIS_RADIUS - 1;
            for (int c = 0; c < HARRIS_SPAN; c++) {
                int up = d[row + c - s] & 0xFF;
                int down = d[row + c + s] & 0xFF;
                smooth[c] = up + 2 * (d[row + c] & 0xFF) + down;
                diff[c] = down - up;
            }
            for (int c = 1; c < HARRIS_SPAN - 1; c++) {
                int gx = smooth[c + 1] - smooth[c - 1];
                int gy = diff[c - 1] + 2 * diff[c] + diff[c + 1];
                sxx += gx * gx;
                syy += gy * gy;
                sxy += gx * gy;
            }
        }
        int n = (2 * HARRIS_RADIUS + 1) * (2 * HARRIS_RADIUS + 1);
        double norm = 1.0 / (64.0 * n);
        double a = sxx * norm;
        double b = syy * norm;
        double c = sxy * norm;
        return a * b - c * c - harrisK * (a + b) * (a + b);
    }
}
