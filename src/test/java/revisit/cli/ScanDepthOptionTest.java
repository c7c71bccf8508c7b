package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import revisit.camera.CameraFile;
import revisit.camera.CameraModel;

/** {@code scan --depth} refuses inputs it cannot use with one line, before any output is written. */
class ScanDepthOptionTest {

    @TempDir
    Path tmp;

    private Path frames() throws IOException {
        Path folder = Files.createDirectories(tmp.resolve("frames"));
        ImageIO.write(new BufferedImage(64, 48, BufferedImage.TYPE_BYTE_GRAY), "png",
                folder.resolve("f0.png").toFile());
        return folder;
    }

    private static String run(int expectedCode, String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(err));
        assertEquals(expectedCode, cl.execute(args), err.toString());
        return err.toString().strip();
    }

    @Test
    void depthWithoutACameraIsRefused() throws IOException {
        Path out = tmp.resolve("out");
        String err = run(1, "scan", "--quiet", frames().toString(), "--depth", frames().toString(),
                "-o", out.toString());
        assertTrue(err.contains("--depth needs --camera"), err);
        assertEquals(1, err.lines().count(), err);
        assertTrue(!Files.exists(out.resolve("closures.jsonl")));
    }

    @Test
    void aMissingDepthFolderIsNamed() throws IOException {
        Path camera = tmp.resolve("cam.json");
        CameraFile.write(camera, CameraModel.pinhole(64, 48, 60, 60, 31.5, 23.5));
        Path missing = tmp.resolve("no-depth-here");
        String err = run(1, "scan", "--quiet", frames().toString(), "--camera", camera.toString(), "--depth",
                missing.toString(), "-o", tmp.resolve("out").toString());
        assertTrue(err.contains(missing.toString()) && err.contains("depth folder not found"), err);
    }
}
