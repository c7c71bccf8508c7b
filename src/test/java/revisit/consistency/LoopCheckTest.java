package revisit.consistency;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class LoopCheckTest {

    /** Exact odometry, no drift, negligible floors: the loop's uncertainty is the closures' alone. */
    private static final ConsistencyConfig MODEL_ONLY = ConsistencyConfig.defaults().withDrift(0, 0, 0)
            .withMinSigmas(1e-7, 1e-7);

    @Test
    void metricPairStatisticFollowsChiSquareWithSixDegrees() {
        // Closure noise drawn from the closures' own information; the squared Mahalanobis distance of a loop is then
        // chi-square with 6 dof (mean 6) to first order. 30 closures (435 pairs) per seed, seeds 31..35; pairs share
        // closures, so one seed's mean scatters (measured 5.13 .. 7.46); over the five seeds measured 6.07.
        double mean = 0;
        for (long seed = 31; seed <= 35; seed++) {
            mean += meanStatistic(true, seed, MODEL_ONLY) / 5;
        }
        assertTrue(mean > 5.3 && mean < 6.7, "mean d^2 " + mean);
    }

    @Test
    void monocularPairStatisticFollowsChiSquareWithFourDegrees() {
        // Direction noise 0.01 rad matches directionSigmaRad here; rotation 3 dof + direction 2 dof - 1 fitted scale
        // gives mean 4. Seeds 32..36, measured 4.20.
        double mean = 0;
        for (long seed = 32; seed <= 36; seed++) {
            mean += meanStatistic(false, seed, MODEL_ONLY.withDirectionSigmaRad(0.01)) / 5;
        }
        assertTrue(mean > 3.4 && mean < 4.8, "mean d^2 " + mean);
    }

    @Test
    void aLoopThroughTwoCorrectClosuresAndExactOdometryClosesExactly() {
        TwoLapTrajectory drive = new TwoLapTrajectory(0, 0, 1);
        int a1 = TwoLapTrajectory.frame(5);
        int a2 = TwoLapTrajectory.frame(9);
        int b1 = TwoLapTrajectory.frame(5 + TwoLapTrajectory.LAP_SECONDS);
        int b2 = TwoLapTrajectory.frame(9 + TwoLapTrajectory.LAP_SECONDS);
        double[] info = TwoLapTrajectory.information(0.01, 0.03);
        ClosureConstraint c1 = new ClosureConstraint("1", drive.ref(a1), drive.ref(b1), drive.relative(a1, b1), info,
                true, 50, 0.5);
        ClosureConstraint c2 = new ClosureConstraint("2", drive.ref(b2), drive.ref(a2), drive.relative(b2, a2), info,
                true, 50, 0.5);
        LoopCheck check = new LoopCheck(new OdometryStretches(Map.of(TwoLapTrajectory.SEQUENCE,
                new OdometryTrack(drive.odometry)), ConsistencyConfig.defaults()), ConsistencyConfig.defaults());
        PairOutcome outcome = check.test(c1, c2);
        assertEquals(PairState.CONSISTENT, outcome.state());
        assertEquals(0, outcome.distanceSquared(), 1e-12);
        assertEquals(16.812, outcome.threshold(), 5e-4);
    }

    @Test
    void aMonocularClosureWithoutDirectionIsTestedOnRotationOnly() {
        TwoLapTrajectory drive = new TwoLapTrajectory(0, 0, 1);
        int a1 = TwoLapTrajectory.frame(5);
        int a2 = TwoLapTrajectory.frame(6);
        int b1 = TwoLapTrajectory.frame(5 + TwoLapTrajectory.LAP_SECONDS);
        int b2 = TwoLapTrajectory.frame(6 + TwoLapTrajectory.LAP_SECONDS);
        double[] info = TwoLapTrajectory.information(0.01, 0.03);
        ClosureConstraint metric = new ClosureConstraint("m", drive.ref(a1), drive.ref(b1), drive.relative(a1, b1),
                info, true, 50, 0.5);
        Se3_F64 rotationOnly = drive.relative(a2, b2);
        rotationOnly.T.setTo(0, 0, 0);
        Se3_F64 turned = TwoLapTrajectory.rightPerturbed(rotationOnly, new double[]{0, 0.3, 0, 0, 0, 0});
        LoopCheck check = new LoopCheck(new OdometryStretches(Map.of(TwoLapTrajectory.SEQUENCE,
                new OdometryTrack(drive.odometry)), ConsistencyConfig.defaults()), ConsistencyConfig.defaults());
        PairOutcome right = check.test(metric, new ClosureConstraint("r", drive.ref(a2), drive.ref(b2), rotationOnly,
                info, false, 50, 0.5));
        assertEquals(PairState.CONSISTENT, right.state());
        assertEquals(3, right.degreesOfFreedom());
        PairOutcome wrong = check.test(metric, new ClosureConstraint("w", drive.ref(a2), drive.ref(b2), turned, info,
                false, 50, 0.5));
        assertEquals(PairState.CONFLICTING, wrong.state());
    }

    @Test
    void reversedClosureCarriesItsInformation() {
        TwoLapTrajectory drive = new TwoLapTrajectory(0, 0, 1);
        double[] info = new double[36];
        for (int k = 0; k < 6; k++) {
            info[7 * k] = 100 + 10 * k;
        }
        info[3] = 5;
        info[18] = 5;
        ClosureConstraint c = new ClosureConstraint("c", drive.ref(50), drive.ref(430), drive.relative(50, 430), info,
                true, 50, 0.5);
        ClosureConstraint back = c.reversed().reversed();
        double[] twice = back.information();
        for (int k = 0; k < 36; k++) {
            assertEquals(info[k], twice[k], 1e-9);
        }
        Se3_F64 product = c.reversed().aFromB().concat(c.aFromB(), null);
        assertEquals(0, product.T.norm(), 1e-12);
    }

    private static double meanStatistic(boolean metric, long seed, ConsistencyConfig config) {
        TwoLapTrajectory drive = new TwoLapTrajectory(0, 0, seed);
        ClosureScenario scenario = new ClosureScenario(drive, seed).trueCluster("c-", 3.0, 0.3, 30, metric);
        LoopCheck check = new LoopCheck(new OdometryStretches(Map.of(TwoLapTrajectory.SEQUENCE,
                new OdometryTrack(drive.odometry)), config), config);
        List<ClosureConstraint> c = scenario.closures;
        double sum = 0;
        int pairs = 0;
        for (int i = 0; i < c.size(); i++) {
            for (int j = i + 1; j < c.size(); j++) {
                sum += check.test(c.get(i), c.get(j)).distanceSquared();
                pairs++;
            }
        }
        return sum / pairs;
    }
}
