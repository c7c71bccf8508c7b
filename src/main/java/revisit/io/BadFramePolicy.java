package revisit.io;

/**
 * What a consumer of a {@link FrameSource} does when {@link FrameSource#next()} throws a
 * {@link BadFrameException}. The source itself applies no policy: it reports the bad frame and, when asked
 * again, continues with the following one.
 */
public enum BadFramePolicy {

    /**
     * Report the bad frame (name and reason) and continue with the next one. The frame is missing from the
     * results, so a revisit of that place can be missed; suited to long logs with the odd damaged file.
     */
    SKIP,

    /**
     * Stop at the first bad frame with its one-line error. Suited to curated datasets, where a damaged frame
     * means the copy is broken and results would silently differ from another run on a good copy.
     */
    STOP
}
