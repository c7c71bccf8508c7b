package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.fitting.se.FitSpecialEuclideanOps_F64;
import georegression.struct.point.Point3D_F64;
import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;

class RigidAlignmentTest {

    private static final long[] SEEDS = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10};

    @Test
    void bothMethodsReproduceAKnownTransformOnNoiseFreePoints() {
        RigidAlignment alignment = new RigidAlignment();
        for (long seed : SEEDS) {
            SplittableRandom random = new SplittableRandom(seed);
            Se3_F64 truth = randomPose(random);
            double[] source = randomPoints(random, 20);
            double[] target = apply(truth, source, 0, random);
            for (Se3_F64 fit : List.of(alignment.umeyama(source, target).orElseThrow(),
                    alignment.horn(source, target).orElseThrow())) {
                assertTrue(CommonOps_DDRM.elementMaxAbs(diff(fit, truth)) < 1e-9, "seed " + seed);
                assertEquals(0, fit.T.distance(truth.T), 1e-9, "seed " + seed);
            }
        }
    }

    @Test
    void hornAndUmeyamaAgreeOnNoisyPoints() {
        RigidAlignment alignment = new RigidAlignment();
        for (long seed : SEEDS) {
            SplittableRandom random = new SplittableRandom(seed);
            Se3_F64 truth = randomPose(random);
            double[] source = randomPoints(random, 30);
            double[] target = apply(truth, source, 0.05, random);
            Se3_F64 u = alignment.umeyama(source, target).orElseThrow();
            Se3_F64 h = alignment.horn(source, target).orElseThrow();
            assertTrue(CommonOps_DDRM.elementMaxAbs(diff(u, h)) < 1e-9, "seed " + seed);
            assertEquals(0, u.T.distance(h.T), 1e-9, "seed " + seed);
        }
    }

    @Test
    void matchesGeoregressionsPointFitOnNoisyPoints() {
        // Reference library run in the test: georegression (BoofCV's geometry library) FitSpecialEuclideanOps_F64.
        RigidAlignment alignment = new RigidAlignment();
        for (long seed : SEEDS) {
            SplittableRandom random = new SplittableRandom(seed);
            Se3_F64 truth = randomPose(random);
            double[] source = randomPoints(random, 25);
            double[] target = apply(truth, source, 0.02, random);
            var reference = FitSpecialEuclideanOps_F64.fitPoints3D();
            assertTrue(reference.process(points(source), points(target)));
            Se3_F64 expected = reference.getTransformSrcToDst();
            Se3_F64 ours = alignment.umeyama(source, target).orElseThrow();
            assertTrue(CommonOps_DDRM.elementMaxAbs(diff(ours, expected)) < 1e-8, "seed " + seed);
            assertEquals(0, ours.T.distance(expected.T), 1e-8, "seed " + seed);
        }
    }

    @Test
    void returnsAProperRotationForCoplanarPoints() {
        RigidAlignment alignment = new RigidAlignment();
        SplittableRandom random = new SplittableRandom(11);
        Se3_F64 truth = randomPose(random);
        double[] source = randomPoints(random, 12);
        for (int i = 0; i < 12; i++) {
            source[3 * i + 2] = 2.0;
        }
        double[] target = apply(truth, source, 0, random);
        for (Se3_F64 fit : List.of(alignment.umeyama(source, target).orElseThrow(),
                alignment.horn(source, target).orElseThrow())) {
            assertEquals(1.0, CommonOps_DDRM.det(fit.R), 1e-12);
            assertTrue(CommonOps_DDRM.elementMaxAbs(diff(fit, truth)) < 1e-9);
        }
    }

    @Test
    void refusesCollinearPoints() {
        RigidAlignment alignment = new RigidAlignment();
        double[] source = {0, 0, 1, 0, 0, 2, 0, 0, 3, 0, 0, 4};
        double[] target = {1, 0, 1, 1, 0, 2, 1, 0, 3, 1, 0, 4};
        assertTrue(alignment.umeyama(source, target).isEmpty());
        assertTrue(alignment.horn(source, target).isEmpty());
    }

    @Test
    void usesOnlyTheIndexedSubset() {
        RigidAlignment alignment = new RigidAlignment();
        SplittableRandom random = new SplittableRandom(12);
        Se3_F64 truth = randomPose(random);
        double[] source = randomPoints(random, 10);
        double[] target = apply(truth, source, 0, random);
        target[0] += 5;
        int[] subset = {1, 2, 3, 4, 5, 6, 7, 8, 9, 0};
        Se3_F64 fit = alignment.umeyama(source, target, subset, 9).orElseThrow();
        assertEquals(0, fit.T.distance(truth.T), 1e-9);
    }

    static Se3_F64 randomPose(SplittableRandom random) {
        double angle = random.nextDouble() * 3.0;
        double[] axis = {random.nextDouble() - 0.5, random.nextDouble() - 0.5, random.nextDouble() - 0.5};
        double n = Math.sqrt(axis[0] * axis[0] + axis[1] * axis[1] + axis[2] * axis[2]);
        return RenderedBoxRoom.pose(angle * axis[0] / n, angle * axis[1] / n, angle * axis[2] / n,
                random.nextDouble() * 4 - 2, random.nextDouble() * 4 - 2, random.nextDouble() * 4 - 2);
    }

    private static double[] randomPoints(SplittableRandom random, int n) {
        double[] p = new double[3 * n];
        for (int i = 0; i < p.length; i++) {
            p[i] = random.nextDouble() * 6 - 3;
        }
        return p;
    }

    private static double[] apply(Se3_F64 t, double[] source, double noise, SplittableRandom random) {
        double[] out = new double[source.length];
        for (int i = 0; i < source.length / 3; i++) {
            double[] p = RenderedBoxRoom.transform(t, source[3 * i], source[3 * i + 1], source[3 * i + 2]);
            for (int k = 0; k < 3; k++) {
                out[3 * i + k] = p[k] + noise * RenderedBoxRoom.gaussian(random);
            }
        }
        return out;
    }

    private static List<Point3D_F64> points(double[] packed) {
        List<Point3D_F64> list = new ArrayList<>();
        for (int i = 0; i < packed.length / 3; i++) {
            list.add(new Point3D_F64(packed[3 * i], packed[3 * i + 1], packed[3 * i + 2]));
        }
        return list;
    }

    private static DMatrixRMaj diff(Se3_F64 a, Se3_F64 b) {
        DMatrixRMaj d = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.subtract(a.R, b.R, d);
        return d;
    }
}
