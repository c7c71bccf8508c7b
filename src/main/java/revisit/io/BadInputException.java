package revisit.io;

/**
 * Input that cannot be used: a corrupt image, a malformed file, a missing folder. The message is one line that
 * names the file, says what was wrong and how to fix it; the CLI prints it as is.
 */
public class BadInputException extends RuntimeException {

    /** @param message one line: file, what was wrong, the fix */
    public BadInputException(String message) {
        super(message);
    }

    /**
     * @param message one line: file, what was wrong, the fix
     * @param cause   underlying error, shown only with --verbose
     */
    public BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
