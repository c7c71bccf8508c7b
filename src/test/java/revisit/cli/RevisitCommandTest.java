package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class RevisitCommandTest {

    private static int run(StringWriter out, StringWriter err, String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void helpListsUsageAndExitsZero() {
        StringWriter out = new StringWriter();
        assertEquals(0, run(out, new StringWriter(), "--help"));
        assertTrue(out.toString().contains("Usage: revisit"), out.toString());
    }

    @Test
    void versionNamesTheTool() {
        StringWriter out = new StringWriter();
        assertEquals(0, run(out, new StringWriter(), "--version"));
        assertTrue(out.toString().startsWith("revisit "), out.toString());
    }

    @Test
    void unknownOptionIsAUsageErrorWithExitTwo() {
        StringWriter err = new StringWriter();
        assertEquals(2, run(new StringWriter(), err, "--no-such-option"));
        assertTrue(err.toString().contains("Unknown option"), err.toString());
    }
}
