package revisit.scenario;

/**
 * Sun and sky of one session: brightness of a surface is {@code albedo (ambient + sun max(0, n.L))} times the
 * session gain, with L the unit direction towards the sun (Lambert's cosine law).
 *
 * @param sunAzimuthDeg   direction of the sun, degrees from east towards north
 * @param sunElevationDeg height of the sun above the horizon, degrees, 0 to 90
 * @param ambient         sky light on every surface, 0 to 1
 * @param sun             direct light at normal incidence, 0 to 1
 * @param gain            overall exposure of the session, typically 0.7 to 1.2
 */
public record Lighting(double sunAzimuthDeg, double sunElevationDeg, double ambient, double sun, double gain) {

    /** Late morning, high sun from the south-east. */
    public static Lighting morning() {
        return new Lighting(-45, 40, 0.55, 0.5, 1.0);
    }

    /** Evening, low sun from the west, darker overall (the second session's light). */
    public static Lighting evening() {
        return new Lighting(200, 12, 0.45, 0.45, 0.82);
    }

    /** Brightness factor for a surface facing {@code normal} with material albedo. */
    public double shade(Vec3 normal, double albedo) {
        double az = Math.toRadians(sunAzimuthDeg);
        double el = Math.toRadians(sunElevationDeg);
        Vec3 toSun = new Vec3(Math.cos(az) * Math.cos(el), Math.sin(az) * Math.cos(el), Math.sin(el));
        return albedo * (ambient + sun * Math.max(0, normal.unit().dot(toSun))) * gain;
    }
}
