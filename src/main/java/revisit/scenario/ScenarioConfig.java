package revisit.scenario;

import revisit.camera.CameraModel;

/**
 * Settings of the invented scenario generator. Every random choice derives from {@link #seed}, so one config
 * always gives the same frames, depths and poses, byte for byte.
 *
 * @param seed              seeds textures, layout details, sway, walkers and nuisances; any value (default 7)
 * @param frameCount        frames of the first session; the second session has half as many; 20 to 100000
 *                          (default 1000, chosen here so the walk runs at about 1.2 m/s)
 * @param loopCount         1 = one lap of the yard ring; 2 = a lap, then across the yard and a lap in the opposite
 *                          direction (revisits from the opposite and oblique headings); default 2
 * @param width             image width, pixels, 64 to 4096 (default 640, common VGA size)
 * @param height            image height, pixels, 48 to 4096 (default 480)
 * @param rateHz            frames per second, 1 to 100 (default 10, a usual keyframe rate for place recognition)
 * @param noiseSigma        standard deviation of sensor noise, grey levels of 255, 0 to 20 (default 2, a clean
 *                          industrial camera in daylight; common practice)
 * @param shutterSeconds    exposure time that smears motion into blur, seconds, 0 to 0.1 (default 0.008, a
 *                          daylight exposure; chosen here)
 * @param defocusFraction   fraction of frames rendered out of focus, 0 to 1 (default 0.04)
 * @param exposureVariation amplitude of slow auto-exposure drift as a relative gain, 0 to 0.5 (default 0.15)
 * @param occluderCount     people and carts walking the yard, 0 to 8 (default 4)
 * @param secondSession     also record a second session over the same yard with other light and start
 * @param twinPlace         paint two kiosks at different places with the same textures (perceptual aliasing)
 * @param distortion        give the camera mild barrel and tangential distortion
 * @param photoPosters      paste real photos as posters when a photo folder is supplied
 */
public record ScenarioConfig(long seed, int frameCount, int loopCount, int width, int height, double rateHz,
                             double noiseSigma, double shutterSeconds, double defocusFraction,
                             double exposureVariation, int occluderCount, boolean secondSession, boolean twinPlace,
                             boolean distortion, boolean photoPosters) {

    /** Highest walking speed the route accepts, metres per second (a quick cart; chosen here). */
    public static final double MAX_SPEED = 6.0;

    public ScenarioConfig {
        check(frameCount >= 20 && frameCount <= 100_000, "frameCount", frameCount, "20 to 100000");
        check(loopCount >= 1 && loopCount <= 2, "loopCount", loopCount, "1 or 2");
        check(width >= 64 && width <= 4096, "width", width, "64 to 4096 pixels");
        check(height >= 48 && height <= 4096, "height", height, "48 to 4096 pixels");
        check(rateHz >= 1 && rateHz <= 100, "rateHz", rateHz, "1 to 100");
        check(noiseSigma >= 0 && noiseSigma <= 20, "noiseSigma", noiseSigma, "0 to 20 grey levels");
        check(shutterSeconds >= 0 && shutterSeconds <= 0.1, "shutterSeconds", shutterSeconds, "0 to 0.1 s");
        check(defocusFraction >= 0 && defocusFraction <= 1, "defocusFraction", defocusFraction, "0 to 1");
        check(exposureVariation >= 0 && exposureVariation <= 0.5, "exposureVariation", exposureVariation, "0 to 0.5");
        check(occluderCount >= 0 && occluderCount <= 8, "occluderCount", occluderCount, "0 to 8");
    }

    private static void check(boolean ok, String name, double value, String range) {
        if (!ok) {
            throw new IllegalArgumentException("scenario " + name + " " + value + " is out of range, expected "
                    + range);
        }
    }

    /** Full-size defaults: 1000 + 500 frames at 640x480 with every nuisance on. */
    public static ScenarioConfig defaults() {
        return new ScenarioConfig(7, 1000, 2, 640, 480, 10, 2.0, 0.008, 0.04, 0.15, 4, true, true, true, true);
    }

    /**
     * A small scenario for the demo and tests: 240 + 120 frames at 320x240, same world and nuisances. The route
     * is the same length, so the camera moves about 4 times faster (5.1 m/s); the shutter is halved to 0.004 s so
     * motion blur stays about as many pixels long as in the full preset.
     */
    public static ScenarioConfig small() {
        ScenarioConfig d = defaults().withFrameCount(240).withSize(320, 240);
        return d.withNuisances(d.noiseSigma(), 0.004, d.defocusFraction(), d.exposureVariation(), d.occluderCount());
    }

    /** The camera these settings describe: f = 0.8 width (about 64 degrees across), centred principal point. */
    public CameraModel camera() {
        double f = 0.8 * width;
        double cx = (width - 1) / 2.0;
        double cy = (height - 1) / 2.0;
        return distortion
                ? new CameraModel(width, height, f, f, 0, cx, cy, -0.08, 0.012, 0, 0.0004, -0.0003)
                : CameraModel.pinhole(width, height, f, f, cx, cy);
    }

    /** Frames of the second session (half the first), or 0 when it is off. */
    public int secondSessionFrames() {
        return secondSession ? Math.max(20, frameCount / 2) : 0;
    }

    public ScenarioConfig withSeed(long v) {
        return new ScenarioConfig(v, frameCount, loopCount, width, height, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, twinPlace, distortion, photoPosters);
    }

    public ScenarioConfig withFrameCount(int v) {
        return new ScenarioConfig(seed, v, loopCount, width, height, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, twinPlace, distortion, photoPosters);
    }

    public ScenarioConfig withLoopCount(int v) {
        return new ScenarioConfig(seed, frameCount, v, width, height, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, twinPlace, distortion, photoPosters);
    }

    public ScenarioConfig withRateHz(double v) {
        return new ScenarioConfig(seed, frameCount, loopCount, width, height, v, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, twinPlace, distortion, photoPosters);
    }

    public ScenarioConfig withSize(int w, int h) {
        return new ScenarioConfig(seed, frameCount, loopCount, w, h, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, twinPlace, distortion, photoPosters);
    }

    /** Sets all nuisances at once: noise, shutter, defocus fraction, exposure drift, occluders. */
    public ScenarioConfig withNuisances(double noise, double shutter, double defocus, double exposure, int occluders) {
        return new ScenarioConfig(seed, frameCount, loopCount, width, height, rateHz, noise, shutter, defocus,
                exposure, occluders, secondSession, twinPlace, distortion, photoPosters);
    }

    /** No noise, blur, exposure drift or walkers: clean geometry for checks. */
    public ScenarioConfig withoutNuisances() {
        return withNuisances(0, 0, 0, 0, 0);
    }

    public ScenarioConfig withSecondSession(boolean v) {
        return new ScenarioConfig(seed, frameCount, loopCount, width, height, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, v, twinPlace, distortion, photoPosters);
    }

    public ScenarioConfig withTwinPlace(boolean v) {
        return new ScenarioConfig(seed, frameCount, loopCount, width, height, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, v, distortion, photoPosters);
    }

    public ScenarioConfig withDistortion(boolean v) {
        return new ScenarioConfig(seed, frameCount, loopCount, width, height, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, twinPlace, v, photoPosters);
    }

    public ScenarioConfig withPhotoPosters(boolean v) {
        return new ScenarioConfig(seed, frameCount, loopCount, width, height, rateHz, noiseSigma, shutterSeconds,
                defocusFraction, exposureVariation, occluderCount, secondSession, twinPlace, distortion, v);
    }
}
