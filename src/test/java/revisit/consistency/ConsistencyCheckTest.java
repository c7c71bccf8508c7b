package revisit.consistency;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class ConsistencyCheckTest {

    /** Odometry noise per 0.1 m step: 0.0005 rad and 2 mm per axis (well inside the default drift model). */
    private static TwoLapTrajectory drive(long seed) {
        return new TwoLapTrajectory(0.0005, 0.002, seed);
    }

    @Test
    void removesPlantedFalseClosuresAndKeepsTrueOnesWithOdometry() {
        // Seeds 1..20: 14 true closures in two clusters, an aliasing burst of 4 self-consistent false closures
        // (lap-2 frames 8 s further along, posed as if at the true revisit) and 3 isolated false closures.
        for (long seed = 1; seed <= 20; seed++) {
            ClosureScenario scenario = new ClosureScenario(drive(seed), seed)
                    .trueCluster("place1-", 5.0, 0.5, 8, true)
                    .trueCluster("place2-", 20.0, 0.5, 6, true)
                    .aliasingBurst("alias-", 6.2, 0.5, 4, 8.0)
                    .isolatedFalse("lone1", 8.0, -6.0)
                    .isolatedFalse("lone2", 21.3, 5.0)
                    .isolatedFalse("lone3", 23.1, 10.0);
            ConsistencyReport report = new ConsistencyCheck(ConsistencyConfig.defaults())
                    .check(scenario.closures, scenario.odometry());
            assertAllSorted(scenario, report, seed);
            assertTrue(report.exactClique());
        }
    }

    @Test
    void removesClosuresWithWrongPosesUsingTimeAdjacencyAlone() {
        // No odometry: closures 0.2 s apart are tested against neighbours within 1 s. Seeds 1..20.
        ConsistencyConfig config = ConsistencyConfig.defaults().withAdjacency(1.0, 1.0, 0.3);
        for (long seed = 1; seed <= 20; seed++) {
            ClosureScenario scenario = new ClosureScenario(drive(seed), seed)
                    .trueCluster("near-", 5.0, 0.2, 10, true)
                    .wrongPose("bad1", 5.5, 0.1, 0.5, 2.0, true)
                    .wrongPose("bad2", 6.1, -0.1, 0.5, 2.0, true)
                    .wrongPose("bad3", 6.5, 0.1, 0.5, 2.0, true);
            ConsistencyReport report = new ConsistencyCheck(config).check(scenario.closures);
            assertAllSorted(scenario, report, seed);
        }
    }

    @Test
    void withoutOdometryDistantClosuresAreLeftUnchecked() {
        ClosureScenario scenario = new ClosureScenario(drive(3), 3)
                .trueCluster("near-", 5.0, 0.2, 5, true)
                .trueCluster("far-", 25.0, 0.2, 1, true);
        ConsistencyReport report = new ConsistencyCheck(ConsistencyConfig.defaults()).check(scenario.closures);
        ClosureVerdict far = verdict(report, "far-0");
        assertEquals(Verdict.UNCHECKED, far.verdict());
        assertEquals(Optional.of(UncheckedReason.PARTNERS_TOO_FAR), far.uncheckedReason());
        assertEquals(0.5 * 0.7 * (1 - Math.exp(-60 / 20.0)), far.confidence(), 1e-12);
        assertEquals(5, report.trusted(scenario.closures).size());
        assertEquals(6, new ConsistencyCheck(ConsistencyConfig.defaults().withKeepUnchecked(true))
                .check(scenario.closures).trusted(scenario.closures).size());
    }

    @Test
    void monocularClosuresAreCheckedByRotationAndDirection() {
        // All closures monocular: false ones have the true rotation but a direction turned by 60 degrees, so only the
        // direction test can catch them. Seeds 1..20.
        for (long seed = 1; seed <= 20; seed++) {
            ClosureScenario scenario = new ClosureScenario(drive(seed), seed)
                    .trueCluster("mono-", 5.0, 0.5, 8, false)
                    .wrongDirection("turned1", 6.3, Math.toRadians(60))
                    .wrongDirection("turned2", 7.1, Math.toRadians(60));
            ConsistencyReport report = new ConsistencyCheck(ConsistencyConfig.defaults())
                    .check(scenario.closures, scenario.odometry());
            assertAllSorted(scenario, report, seed);
            assertTrue(report.testedPairs().stream().allMatch(p -> p.degreesOfFreedom() == 4));
        }
    }

    @Test
    void monocularClosuresAreCheckedAgainstMetricOnes() {
        for (long seed = 1; seed <= 20; seed++) {
            ClosureScenario scenario = new ClosureScenario(drive(seed), seed)
                    .trueCluster("metric-", 5.0, 0.5, 6, true)
                    .trueCluster("mono-", 5.2, 0.5, 4, false)
                    .wrongDirection("turned", 6.3, Math.toRadians(30));
            ConsistencyReport report = new ConsistencyCheck(ConsistencyConfig.defaults())
                    .check(scenario.closures, scenario.odometry());
            assertAllSorted(scenario, report, seed);
        }
    }

    @Test
    void confidenceGrowsWithAgreeingPartners() {
        ClosureScenario scenario = new ClosureScenario(drive(4), 4).trueCluster("c-", 5.0, 0.5, 5, true);
        ConsistencyReport report = new ConsistencyCheck(ConsistencyConfig.defaults())
                .check(scenario.closures, scenario.odometry());
        ClosureVerdict v = verdict(report, "c-0");
        assertEquals(4, v.consistentPartners());
        // g = 0.7 (1 - e^-3), s = (4 + 1) / (4 + 2).
        assertEquals(0.7 * (1 - Math.exp(-3)) * 5 / 6, v.confidence(), 1e-12);
    }

    @Test
    void twoClosuresThatOnlyConflictWithEachOtherAreBothDistrusted() {
        ClosureScenario scenario = new ClosureScenario(drive(5), 5)
                .trueCluster("true-", 5.0, 0.5, 1, true)
                .isolatedFalse("false", 5.4, 6.0);
        ConsistencyReport report = new ConsistencyCheck(ConsistencyConfig.defaults())
                .check(scenario.closures, scenario.odometry());
        assertEquals(1, report.count(Verdict.CONFLICTING));
        assertEquals(1, report.count(Verdict.UNCHECKED));
        assertTrue(report.verdicts().stream().anyMatch(v -> v.uncheckedReason()
                .equals(Optional.of(UncheckedReason.NO_SUPPORT_IN_KEPT_SET))));
        assertTrue(report.trusted(scenario.closures).isEmpty());
    }

    @Test
    void closuresOutsideTheOdometryAreUnchecked() {
        ClosureScenario scenario = new ClosureScenario(drive(6), 6).trueCluster("c-", 5.0, 0.5, 3, true);
        TwoLapTrajectory shortDrive = drive(6);
        shortDrive.odometry.subList(300, shortDrive.odometry.size()).clear();
        ConsistencyReport report = new ConsistencyCheck(ConsistencyConfig.defaults())
                .check(scenario.closures, Map.of(TwoLapTrajectory.SEQUENCE, shortDrive.odometry));
        for (ClosureVerdict v : report.verdicts()) {
            assertEquals(Optional.of(UncheckedReason.OUTSIDE_ODOMETRY), v.uncheckedReason());
        }
        ConsistencyReport none = new ConsistencyCheck(ConsistencyConfig.defaults())
                .check(scenario.closures, Map.of("other", shortDrive.odometry));
        assertEquals(Optional.of(UncheckedReason.NO_ODOMETRY_FOR_SEQUENCE), none.verdicts().get(0).uncheckedReason());
    }

    @Test
    void refusesDuplicateIds() {
        ClosureScenario scenario = new ClosureScenario(drive(7), 7).trueCluster("c-", 5.0, 0.5, 1, true);
        List<ClosureConstraint> twice = List.of(scenario.closures.get(0), scenario.closures.get(0));
        assertThrows(IllegalArgumentException.class, () -> new ConsistencyCheck(ConsistencyConfig.defaults()).check(twice));
    }

    private static void assertAllSorted(ClosureScenario scenario, ConsistencyReport report, long seed) {
        for (int i = 0; i < scenario.closures.size(); i++) {
            String id = scenario.closures.get(i).id();
            Verdict expected = scenario.falseIds.contains(id) ? Verdict.CONFLICTING : Verdict.CONSISTENT;
            assertEquals(expected, report.verdicts().get(i).verdict(), "seed " + seed + ", closure " + id);
        }
        assertEquals(scenario.closures.size() - scenario.falseIds.size(), report.trusted(scenario.closures).size());
    }

    private static ClosureVerdict verdict(ConsistencyReport report, String id) {
        return report.verdicts().stream().filter(v -> v.closureId().equals(id)).findFirst().orElseThrow();
    }
}
