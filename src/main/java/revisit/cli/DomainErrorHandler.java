package revisit.cli;

import java.io.UncheckedIOException;
import picocli.CommandLine;
import revisit.io.BadInputException;

/**
 * Turns a domain error into one line on stderr and exit code 1; the stack trace is printed only when the
 * command was given {@code --verbose}. Usage errors are picocli's (exit 2 with usage).
 */
final class DomainErrorHandler implements CommandLine.IExecutionExceptionHandler {

    /** Exit code of a domain error (bad input, failed write). */
    static final int DOMAIN_ERROR = 1;

    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        boolean verbose = parsed.hasMatchedOption("--verbose")
                || (parsed.subcommand() != null && deepVerbose(parsed));
        String message = ex.getMessage() == null ? ex.getClass().getSimpleName() : ex.getMessage();
        if (ex instanceof BadInputException || ex instanceof UncheckedIOException
                || ex instanceof IllegalArgumentException) {
            cl.getErr().println("revisit: " + message);
        } else {
            cl.getErr().println("revisit: internal error: " + message + " (rerun with --verbose for details)");
        }
        if (verbose) {
            ex.printStackTrace(cl.getErr());
        }
        return DOMAIN_ERROR;
    }

    private static boolean deepVerbose(CommandLine.ParseResult parsed) {
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            if (p.hasMatchedOption("--verbose")) {
                return true;
            }
        }
        return false;
    }
}
