package revisit.evaluation;

import revisit.index.IndexConfig;

/** The evaluation's exclusion window that excludes exactly what the detector's index excludes. */
public final class IndexWindows {

    private IndexWindows() {
    }

    /**
     * The index returns a frame of the query's own sequence only when {@code |dt| >= exclusionSeconds} and
     * {@code |df| >= exclusionFrames}; {@link ExclusionWindow} excludes when {@code dt <= seconds} or
     * {@code df <= frames}. So seconds become the largest double below the index's value and frames one less.
     */
    public static ExclusionWindow of(IndexConfig index) {
        double s = index.exclusionSeconds() > 0 ? Math.nextDown(index.exclusionSeconds()) : 0;
        int f = Math.max(0, index.exclusionFrames() - 1);
        return new ExclusionWindow(s, f);
    }
}
