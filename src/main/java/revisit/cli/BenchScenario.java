package revisit.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;
import picocli.CommandLine;
import revisit.io.BadInputException;

/** A small-preset scenario generated into a temporary folder for {@code bench}, deleted on close. */
final class BenchScenario implements AutoCloseable {

    private final Path root;

    private BenchScenario(Path root) {
        this.root = root;
    }

    /** Generates the small preset (default seed) with make-scenario; its messages go to {@code err}. */
    static BenchScenario generateSmall(PrintWriter err) {
        Path root;
        try {
            root = Files.createTempDirectory("revisit-bench-");
        } catch (IOException e) {
            throw new BadInputException("cannot create a temporary folder (" + e.getMessage()
                    + "); pass --scenario DIR made by 'revisit make-scenario'", e);
        }
        BenchScenario s = new BenchScenario(root);
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(err);
        cl.setErr(err);
        int rc = cl.execute("make-scenario", "--preset", "small", "-o", s.folder().toString());
        if (rc != 0) {
            s.close();
            throw new BadInputException(s.folder() + ": generating the scenario failed; pass --scenario DIR");
        }
        return s;
    }

    Path folder() {
        return root.resolve("yard");
    }

    @Override
    public void close() {
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        } catch (IOException e) {
            throw new BadInputException(root + ": cannot delete the temporary scenario (" + e.getMessage()
                    + "); delete it by hand", e);
        }
    }
}
