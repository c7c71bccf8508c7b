package revisit.cli;

import picocli.CommandLine;

/** Entry point of the {@code revisit} command. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(RevisitCommand.commandLine().execute(args));
    }
}
