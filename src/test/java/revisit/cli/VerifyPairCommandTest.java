package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import revisit.camera.CameraFile;
import revisit.camera.CameraModel;

/** Runs {@code revisit verify-pair} on Middlebury templeSparseRing views (Seitz et al., CVPR 2006). */
class VerifyPairCommandTest {

    @TempDir
    Path tmp;

    private static Path temple(String name) {
        Path cwd = Path.of(System.getProperty("user.dir"));
        for (Path p : List.of(cwd.resolve("../shared/data"), cwd.resolve("../../shared/data"),
                Path.of("/work/shared/data"))) {
            Path f = p.resolve("middlebury/templeSparseRing").resolve(name);
            if (Files.isRegularFile(f)) {
                return f;
            }
        }
        assumeTrue(false, "../shared/data/middlebury/templeSparseRing not found: command check skipped");
        return cwd;
    }

    /** The camera of templeSR0007 from templeSR_par.txt (K only; these images have no distortion). */
    private Path cameraFile() {
        Path file = tmp.resolve("temple.json");
        CameraFile.write(file, CameraModel.pinhole(640, 480, 1520.4, 1525.9, 302.32, 246.87));
        return file;
    }

    private static int run(StringWriter out, StringWriter err, String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void neighbouringViewsAreAcceptedWithPoseAndPicture() throws IOException {
        Path png = tmp.resolve("out.png");
        StringWriter out = new StringWriter();
        int code = run(out, new StringWriter(), "verify-pair", temple("templeSR0007.png").toString(),
                temple("templeSR0008.png").toString(), "--camera", cameraFile().toString(), "-o", png.toString());
        assertEquals(0, code, out.toString());
        String text = out.toString();
        assertTrue(text.contains("verdict:     ACCEPTED (model ESSENTIAL)"), text);
        assertTrue(text.contains("rotation:") && text.contains("translation: direction"), text);
        BufferedImage picture = ImageIO.read(png.toFile());
        assertEquals(1280, picture.getWidth());
        assertTrue(picture.getHeight() > 480);
    }

    @Test
    void viewsFiftyDegreesApartAreRejectedWithExitThree() {
        StringWriter out = new StringWriter();
        int code = run(out, new StringWriter(), "verify-pair", temple("templeSR0002.png").toString(),
                temple("templeSR0003.png").toString(), "--camera", cameraFile().toString(), "-o",
                tmp.resolve("r.png").toString());
        assertEquals(VerifyPairCommand.REJECTED, code, out.toString());
        assertFalse(out.toString().contains("ACCEPTED"), out.toString());
        assertTrue(out.toString().contains("pose:        none (pair not accepted)"), out.toString());
    }

    @Test
    void cameraOfAnotherImageSizeIsOneLineError() {
        Path camera = tmp.resolve("small.json");
        CameraFile.write(camera, CameraModel.pinhole(320, 240, 500, 500, 160, 120));
        StringWriter err = new StringWriter();
        int code = run(new StringWriter(), err, "verify-pair", temple("templeSR0007.png").toString(),
                temple("templeSR0008.png").toString(), "--camera", camera.toString(), "-o",
                tmp.resolve("x.png").toString());
        assertEquals(1, code);
        assertTrue(err.toString().contains("camera is 320x240 but"), err.toString());
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertFalse(Files.exists(tmp.resolve("x.png")));
    }

    @Test
    void missingImageIsOneLineError() {
        StringWriter err = new StringWriter();
        int code = run(new StringWriter(), err, "verify-pair", tmp.resolve("nope.png").toString(),
                tmp.resolve("nope2.png").toString(), "-o", tmp.resolve("y.png").toString());
        assertEquals(1, code);
        assertTrue(err.toString().contains("nope.png"), err.toString());
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
    }

    @Test
    void badRatioIsAUsageError() {
        StringWriter err = new StringWriter();
        assertEquals(2, run(new StringWriter(), err, "verify-pair", "a.png", "b.png", "--ratio", "1.5"));
        assertTrue(err.toString().contains("ratio"), err.toString());
    }
}
