package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import revisit.camera.CameraModel;

class RendererTest {

    /** Distorted camera of the scenario at 320x240 (k1 -0.08, k2 0.012, p1 0.0004, p2 -0.0003). */
    private static final CameraModel CAMERA = ScenarioConfig.defaults().withSize(320, 240).camera();
    private static final double DENSITY = 400;
    private static final double DISC_RADIUS = 0.03;

    /** A 2 m x 1.5 m black board with white discs on a 4 x 3 grid; returns the disc centres in metres. */
    private static Surface board(Vec3 bottomCentre, Vec3 outward, List<double[]> discs) {
        Canvas c = new Canvas((int) (2 * DENSITY), (int) (1.5 * DENSITY));
        c.fill(0.1f);
        for (int i = 0; i < 4; i++) {
            for (int j = 0; j < 3; j++) {
                double u = 0.3 + i * 0.45;
                double v = 0.3 + j * 0.45;
                c.disc(u * DENSITY, v * DENSITY, DISC_RADIUS * DENSITY, 0.9f);
                discs.add(new double[]{u, v});
            }
        }
        return Surface.upright(bottomCentre, outward, 2, 1.5, c.toTexture(), 1.0, "board");
    }

    private static double[] project(Se3_F64 pose, Vec3 p) {
        double[] c = new double[3];
        for (int j = 0; j < 3; j++) {
            c[j] = pose.R.get(0, j) * (p.x() - pose.T.x) + pose.R.get(1, j) * (p.y() - pose.T.y)
                    + pose.R.get(2, j) * (p.z() - pose.T.z);
        }
        double[] px = new double[2];
        CAMERA.normalizedToPixel(c[0] / c[2], c[1] / c[2], px);
        return px;
    }

    /**
     * Intensity-weighted centroid of (value - background) in a square window, the background being the mean of
     * the window's border (so the 8-bit rounding of the texture does not pull the centroid to the window centre).
     */
    private static double[] centroid(float[] img, int w, double[] around, int half) {
        int u0 = (int) around[0] - half;
        int v0 = (int) around[1] - half;
        double border = 0;
        for (int k = 0; k <= 2 * half; k++) {
            border += img[v0 * w + u0 + k] + img[(v0 + 2 * half) * w + u0 + k] + img[(v0 + k) * w + u0]
                    + img[(v0 + k) * w + u0 + 2 * half];
        }
        double background = border / (8 * half + 4);
        double sum = 0;
        double su = 0;
        double sv = 0;
        for (int v = (int) around[1] - half; v <= (int) around[1] + half; v++) {
            for (int u = (int) around[0] - half; u <= (int) around[0] + half; u++) {
                double weight = Math.max(0, img[v * w + u] - background);
                sum += weight;
                su += weight * u;
                sv += weight * v;
            }
        }
        return new double[]{su / sum, sv / sum};
    }

    @Test
    void discCentresAreDrawnWhereTheCameraModelProjectsThem() {
        // Internal consistency: the renderer's rays come from CameraModel.pixelToNormalized, the check projects
        // with CameraModel.normalizedToPixel. The centroid of a small symmetric blob is its centre (common
        // practice); perspective shifts it by about (r/Z)^2 of its radius, here under 0.001 px. Point sampling
        // of a 2.6 px blob leaves up to 0.035 px (measured), hence the 0.05 px bound.
        List<double[]> discs = new ArrayList<>();
        Surface wall = board(new Vec3(3, 0, 0.8), new Vec3(-1, 0.15, 0), discs);
        Se3_F64 pose = Route.pose(0, 0.2, 1.5, Math.toRadians(-3), Math.toRadians(4), Math.toRadians(2));
        Renderer r = new Renderer(new CameraRays(CAMERA));
        r.render(pose, List.of(wall), new double[]{1.0}, new double[]{0, 0});
        int checked = 0;
        for (double[] d : discs) {
            double[] expected = project(pose, wall.pointAt(d[0], d[1]));
            double[] found = centroid(r.radiance, CAMERA.width(), expected, 9);
            assertEquals(expected[0], found[0], 0.05, "u of disc at " + d[0] + ", " + d[1]);
            assertEquals(expected[1], found[1], 0.05, "v of disc at " + d[0] + ", " + d[1]);
            checked++;
        }
        assertEquals(12, checked);
    }

    @Test
    void depthPutsEveryHitPixelOnItsPlane() {
        List<double[]> discs = new ArrayList<>();
        Surface wall = board(new Vec3(3, 0, 0.5), new Vec3(-1, 0.4, 0), discs);
        Se3_F64 pose = Route.pose(0, 0, 1.2, Math.toRadians(10), Math.toRadians(6), 0);
        CameraRays rays = new CameraRays(CAMERA);
        Renderer r = new Renderer(rays);
        r.render(pose, List.of(wall), new double[]{1.0}, new double[]{0, 0});
        Vec3 n = wall.facing();
        int hits = 0;
        for (int p = 0; p < r.depth.length; p++) {
            if (r.depth[p] == 0) {
                continue;
            }
            double[] c = {r.depth[p] * rays.xn[p], r.depth[p] * rays.yn[p], r.depth[p]};
            Vec3 world = new Vec3(pose.T.x, pose.T.y, pose.T.z);
            for (int i = 0; i < 3; i++) {
                Vec3 column = new Vec3(pose.R.get(0, i), pose.R.get(1, i), pose.R.get(2, i));
                world = world.plus(column.times(c[i]));
            }
            assertEquals(0, n.dot(world.minus(wall.origin())), 1e-5, "pixel " + p);
            hits++;
        }
        assertTrue(hits > 5000, "the board should fill part of the image, hit " + hits);
    }

    @Test
    void nearerSurfaceHidesFartherOneAndBackFacesAreNotDrawn() {
        Texture bright = new Texture(1, 1, new float[]{1f});
        Texture dark = new Texture(1, 1, new float[]{0.2f});
        Surface far = Surface.upright(new Vec3(5, 0, -1), new Vec3(-1, 0, 0), 12, 6, dark, 1, "");
        Surface near = Surface.upright(new Vec3(3, 0, 1), new Vec3(-1, 0, 0), 0.5, 0.5, bright, 1, "");
        Surface turnedAway = Surface.upright(new Vec3(2, 0, 1), new Vec3(1, 0, 0), 0.5, 0.5, dark, 1, "");
        Se3_F64 pose = Route.pose(0, 0, 1.25, 0, 0, 0);
        Renderer r = new Renderer(new CameraRays(CAMERA));
        r.render(pose, List.of(far, near, turnedAway), new double[]{1, 1, 1}, new double[]{0, 0});
        int centre = (CAMERA.height() / 2) * CAMERA.width() + CAMERA.width() / 2;
        assertEquals(1.0, r.radiance[centre], 1e-6, "the near bright square covers the centre");
        assertEquals(3.0, r.depth[centre], 1e-4, "its z-depth is 3 m");
        assertEquals(0.2, r.radiance[10 * CAMERA.width() + 10], 1e-6, "the far wall elsewhere");
    }

    @Test
    void logTwoIsExactAtPowersOfTwoAndMonotone() {
        assertEquals(3.0, Renderer.log2(8.0), 0);
        assertEquals(-2.0, Renderer.log2(0.25), 0);
        double previous = Renderer.log2(0.01);
        for (double v = 0.011; v < 100; v *= 1.01) {
            double l = Renderer.log2(v);
            assertTrue(l > previous);
            assertEquals(Math.log(v) / Math.log(2), l, 0.09, "within 0.09 of the true log2 at " + v);
            previous = l;
        }
    }
}
