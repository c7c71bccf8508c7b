package revisit.pipeline;

import revisit.SharedData;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import georegression.struct.so.Quaternion_F64;
import georegression.geometry.ConvertRotation3D_F64;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;
import revisit.camera.CameraModel;
import revisit.evaluation.KrtCameraFile;
import revisit.evaluation.KrtView;
import revisit.vocabulary.VocabularyFile;

/**
 * End-to-end scan of the Middlebury dino ring (Seitz, Curless, Diebel, Scharstein, Szeliski, CVPR 2006;
 * ../shared/data/middlebury/dinoRing): 48 views on a full circle around the object, so the last views revisit
 * the first. Ground truth: the cameras in dino_par.txt (x = K [R|t] X). Uses the shipped vocabulary.
 */
class ScannerDinoRingTest {

    /** Views more than this far apart on the ring (7.5 degrees a step) share too little to be a true revisit. */
    private static final int MAX_TRUE_STEPS = 8;

    @Test
    void findsTheRingClosureWithAccuratePoseAndNoFalseTrustedClosure() throws Exception {
        Path ring = SharedData.require("middlebury/dinoRing");
        Map<String, KrtView> truth = new HashMap<>();
        for (KrtView v : KrtCameraFile.read(ring.resolve("dino_par.txt"))) {
            truth.put(v.imageName(), v);
        }
        CameraModel cam = truth.get("dino0001.png").cameraModel(640, 480);
        ScanConfig cfg = ScanConfig.defaults();
        // 48 frames at the default 10 Hz last 4.8 s: exclude by frame count instead (a quarter of the ring).
        cfg = cfg.withIndex(cfg.index().withExclusionSeconds(0).withExclusionFrames(12));
        ScanResult r = new Scanner(cfg, VocabularyFile.read(Path.of(System.getProperty("user.dir"), "vocab/default.rvoc")), Optional.of(cam), Scanner.Options.defaults()).run(List.of(SequenceInput.of(ring)),
                ScanListener.silent());

        boolean ringClosed = false;
        for (Closure c : r.closures()) {
            if (c.status() != ClosureStatus.TRUSTED) {
                continue; // not written as an edge by default (conflicting, or not corroborated)
            }
            int steps = Math.abs(c.queryFrame() - c.matchFrame());
            steps = Math.min(steps, 48 - steps);
            assertTrue(steps <= MAX_TRUE_STEPS, "false closure " + c + " (" + steps + " ring steps apart)");
            double[] err = poseError(c, truth.get(c.queryName()), truth.get(c.matchName()));
            if (c.queryFrame() == 47 && c.matchFrame() == 0) {
                ringClosed = true;
                // Bounds for the neighbouring views (7.5 degrees apart on the ring, seen through a 11-degree
                // field of view): 3 degrees of rotation (measured 2.7, docs/SCAN.md). Wider pairs of this
                // narrow-view ring give much worse poses (measured in docs/SCAN.md).
                assertTrue(err[0] < 3.0, c + " rotation error " + err[0] + " deg");
                // The translation direction is not asserted: through an 11-degree field of view a 7.5-degree step
                // round the object leaves it ill-conditioned (measured errors in docs/SCAN.md).
            }
        }
        assertTrue(ringClosed, "no closure between the last and first views: " + r.closures());
    }

    /** Rotation error and translation-direction error in degrees of a closure against the ground truth. */
    static double[] poseError(Closure c, KrtView query, KrtView match) {
        Se3_F64 wq = query.pose().cameraToWorld();
        Se3_F64 wm = match.pose().cameraToWorld();
        Se3_F64 qToM = wq.concat(wm.invert(null), null);
        double[] q = c.quaternion();
        DMatrixRMaj est = ConvertRotation3D_F64.quaternionToMatrix(new Quaternion_F64(q[3], q[0], q[1], q[2]), null);
        DMatrixRMaj diff = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.multTransA(est, qToM.R, diff);
        double trace = diff.get(0, 0) + diff.get(1, 1) + diff.get(2, 2);
        double rotErr = Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, (trace - 1) / 2))));
        double[] t = c.translation();
        var tt = qToM.T;
        double dot = (t[0] * tt.x + t[1] * tt.y + t[2] * tt.z) / tt.norm() / Math.sqrt(t[0] * t[0] + t[1] * t[1]
                + t[2] * t[2]);
        double dirErr = Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, dot))));
        return new double[]{rotErr, dirErr};
    }
}
