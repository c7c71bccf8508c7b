package revisit.evaluation;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import javax.imageio.ImageIO;
import revisit.io.StampedPose;

/**
 * An invented scan for report tests: a camera drives two laps of a circle of radius 5 (60 frames per lap, one
 * frame per second, looking along the path), so every frame of the second lap revisits the same spot of the
 * first. Outcomes come from a seeded simulation (seed 11): most second-lap queries find their true frame, a few
 * find a wrong one, some fail verification.
 */
final class ReportFixture {

    static final int FRAMES = 120;

    final List<StampedPose> poses = new ArrayList<>();
    final RevisitLabels labels;
    final List<QueryOutcome> outcomes = new ArrayList<>();
    final SimilarityMatrix similarity = new SimilarityMatrix(FRAMES, 256);

    ReportFixture() {
        for (int i = 0; i < FRAMES; i++) {
            double a = 2 * Math.PI * i / 60;
            double yaw = -a;
            poses.add(new StampedPose(i, 5 * Math.cos(a), 0, 5 * Math.sin(a), 0, Math.sin(yaw / 2), 0,
                    Math.cos(yaw / 2)));
        }
        labels = PoseLabels.derive("loop", poses, PoseLabelConfig.defaults().withMaxDistance(0.6)
                .withWindow(new ExclusionWindow(0, 30)));
        Random rnd = new Random(11);
        for (int q = 0; q < FRAMES; q++) {
            for (int m = 0; m < q; m++) {
                similarity.record(q, m, Math.exp(-poses.get(q).distanceTo(poses.get(m))) + 0.05 * rnd.nextDouble());
            }
            outcomes.add(simulate(q, rnd));
        }
    }

    private QueryOutcome simulate(int q, Random rnd) {
        FrameKey query = new FrameKey("loop", q);
        if (q < 31) {
            return QueryOutcome.noCandidate(query);
        }
        boolean right = labels.isPositive(query) && rnd.nextDouble() < 0.85;
        FrameKey match = right ? labels.matchesOf(query).get(0) : new FrameKey("loop", rnd.nextInt(q - 30));
        double score = right ? 0.4 + 0.6 * rnd.nextDouble() : 0.5 * rnd.nextDouble();
        StageReached stage = rnd.nextDouble() < 0.8 ? StageReached.VERIFIED : StageReached.CONSISTENT;
        return QueryOutcome.of(query, match, score, stage);
    }

    EvaluationResult evaluate(double threshold) {
        return Evaluator.evaluate(outcomes, labels, EvaluationConfig.defaults().withAcceptanceThreshold(threshold));
    }

    /** Writes an invented frame image: a colour gradient with the frame number as a bar. */
    static Path frameImage(Path dir, int frame) throws IOException {
        BufferedImage img = new BufferedImage(320, 240, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        for (int x = 0; x < 320; x++) {
            g.setColor(new Color(x * 255 / 319, 128, 255 - x * 255 / 319));
            g.drawLine(x, 0, x, 239);
        }
        g.setColor(Color.WHITE);
        g.fillRect(10, 100, 2 * frame, 40);
        g.dispose();
        Path file = dir.resolve("frame-" + frame + ".png");
        ImageIO.write(img, "png", file.toFile());
        return file;
    }
}
