package revisit.evaluation;

import revisit.SharedData;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import revisit.io.BadInputException;
import revisit.io.StampedPose;

class PoseLabelsTest {

    private static final String DINO = "dino";

    /** The dinoRing views whose images are present, in file order, with time = position in dino_par.txt. */
    private static List<StampedPose> presentDinoRingPoses() {
        Path par = SharedData.require("middlebury/dinoRing/dino_par.txt");
        List<StampedPose> poses = new ArrayList<>();
        for (KrtView v : KrtCameraFile.read(par)) {
            if (Files.exists(par.resolveSibling(v.imageName()))) {
                poses.add(v.pose());
            }
        }
        return poses;
    }

    private static List<String> pairsOf(RevisitLabels labels) {
        List<String> out = new ArrayList<>();
        for (RevisitPair p : labels.pairs()) {
            out.add((p.query().frame() + 1) + "-" + (p.match().frame() + 1));
        }
        return out;
    }

    /*
     * Middlebury dinoRing (Seitz, Curless, Diebel, Scharstein, Szeliski, CVPR 2006): images dino0001..dino0048
     * are present (48 of the 363 views in dino_par.txt). Checked by hand from dino_ang.txt, which gives each view's
     * longitude on the ring (latitude -90 for all 48): view 1 at 185, view 2 at 180, then steps of 7.66 degrees
     * down to view 47 at -164.68 (= 195.32) and view 48 at -172.34 (= 187.66). The camera centres lie on a circle
     * of radius about 0.661 (|C| of view 1, C = -R^T t), so two views dlon apart are 2 * 0.661 * sin(dlon / 2)
     * apart and look in directions about dlon apart:
     *   48-1: 2.66 deg -> 0.031;  48-2: 7.66 deg -> 0.088;  47-1: 10.32 deg -> 0.119;
     *   47-2 and 48-3: 15.32 deg -> 0.176;  neighbours i, i+1 (i >= 2): 7.66 deg -> 0.088;  1-2: 5 deg -> 0.058.
     * The same distances computed from the K/R/t lines with a separate script: 0.0305, 0.0877, 0.1181, 0.1751,
     * 0.0877, 0.0573. With a 5-frame window only the ring's closure survives; numbers below are 1-based views.
     */
    @Test
    void dinoRingClosesBetweenTheLastAndFirstViews() {
        List<StampedPose> poses = presentDinoRingPoses();
        assertEquals(48, poses.size());
        PoseLabelConfig config = PoseLabelConfig.defaults().withWindow(new ExclusionWindow(0, 5));
        assertEquals(List.of("48-1", "48-2"), pairsOf(PoseLabels.derive(DINO, poses, config.withMaxDistance(0.1))));
        assertEquals(List.of("47-1", "48-1", "48-2"),
                pairsOf(PoseLabels.derive(DINO, poses, config.withMaxDistance(0.125))));
        assertEquals(List.of("47-1", "47-2", "48-1", "48-2", "48-3"),
                pairsOf(PoseLabels.derive(DINO, poses, config.withMaxDistance(0.2))));
        // Heading tolerance 5 degrees keeps only 48-1 (2.66 deg); 48-2 differs by 7.66 deg.
        assertEquals(List.of("48-1"), pairsOf(PoseLabels.derive(DINO, poses,
                config.withMaxDistance(0.1).withMaxViewAngleDegrees(5))));
    }

    @Test
    void dinoRingLabelsRespectATimeWindow() {
        // Times are positions in dino_par.txt: view k at k-1 seconds. A 46.5 s window keeps 48-1 (47 s apart)
        // but drops 48-2 and 47-1 (46 s apart); without a window the ring's neighbours (0.088 apart) appear too.
        List<StampedPose> poses = presentDinoRingPoses();
        PoseLabelConfig config = PoseLabelConfig.defaults().withMaxDistance(0.1);
        RevisitLabels timed = PoseLabels.derive(DINO, poses, config.withWindow(new ExclusionWindow(46.5, 0)));
        assertEquals(List.of("48-1"), pairsOf(timed));
        RevisitLabels open = PoseLabels.derive(DINO, poses, config.withWindow(ExclusionWindow.none()));
        // 47 neighbour pairs plus 48-1 and 48-2; the timed labels dropped all but one of these 49.
        assertEquals(49, open.pairCount());
        assertEquals(48, timed.droppedPairs());
    }

    @Test
    void gridSearchFindsTheSamePairsAsAllPairs() {
        // Property test, seed 7: 400 random poses in a 10 x 10 x 2 box, two sequences. The cameras turn about their
        // y axis only, so the angle between viewing directions equals StampedPose.angleTo used by the reference.
        Random rnd = new Random(7);
        Map<String, List<StampedPose>> bySeq = new LinkedHashMap<>();
        List<StampedPose> all = new ArrayList<>();
        for (String id : new String[]{"a", "b"}) {
            List<StampedPose> poses = new ArrayList<>();
            for (int i = 0; i < 200; i++) {
                double yaw = rnd.nextDouble() * 2 * Math.PI;
                poses.add(new StampedPose(i * 0.1, rnd.nextDouble() * 10 - 5, rnd.nextDouble() * 10 - 5,
                        rnd.nextDouble() * 2, 0, Math.sin(yaw / 2), 0, Math.cos(yaw / 2)));
            }
            bySeq.put(id, poses);
            all.addAll(poses);
        }
        PoseLabelConfig config = new PoseLabelConfig(0.9, 60, new ExclusionWindow(1.0, 3), 1_000_000);
        RevisitLabels labels = PoseLabels.derive(bySeq, config);
        FrameTimeline timeline = labels.timeline();
        LabelBuilder brute = new LabelBuilder(timeline, config.window());
        for (int q = 0; q < all.size(); q++) {
            for (int m = 0; m < q; m++) {
                double angle = Math.toDegrees(all.get(q).angleTo(all.get(m)));
                if (all.get(q).distanceTo(all.get(m)) <= 0.9 && angle <= 60) {
                    brute.add(q, m);
                }
            }
        }
        RevisitLabels expected = brute.build();
        assertEquals(expected.pairCount(), labels.pairCount());
        for (int q = 0; q < all.size(); q++) {
            assertEquals(expected.matchesOf(timeline.keyOf(q)), labels.matchesOf(timeline.keyOf(q)));
        }
    }

    @Test
    void refusesLabelsBeyondThePairCap() {
        List<StampedPose> resting = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            resting.add(new StampedPose(i, 0, 0, 0, 0, 0, 0, 1));
        }
        PoseLabelConfig config = PoseLabelConfig.defaults().withWindow(ExclusionWindow.none()).withMaxPairs(1000);
        // 100 frames at one spot give 100 * 99 / 2 = 4950 pairs, more than the cap of 1000.
        BadInputException e = assertThrows(BadInputException.class, () -> PoseLabels.derive("rest", resting, config));
        assertTrue(e.getMessage().contains("more than 1000 labelled pairs"), e.getMessage());
    }
}
