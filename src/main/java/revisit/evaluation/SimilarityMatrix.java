package revisit.evaluation;

import java.util.Arrays;

/**
 * Query-to-frame similarity scores of a scan, pooled into at most {@code maxBins x maxBins} cells so that memory
 * stays bounded for long scans; each cell keeps the highest score recorded in it. Frames are addressed by their
 * global index in a {@link FrameTimeline}. The pipeline records scores while it scans; the report draws the cells.
 */
public final class SimilarityMatrix {

    private final int frames;
    private final int bins;
    private final float[] cells;

    /**
     * @param frames  frames in the scan (the timeline's size), >= 1
     * @param maxBins most cells per axis, >= 1; typical 256 (a 256 x 256 float grid is 256 KB)
     */
    public SimilarityMatrix(int frames, int maxBins) {
        if (frames < 1 || maxBins < 1) {
            throw new IllegalArgumentException("need frames >= 1 and maxBins >= 1, were " + frames + ", " + maxBins);
        }
        this.frames = frames;
        this.bins = Math.min(frames, maxBins);
        this.cells = new float[bins * bins];
        Arrays.fill(cells, Float.NaN);
    }

    /** Frames covered. */
    public int frames() {
        return frames;
    }

    /** Cells per axis. */
    public int bins() {
        return bins;
    }

    /** The cell holding a frame's global index. */
    public int binOf(int globalIndex) {
        if (globalIndex < 0 || globalIndex >= frames) {
            throw new IllegalArgumentException("frame index " + globalIndex + " outside 0.." + (frames - 1));
        }
        return (int) ((long) globalIndex * bins / frames);
    }

    /** First global index of a cell (cells cover equal runs of frames, give or take one). */
    public double binStart(int bin) {
        return (double) bin * frames / bins;
    }

    /**
     * Records the similarity between a query and an earlier frame.
     *
     * @param score finite score, the same unit as the outcomes' scores
     */
    public void record(int queryGlobal, int frameGlobal, double score) {
        if (!Double.isFinite(score)) {
            throw new IllegalArgumentException("score must be finite, was " + score);
        }
        int k = binOf(queryGlobal) * bins + binOf(frameGlobal);
        if (Float.isNaN(cells[k]) || score > cells[k]) {
            cells[k] = (float) score;
        }
    }

    /** True when a score was recorded in the cell. */
    public boolean isSet(int queryBin, int frameBin) {
        return !Float.isNaN(cells[queryBin * bins + frameBin]);
    }

    /** The highest score recorded in a cell (check {@link #isSet} first). */
    public double value(int queryBin, int frameBin) {
        return cells[queryBin * bins + frameBin];
    }

    /** Smallest and largest recorded score, or {0, 1} when nothing was recorded. */
    public double[] range() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (float c : cells) {
            if (!Float.isNaN(c)) {
                lo = Math.min(lo, c);
                hi = Math.max(hi, c);
            }
        }
        return lo > hi ? new double[]{0, 1} : new double[]{lo, hi};
    }
}
