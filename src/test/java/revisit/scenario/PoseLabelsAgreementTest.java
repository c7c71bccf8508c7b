package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import revisit.evaluation.ExclusionWindow;
import revisit.evaluation.FrameKey;
import revisit.evaluation.PoseLabelConfig;
import revisit.evaluation.PoseLabels;
import revisit.evaluation.RevisitLabels;
import revisit.io.StampedPose;

/** The evaluation stage's pose-derived labels (written independently) agree with the planted revisits. */
class PoseLabelsAgreementTest {

    private static final Scenario SMALL = Scenario.build(ScenarioConfig.small());

    private static Map<String, List<StampedPose>> poses(Scenario s) {
        Map<String, List<StampedPose>> out = new LinkedHashMap<>();
        for (Session ses : s.sessions()) {
            List<StampedPose> list = new ArrayList<>();
            for (int i = 0; i < ses.frameCount(); i++) {
                list.add(ses.route().frame(i, ses.rateHz()));
            }
            out.put(ses.name(), list);
        }
        return out;
    }

    private static FrameKey key(Scenario s, Visit v) {
        return new FrameKey(s.sessions().get(v.session()).name(), v.frame());
    }

    private static RevisitLabels labels(double maxViewAngleDegrees) {
        double step = SMALL.sessions().stream().mapToDouble(x -> x.route().speed() / x.rateHz()).max().orElseThrow();
        PoseLabelConfig config = PoseLabelConfig.defaults().withMaxDistance(step + 0.05)
                .withMaxViewAngleDegrees(maxViewAngleDegrees).withWindow(ExclusionWindow.defaults().withFrames(30));
        return PoseLabels.derive(poses(SMALL), config);
    }

    @Test
    void everyPlantedRevisitIsLabelledByDistanceAndNoTwinDecoyIs() {
        RevisitLabels labels = labels(180);
        for (PlantedRevisit r : SMALL.revisits()) {
            assertTrue(labels.isTrueMatch(key(SMALL, r.later()), key(SMALL, r.earlier()), 0), r.toString());
        }
        for (TwinDecoy d : SMALL.decoys()) {
            assertFalse(labels.isTrueMatch(key(SMALL, d.second()), key(SMALL, d.first()), 10), d.toString());
        }
    }

    @Test
    void aThirtyDegreeViewTestKeepsSameHeadingRevisitsAndDropsTheOthers() {
        RevisitLabels labels = labels(30);
        int same = 0;
        for (PlantedRevisit r : SMALL.revisits()) {
            boolean labelled = labels.isTrueMatch(key(SMALL, r.later()), key(SMALL, r.earlier()), 0);
            if (r.kind().equals("same-heading")) {
                assertTrue(labelled, r.toString());
                same++;
            } else {
                assertFalse(labelled, r.toString());
            }
        }
        assertTrue(same >= 3);
    }
}
