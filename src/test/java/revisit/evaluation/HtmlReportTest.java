package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HtmlReportTest {

    @TempDir
    Path dir;

    /** Pixels of exactly this colour in an image. */
    static int count(BufferedImage img, Color c) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                n += (img.getRGB(x, y) & 0xFFFFFF) == (c.getRGB() & 0xFFFFFF) ? 1 : 0;
            }
        }
        return n;
    }

    static ReportInput fullInput(ReportFixture fx, EvaluationResult r, Path images) throws IOException {
        List<ImagePair> pairs = List.of(
                new ImagePair(new FrameKey("loop", 70), new FrameKey("loop", 10), ReportFixture.frameImage(images, 70),
                        ReportFixture.frameImage(images, 10)),
                new ImagePair(new FrameKey("loop", 80), new FrameKey("loop", 20), images.resolve("missing.png"),
                        ReportFixture.frameImage(images, 20)));
        return ReportInput.of("Loop <test> & report", r, fx.labels).withSimilarity(fx.similarity)
                .withPoses(fx.poses).withPairs(pairs);
    }

    @Test
    void writesASelfContainedFolderWithMetricsPlotsAndThumbnails() throws IOException {
        ReportFixture fx = new ReportFixture();
        EvaluationResult r = fx.evaluate(0.3);
        Path images = Files.createDirectories(dir.resolve("images"));
        Path out = dir.resolve("report");
        Path index = HtmlReport.write(out, fullInput(fx, r, images));
        String html = Files.readString(index);
        assertTrue(html.contains("<h1>Loop &lt;test&gt; &amp; report</h1>"), "title escaped");
        assertTrue(html.contains("recall at 100% precision (headline)"));
        String headline = String.format(Locale.ROOT, "<td>%.3f</td><td>%.3f</td>",
                r.atFullPrecision().precision(), r.atFullPrecision().recall());
        assertTrue(html.contains(headline), "headline row holds the measured precision and recall");
        assertTrue(html.contains("<td class=\"l\">verification</td><td>"
                + r.missReasons().get(MissReason.VERIFICATION) + "</td>"));
        assertTrue(html.contains("missing.png: file not found"));
        assertFalse(html.contains("http:") || html.contains("https:"), "no external resources");
        for (String png : List.of("precision-recall.png", "similarity.png", "trajectory.png", "pair-000-query.png",
                "pair-000-match.png", "pair-001-match.png")) {
            assertTrue(html.contains("src=\"" + png + "\""), png);
            assertTrue(ImageIO.read(out.resolve(png).toFile()) != null, png);
        }
        assertFalse(Files.exists(out.resolve("pair-001-query.png")));
        assertEquals(HtmlReport.THUMB_WIDTH, ImageIO.read(out.resolve("pair-000-query.png").toFile()).getWidth());
        assertEquals(180, ImageIO.read(out.resolve("pair-000-query.png").toFile()).getHeight());
    }

    @Test
    void plotsDrawTheCurveLabelsAndDetections() throws IOException {
        ReportFixture fx = new ReportFixture();
        EvaluationResult r = fx.evaluate(0.3);
        assertTrue(r.atThreshold().truePositives() > 0 && r.atThreshold().falsePositives() > 0,
                "the fixture has true and false reports at 0.3");
        Path out = dir.resolve("report");
        HtmlReport.write(out, ReportInput.of("t", r, fx.labels).withSimilarity(fx.similarity).withPoses(fx.poses));
        BufferedImage pr = ImageIO.read(out.resolve("precision-recall.png").toFile());
        assertEquals(HtmlReport.PLOT_WIDTH, pr.getWidth());
        assertTrue(count(pr, ReportPlots.CURVE) > 100, "curve drawn");
        BufferedImage traj = ImageIO.read(out.resolve("trajectory.png").toFile());
        assertTrue(count(traj, ReportPlots.LABEL) > 100, "labelled revisits drawn");
        assertTrue(count(traj, ReportPlots.TRUE) > 20, "true detections drawn");
        assertTrue(count(traj, ReportPlots.FALSE) > 20, "false detections drawn");
        BufferedImage sim = ImageIO.read(out.resolve("similarity.png").toFile());
        assertTrue(count(sim, ReportPlots.LABEL) > 50, "label squares drawn");
        assertTrue(count(sim, ReportPlots.FALSE) > 5, "false detections drawn");
    }

    @Test
    void topViewUsesTheTwoWidestAxes() {
        // The fixture's circle lies in x-z (y constant), so the top view is x across, z up.
        assertEquals(List.of(0, 2), java.util.Arrays.stream(TrajectoryPlot.widestAxes(new ReportFixture().poses))
                .boxed().toList());
    }
}
