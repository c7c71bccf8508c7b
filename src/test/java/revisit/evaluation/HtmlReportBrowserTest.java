package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Renders the report in headless Chromium and checks the screenshot shows the plots; skips without a browser. */
class HtmlReportBrowserTest {

    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");

    @TempDir
    Path dir;

    @Test
    void reportRendersWithItsPlotsInHeadlessChromium() throws IOException, InterruptedException {
        assumeTrue(Files.isExecutable(CHROMIUM), "no browser at " + CHROMIUM + "; report rendering check skipped");
        ReportFixture fx = new ReportFixture();
        Path images = Files.createDirectories(dir.resolve("images"));
        Path index = HtmlReport.write(dir.resolve("report"),
                HtmlReportTest.fullInput(fx, fx.evaluate(0.3), images));
        Path shot = dir.resolve("screenshot.png");
        Process p = new ProcessBuilder(CHROMIUM.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + dir.resolve("profile"), "--screenshot=" + shot,
                "--window-size=1280,2000", index.toUri().toString())
                .redirectOutput(dir.resolve("chromium.out").toFile())
                .redirectError(dir.resolve("chromium.err").toFile())
                .start();
        boolean finished = p.waitFor(120, TimeUnit.SECONDS);
        if (!finished) {
            p.descendants().forEach(ProcessHandle::destroyForcibly);
            p.destroyForcibly();
        }
        assertTrue(finished, "chromium did not finish within 120 s");
        assertEquals(0, p.exitValue(), () -> "chromium failed: " + read(dir.resolve("chromium.err")));
        BufferedImage img = ImageIO.read(shot.toFile());
        assertEquals(1280, img.getWidth());
        assertEquals(2000, img.getHeight());
        // The plot colours appear only inside the PNG plots: finding them proves the page loaded its images.
        assertTrue(HtmlReportTest.count(img, ReportPlots.CURVE) > 100, "precision-recall plot visible");
        assertTrue(HtmlReportTest.count(img, ReportPlots.LABEL) > 100, "labels drawn in a visible plot");
    }

    private static String read(Path file) {
        try {
            List<String> lines = Files.readAllLines(file);
            return String.join(" | ", lines.subList(Math.max(0, lines.size() - 5), lines.size()));
        } catch (IOException e) {
            return "(no log: " + e.getMessage() + ")";
        }
    }
}
