package revisit.io;

/**
 * One frame of a sequence could not be used (damaged image, decoder failure). The source stays usable: calling
 * {@link FrameSource#next()} again continues with the following frame, so the caller decides by its
 * {@link BadFramePolicy} whether to skip the frame or stop.
 */
public class BadFrameException extends BadInputException {

    private final int frameIndex;
    private final String frameName;

    /**
     * @param frameIndex position of the bad frame in the whole source, as {@link Frame#index()}
     * @param frameName  its name, as {@link Frame#name()}
     * @param message    one line: file, what was wrong, the fix
     * @param cause      underlying error, may be null
     */
    public BadFrameException(int frameIndex, String frameName, String message, Throwable cause) {
        super(message, cause);
        this.frameIndex = frameIndex;
        this.frameName = frameName;
    }

    /** Position of the bad frame in the whole source, as {@link Frame#index()}. */
    public int frameIndex() {
        return frameIndex;
    }

    /** Name of the bad frame, as {@link Frame#name()}. */
    public String frameName() {
        return frameName;
    }
}
