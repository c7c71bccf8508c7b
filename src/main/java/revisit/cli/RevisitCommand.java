package revisit.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top-level {@code revisit} command; each task is a subcommand. */
@Command(name = "revisit", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Finds where a camera sequence revisits a place, proves each revisit geometrically and "
                + "exports verified closures for pose-graph optimizers.",
        subcommands = {
                CommandLine.HelpCommand.class,
                DemoCommand.class,
                ScanCommand.class,
                EvaluateCommand.class,
                TuneCommand.class,
                VocabTrainCommand.class,
                VocabInfoCommand.class,
                FeaturesCommand.class,
                VerifyPairCommand.class,
                BenchCommand.class,
                MakeScenarioCommand.class})
public final class RevisitCommand implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    /** Builds the command line with all subcommands and the house error handling. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new RevisitCommand());
        cl.setExecutionExceptionHandler(new DomainErrorHandler());
        return cl;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
