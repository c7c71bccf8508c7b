package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.SharedData;
import revisit.pipeline.ScanOutputs;

/**
 * A scan killed with SIGKILL part-way (a separate JVM, {@code Process.destroyForcibly}) and run again ends with
 * exactly the closures of an uninterrupted scan. Input: the Middlebury dino ring (Seitz et al., CVPR 2006,
 * ../shared/data/middlebury/dinoRing); vocabulary: the shipped vocab/default.rvoc.
 */
class ScanResumeTest {

    @TempDir
    Path dir;

    @Test
    void killedScanResumesToTheSameClosures() throws Exception {
        Path ring = SharedData.require("middlebury/dinoRing");
        Path vocab = Path.of(System.getProperty("user.dir")).resolve("vocab/default.rvoc");
        assumeTrue(Files.exists(vocab), "vocab/default.rvoc not found; skipped");
        List<String> args = List.of("scan", ring.toString(), "--vocabulary", vocab.toString(), "--quiet",
                "--set", "index.exclusionSeconds=0", "--set", "index.exclusionFrames=12", "--threads", "1");

        Path killed = dir.resolve("killed");
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "revisit.cli.Main"));
        cmd.addAll(args);
        cmd.addAll(List.of("-o", killed.toString()));
        Process child = new ProcessBuilder(cmd).redirectErrorStream(true)
                .redirectOutput(dir.resolve("child.log").toFile()).start();
        Path ckpt = killed.resolve(ScanOutputs.CHECKPOINT);
        long deadline = System.nanoTime() + 300_000_000_000L;
        while (child.isAlive() && System.nanoTime() < deadline
                && (!Files.exists(ckpt) || Files.size(ckpt) < 400_000)) {
            Thread.sleep(20);
        }
        assumeTrue(child.isAlive(), "the scan finished before it could be killed; nothing to test");
        child.destroyForcibly().waitFor();
        assertTrue(!Files.exists(killed.resolve(ScanOutputs.JSONL)), "no closures file may exist after a kill");

        assertEquals(0, scan(args, killed));
        assertTrue(Files.readString(killed.resolve(ScanOutputs.SUMMARY)).matches("(?s).*[1-9]\\d* recovered.*"),
                "the second run must recover frames from the checkpoint");
        Path whole = dir.resolve("whole");
        assertEquals(0, scan(args, whole));
        assertEquals(Files.readString(whole.resolve(ScanOutputs.JSONL)), Files.readString(killed.resolve(
                ScanOutputs.JSONL)));
        assertEquals(Files.readString(whole.resolve(ScanOutputs.TRACES)), Files.readString(killed.resolve(
                ScanOutputs.TRACES)));
    }

    private static int scan(List<String> args, Path out) {
        List<String> all = new ArrayList<>(args);
        all.addAll(List.of("-o", out.toString()));
        var cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(new StringWriter()));
        return cl.execute(all.toArray(String[]::new));
    }
}
