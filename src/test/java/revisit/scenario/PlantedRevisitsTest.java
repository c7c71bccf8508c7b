package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import revisit.io.StampedPose;

/**
 * The routes really revisit where the manifest says, and nowhere it claims otherwise. Planted visits come from
 * the route design (the lane passes the place's anchor); these checks use the generated poses only.
 */
class PlantedRevisitsTest {

    /** Heading of the optical axis of a pose, degrees from east towards north. */
    private static double heading(StampedPose p) {
        var r = p.cameraToWorld().R;
        return Math.toDegrees(Math.atan2(r.get(1, 2), r.get(0, 2)));
    }

    private static StampedPose pose(Scenario s, Visit v) {
        Session ses = s.sessions().get(v.session());
        return ses.route().frame(v.frame(), ses.rateHz());
    }

    private static final Map<String, Scenario> BUILT = new HashMap<>();

    /** Built once per preset (painting the textures is the slow part and the result is immutable). */
    private static synchronized Scenario scenario(String preset) {
        return BUILT.computeIfAbsent(preset, p -> Scenario.build(p.equals("small") ? ScenarioConfig.small()
                : ScenarioConfig.defaults()));
    }

    /**
     * The longest step between frames plus 5 cm: each visit frame is within half a step of the anchor, so two
     * visit frames are within one step of each other.
     */
    private static double distanceTolerance(Scenario s) {
        double step = s.sessions().stream().mapToDouble(x -> x.route().speed() / x.rateHz()).max().orElseThrow();
        return step + 0.05;
    }

    @ParameterizedTest
    @ValueSource(strings = {"defaults", "small"})
    void plantedRevisitsAreCloseWithTheStatedHeadingDifference(String preset) {
        Scenario s = scenario(preset);
        double tolerance = distanceTolerance(s);
        for (PlantedRevisit r : s.revisits()) {
            StampedPose a = pose(s, r.earlier());
            StampedPose b = pose(s, r.later());
            assertTrue(a.distanceTo(b) < tolerance, r + " frames are " + a.distanceTo(b) + " m apart");
            double actual = PlantedRevisit.headingDifference(heading(a), heading(b));
            // 5 degrees: the random sway is +-1.5 degrees of yaw on each pose (Route) plus the glance ramp.
            assertEquals(r.headingDifferenceDeg(), actual, 5.0, "heading difference of " + r);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"defaults", "small"})
    void everyKindOfRevisitIsPlantedWithObliqueOnesBetween30And90Degrees(String preset) {
        Scenario s = scenario(preset);
        Map<String, Integer> kinds = new HashMap<>();
        for (PlantedRevisit r : s.revisits()) {
            kinds.merge(r.kind(), 1, Integer::sum);
            if (r.kind().equals("oblique")) {
                assertTrue(r.headingDifferenceDeg() >= 30 && r.headingDifferenceDeg() <= 90, r.toString());
            }
        }
        assertTrue(kinds.getOrDefault("same-heading", 0) >= 3, kinds.toString());
        assertTrue(kinds.getOrDefault("oblique", 0) >= 3, kinds.toString());
        assertTrue(kinds.getOrDefault("opposite", 0) >= 3, kinds.toString());
        long crossSession = s.revisits().stream().filter(r -> r.earlier().session() != r.later().session()).count();
        assertTrue(crossSession >= 5, "revisits across the two sessions: " + crossSession);
    }

    @ParameterizedTest
    @ValueSource(strings = {"defaults", "small"})
    void visitsOfDifferentPlacesAndTwinDecoysAreFarApart(String preset) {
        Scenario s = scenario(preset);
        int pairs = 0;
        for (Visit a : s.visits()) {
            for (Visit b : s.visits()) {
                if (!a.place().equals(b.place())) {
                    double d = pose(s, a).distanceTo(pose(s, b));
                    assertTrue(d > 4.0, a + " and " + b + " are only " + d + " m apart");
                    pairs++;
                }
            }
        }
        assertTrue(pairs > 100);
        assertTrue(s.decoys().size() >= 4, "twin decoys planted: " + s.decoys().size());
        for (TwinDecoy d : s.decoys()) {
            double metres = pose(s, d.first()).distanceTo(pose(s, d.second()));
            assertTrue(metres > 10, d + " only " + metres + " m apart");
            assertEquals(d.distanceM(), metres, 1.0, "stated twin distance of " + d);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"defaults", "small"})
    void everyRevisitPairWithinTheToleranceAtAPlaceIsListed(String preset) {
        // The converse check: scan all frame pairs near each place anchor; any two frames of different passes
        // (more than 15 m of walking apart, or in different sessions) within the tolerance must be a listed revisit.
        Scenario s = scenario(preset);
        double tolerance = distanceTolerance(s);
        int found = 0;
        for (Place p : s.world().places()) {
            for (int sa = 0; sa < s.sessions().size(); sa++) {
                for (int sb = sa; sb < s.sessions().size(); sb++) {
                    found += checkPairsNear(s, p, sa, sb, tolerance);
                }
            }
        }
        assertTrue(found >= s.revisits().size(), "close frame pairs found " + found + " for "
                + s.revisits().size() + " listed revisits");
    }

    private static int checkPairsNear(Scenario s, Place p, int sa, int sb, double tolerance) {
        Session a = s.sessions().get(sa);
        Session b = s.sessions().get(sb);
        int found = 0;
        for (int i = 0; i < a.frameCount(); i++) {
            StampedPose pi = a.route().frame(i, a.rateHz());
            if (Math.hypot(pi.x() - p.x(), pi.y() - p.y()) > tolerance / 2) {
                continue;
            }
            for (int j = sa == sb ? i + 1 : 0; j < b.frameCount(); j++) {
                StampedPose pj = b.route().frame(j, b.rateHz());
                boolean apart = sa != sb || (pj.timeSeconds() - pi.timeSeconds()) * a.route().speed() > 15;
                if (apart && Math.hypot(pj.x() - p.x(), pj.y() - p.y()) <= tolerance / 2) {
                    assertTrue(listed(s, p.name(), sa, i, sb, j), "unlisted revisit of " + p.name() + ": session "
                            + sa + " frame " + i + ", session " + sb + " frame " + j);
                    found++;
                }
            }
        }
        return found;
    }

    /** A listed revisit of the place whose two visit frames are within 5 frames of (i, j). */
    private static boolean listed(Scenario s, String place, int sa, int i, int sb, int j) {
        return s.revisits().stream().anyMatch(r -> r.place().equals(place)
                && r.earlier().session() == sa && Math.abs(r.earlier().frame() - i) <= 5
                && r.later().session() == sb && Math.abs(r.later().frame() - j) <= 5);
    }
}
