package revisit.pipeline;

/** Receives progress of a scan (the CLI draws a progress bar from it). Called from the scan's own thread. */
public interface ScanListener {

    /** A sequence starts; {@code frames} is -1 when unknown. */
    default void sequenceStarted(int sequence, String description, int frames) {
    }

    /** A frame has been processed. */
    default void frameDone(QueryTrace trace, int closuresSoFar) {
    }

    /** A frame could not be read and was skipped; {@code message} is one line naming the file. */
    default void frameSkipped(String message) {
    }

    /** A listener that ignores everything. */
    static ScanListener silent() {
        return new ScanListener() {
        };
    }
}
