package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.opencv.calib3d.Calib3d;
import org.opencv.core.CvType;
import org.opencv.core.Mat;
import org.opencv.core.MatOfDouble;
import org.opencv.core.MatOfPoint2f;
import org.opencv.core.MatOfPoint3f;
import org.opencv.core.Point3;
import revisit.camera.CameraFile;
import revisit.camera.CameraModel;
import revisit.io.StampedPose;
import revisit.io.TrajectoryFile;

class GroundTruthProjectionTest {

    private static final Scenario CLEAN = Scenario.build(ScenarioConfig.small().withoutNuisances());

    /** Centre of the kiosk's front face (the face seen from the lane). */
    private static Vec3 kioskFront(Scenario s, String place) {
        for (Surface f : s.world().fixed()) {
            Vec3 toLane = new Vec3(0, place.endsWith("South") ? 1 : -1, 0);
            if (f.place().equals(place) && f.facing().dot(toLane) > 0.99) {
                return f.pointAt(f.widthM() / 2, f.heightM() / 2);
            }
        }
        throw new AssertionError("no kiosk front for " + place);
    }

    private static double[] cameraPoint(Se3_F64 camToWorld, Vec3 p) {
        double[] c = new double[3];
        for (int j = 0; j < 3; j++) {
            c[j] = camToWorld.R.get(0, j) * (p.x() - camToWorld.T.x) + camToWorld.R.get(1, j) * (p.y() - camToWorld.T.y)
                    + camToWorld.R.get(2, j) * (p.z() - camToWorld.T.z);
        }
        return c;
    }

    @Test
    void writtenPosesAndCameraProjectLikeOpenCvProjectPoints(@TempDir Path dir) {
        // Reference library run in the test: OpenCV Calib3d.projectPoints with rvec/tvec of the world-to-camera
        // transform and the five distortion coefficients (k1, k2, p1, p2, k3).
        nu.pattern.OpenCV.loadLocally();
        Scenario s = CLEAN;
        Session ses = s.sessions().get(0);
        List<StampedPose> poses = new ArrayList<>();
        for (int i = 0; i < ses.frameCount(); i++) {
            poses.add(ses.route().frame(i, ses.rateHz()));
        }
        TrajectoryFile.write(dir.resolve("poses.txt"), poses);
        CameraFile.write(dir.resolve("camera.json"), s.camera());
        List<StampedPose> read = TrajectoryFile.read(dir.resolve("poses.txt"));
        CameraModel cam = CameraFile.read(dir.resolve("camera.json"));
        List<Vec3> points = new ArrayList<>();
        for (Place p : s.world().places()) {
            points.add(new Vec3(p.x(), p.y() + 3, 1.0));
            points.add(new Vec3(p.x() + 3, p.y(), 2.0));
        }
        points.add(kioskFront(s, "Kiosk South"));
        points.add(kioskFront(s, "Kiosk North"));
        int compared = 0;
        for (int i = 0; i < read.size(); i += 7) {
            compared += compareWithOpenCv(read.get(i).cameraToWorld(), cam, points);
        }
        assertTrue(compared > 50, "enough points in view to compare, got " + compared);
    }

    private static int compareWithOpenCv(Se3_F64 camToWorld, CameraModel cam, List<Vec3> points) {
        Mat rwc = new Mat(3, 3, CvType.CV_64F);
        Mat tvec = new Mat(3, 1, CvType.CV_64F);
        double[] t = cameraPoint(camToWorld, new Vec3(0, 0, 0));
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                rwc.put(i, j, camToWorld.R.get(j, i));
            }
            tvec.put(i, 0, t[i]);
        }
        Mat rvec = new Mat();
        Calib3d.Rodrigues(rwc, rvec);
        Mat k = Mat.zeros(3, 3, CvType.CV_64F);
        k.put(0, 0, cam.fx(), cam.skew(), cam.cx(), 0, cam.fy(), cam.cy(), 0, 0, 1);
        MatOfDouble dist = new MatOfDouble(cam.k1(), cam.k2(), cam.p1(), cam.p2(), cam.k3());
        int compared = 0;
        double[] px = new double[2];
        for (Vec3 p : points) {
            double[] c = cameraPoint(camToWorld, p);
            cam.normalizedToPixel(c[0] / c[2], c[1] / c[2], px);
            if (c[2] < 0.5 || px[0] < 0 || px[1] < 0 || px[0] >= cam.width() || px[1] >= cam.height()) {
                continue;
            }
            MatOfPoint2f out = new MatOfPoint2f();
            Calib3d.projectPoints(new MatOfPoint3f(new Point3(p.x(), p.y(), p.z())), rvec, tvec, k, dist, out);
            assertEquals(out.toArray()[0].x, px[0], 2e-3, "u of " + p);
            assertEquals(out.toArray()[0].y, px[1], 2e-3, "v of " + p);
            compared++;
        }
        return compared;
    }

    @Test
    void renderedDepthAtAProjectedKioskPointIsItsDepthInTheCamera() {
        // Ties the ground-truth pose and camera (checked against OpenCV above) to the pixels: where the kiosk
        // front's centre projects, the depth image holds that point's z in the camera.
        Scenario s = CLEAN;
        FrameMaker maker = new FrameMaker(s);
        int checked = 0;
        for (Visit v : s.visits()) {
            if (!v.place().startsWith("Kiosk")) {
                continue;
            }
            RenderedFrame f = maker.make(v.session(), v.frame());
            double[] c = cameraPoint(f.pose().cameraToWorld(), kioskFront(s, v.place()));
            double[] px = new double[2];
            s.camera().normalizedToPixel(c[0] / c[2], c[1] / c[2], px);
            int u = (int) Math.round(px[0]);
            int row = (int) Math.round(px[1]);
            assertTrue(u >= 0 && row >= 0 && u < f.width() && row < f.height(), "kiosk in view at " + v);
            assertEquals(c[2], f.depthMetres(u, row), 0.02, "depth at the kiosk centre, " + v);
            checked++;
        }
        assertTrue(checked >= 4, "kiosk visits checked: " + checked);
    }
}
