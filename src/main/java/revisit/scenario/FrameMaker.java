package revisit.scenario;

import georegression.struct.se.Se3_F64;
import java.util.List;
import java.util.SplittableRandom;
import revisit.io.StampedPose;

/**
 * Renders frames of a scenario with their nuisances. Every random draw of a frame (defocus, noise) comes from a
 * source seeded by the scenario seed, the session and the frame index alone, so frames can be made in any order
 * and on any thread with identical bytes. Not thread-safe: one maker per thread.
 */
public final class FrameMaker {

    private final Scenario scenario;
    private final CameraRays rays;
    private final Renderer renderer;
    private final float[] scratch;

    public FrameMaker(Scenario scenario) {
        this.scenario = scenario;
        this.rays = new CameraRays(scenario.camera());
        this.renderer = new Renderer(rays);
        this.scratch = new float[rays.width * rays.height];
    }

    /**
     * Renders one frame.
     *
     * @param session session index
     * @param frame   frame index within the session
     */
    public RenderedFrame make(int session, int frame) {
        Session ses = scenario.sessions().get(session);
        ScenarioConfig c = scenario.config();
        double t = ses.time(frame);
        Se3_F64 pose = ses.route().poseAt(t);
        List<Surface> surfaces = scenario.world().surfacesAt(t + ses.clockOffset());
        double[] shade = new double[surfaces.size()];
        for (int i = 0; i < shade.length; i++) {
            shade[i] = ses.lighting().shade(surfaces.get(i).facing(), surfaces.get(i).albedo());
        }
        double g = ses.lighting().gain();
        renderer.render(pose, surfaces, shade, new double[]{0.78 * g, 0.2 * g});
        short[] depth = depthMillimetres(renderer.depth);
        float[] img = renderer.radiance;
        SplittableRandom rnd = new SplittableRandom(SeedMixer.derive(c.seed(), 80, session, frame));
        if (c.shutterSeconds() > 0) {
            double[] streak = streak(ses, t, c.shutterSeconds());
            if (Math.hypot(streak[0], streak[1]) >= 0.5) {
                Nuisances.motionBlur(img, scratch, rays.width, rays.height, streak[0], streak[1]);
            }
        }
        if (rnd.nextDouble() < c.defocusFraction()) {
            int radius = (int) Math.max(1, Math.round((1 + 2 * rnd.nextDouble()) * rays.width / 640.0));
            Nuisances.defocus(img, scratch, rays.width, rays.height, radius);
        }
        byte[] grey = Nuisances.quantize(img, exposureGain(c, session, t), c.noiseSigma(), rnd);
        return new RenderedFrame(rays.width, rays.height, grey, depth, StampedPose.of(t, pose));
    }

    /** Slow auto-exposure drift: two sines with seeded phases, periods 17 s and 5.3 s. */
    private double exposureGain(ScenarioConfig c, int session, double t) {
        SplittableRandom phases = new SplittableRandom(SeedMixer.derive(c.seed(), 81, session));
        double a = phases.nextDouble() * 2 * Math.PI;
        double b = phases.nextDouble() * 2 * Math.PI;
        return 1 + c.exposureVariation() * (0.65 * Math.sin(2 * Math.PI * t / 17 + a)
                + 0.35 * Math.sin(2 * Math.PI * t / 5.3 + b));
    }

    /** Image motion of the frame centre's scene point over the shutter time, pixels (du, dv). */
    private double[] streak(Session ses, double t, double shutter) {
        int centre = (rays.height / 2) * rays.width + rays.width / 2;
        double d = renderer.depth[centre] > 0 ? renderer.depth[centre] : 10;
        Se3_F64 now = ses.route().poseAt(t);
        double[] xc = {d * rays.xn[centre], d * rays.yn[centre], d};
        double[] world = {now.T.x, now.T.y, now.T.z};
        for (int i = 0; i < 3; i++) {
            world[i] += now.R.get(i, 0) * xc[0] + now.R.get(i, 1) * xc[1] + now.R.get(i, 2) * xc[2];
        }
        double[] a = project(ses.route().poseAt(t - shutter / 2), world);
        double[] b = project(ses.route().poseAt(t + shutter / 2), world);
        return new double[]{b[0] - a[0], b[1] - a[1]};
    }

    private double[] project(Se3_F64 pose, double[] world) {
        double[] c = new double[3];
        for (int j = 0; j < 3; j++) {
            c[j] = pose.R.get(0, j) * (world[0] - pose.T.x) + pose.R.get(1, j) * (world[1] - pose.T.y)
                    + pose.R.get(2, j) * (world[2] - pose.T.z);
        }
        double[] px = new double[2];
        scenario.camera().normalizedToPixel(c[0] / c[2], c[1] / c[2], px);
        return px;
    }

    private static short[] depthMillimetres(float[] metres) {
        short[] out = new short[metres.length];
        for (int i = 0; i < metres.length; i++) {
            out[i] = (short) Math.min(65535, Math.round(metres[i] * 1000.0));
        }
        return out;
    }
}
