package revisit.vocabulary;

/**
 * Receives the progress of vocabulary training. Work is counted in descriptor-levels: every training descriptor
 * contributes one unit per tree level, so {@code total} is descriptors times depth.
 */
@FunctionalInterface
public interface TrainingProgress {

    /** Ignores progress. */
    TrainingProgress NONE = (done, total) -> { };

    /**
     * Called after each node of the tree is finished, from worker threads but never concurrently; {@code done}
     * never decreases.
     *
     * @param done  units finished so far
     * @param total units in the whole training run
     */
    void advanced(long done, long total);
}
