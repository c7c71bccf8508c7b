package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class BenchCommandTest {

    private static int run(StringWriter out, StringWriter err, String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void benchOnATinyScenarioPrintsEveryTableRowAndVerifiesAllCrossSessionPairs(@TempDir Path dir) {
        Path yard = dir.resolve("yard");
        StringWriter err = new StringWriter();
        assertEquals(0, run(new StringWriter(), err, "make-scenario", "-o", yard.toString(), "--preset", "small",
                "--frames", "210", "--loops", "1", "--size", "160x120", "--clean", "--threads", "2"), err.toString());
        StringWriter out = new StringWriter();
        assertEquals(0, run(out, err, "bench", "--scenario", yard.toString(), "--frames", "10", "--stride", "2"),
                err.toString());
        String table = out.toString();
        for (String row : new String[] {"| 2 | FEATURES |", "| 2 | TOTAL |", "| 2 | wall per frame |",
            "| 1 | VERIFY |", "| 1 | wall per frame |", "| verification CPU ms |", "| <= 5.0 m, <= 50 deg |",
            "| <= 9.0 m, <= 80 deg |", "| vocabulary node | ", "| brute force | "}) {
            assertTrue(table.contains(row), row + " missing in:\n" + table);
        }
        // 10 frames per session 0.2 s apart lie within the scan's 20 s exclusion window of each other, so only the
        // 10 x 10 cross-session pairs are allowed (ExclusionWindow: other sequences are never excluded).
        assertTrue(table.contains("| verifications | 100 |"), table);

        StringWriter timing = new StringWriter();
        assertEquals(0, run(timing, err, "bench", "--scenario", yard.toString(), "--frames", "10", "--timing-only"),
                err.toString());
        String times = timing.toString();
        assertTrue(!times.contains("| verifications |"), "--timing-only skips the exhaustive comparison:\n" + times);
        java.util.regex.Matcher cpu = java.util.regex.Pattern
                .compile("\\| 2 \\| CPU per frame \\([^|]*\\| 20 \\| \\| \\| ([0-9.]+) \\|").matcher(times);
        assertTrue(cpu.find(), "CPU per frame row over the 20 frames missing in:\n" + times);
        assertTrue(Double.parseDouble(cpu.group(1)) > 0, "thread CPU time was measured: " + cpu.group(0));
    }
}
