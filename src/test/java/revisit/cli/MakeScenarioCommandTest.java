package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class MakeScenarioCommandTest {

    private static int run(StringWriter out, StringWriter err, String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    private static String[] tiny(Path dir, String... more) {
        String[] base = {"make-scenario", "-o", dir.toString(), "--preset", "small", "--frames", "100", "--loops", "1",
            "--size", "96x72", "--no-second-session", "--clean", "--threads", "2"};
        String[] all = new String[base.length + more.length];
        System.arraycopy(base, 0, all, 0, base.length);
        System.arraycopy(more, 0, all, base.length, more.length);
        return all;
    }

    @Test
    void writesAScenarioFolderAndReportsIt(@TempDir Path dir) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        Path target = dir.resolve("yard");
        assertEquals(0, run(out, err, tiny(target)), err.toString());
        assertTrue(out.toString().startsWith("wrote " + target + ": 100 frames in 1 session(s), 96x72, seed 7"),
                out.toString());
        assertTrue(err.toString().contains("100% (100/100 frames)"), err.toString());
        assertTrue(Files.exists(target.resolve("session1/frames/frame_00099.png")));
        assertTrue(Files.exists(target.resolve("session1/depth/depth_00099.png")));
        assertTrue(Files.exists(target.resolve("manifest.json")));
    }

    @Test
    void refusesNonEmptyFolderWithExitOneUnlessOverwrite(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("keep.txt"), "x");
        StringWriter err = new StringWriter();
        assertEquals(1, run(new StringWriter(), err, tiny(dir)));
        assertTrue(err.toString().startsWith("revisit: " + dir + ": folder is not empty"), err.toString());
        assertEquals(0, run(new StringWriter(), new StringWriter(), tiny(dir, "--overwrite")));
        assertTrue(Files.exists(dir.resolve("README.txt")));
    }

    @Test
    void badSizeOrTooFewFramesAreUsageErrors(@TempDir Path dir) {
        StringWriter err = new StringWriter();
        assertEquals(2, run(new StringWriter(), err, "make-scenario", "-o", dir.toString(), "--size", "640"));
        assertTrue(err.toString().contains("--size must look like 640x480"), err.toString());
        StringWriter err2 = new StringWriter();
        assertEquals(2, run(new StringWriter(), err2, "make-scenario", "-o", dir.toString(), "--frames", "40"));
        assertTrue(err2.toString().contains("use at least"), err2.toString());
    }
}
