package revisit.scenario;

import java.util.List;

/**
 * A moving occluder: a person-like slab or a cart, a box that walks back and forth along a straight track at
 * constant speed. Its surfaces at any instant follow from the time alone.
 *
 * @param kind     "person" or "cart"
 * @param from     one end of the track on the floor, metres
 * @param to       other end, metres
 * @param speed    metres per second
 * @param phase    position along the back-and-forth cycle at time 0, as a fraction in [0, 1)
 * @param sizeX    extent across the track, metres
 * @param sizeY    extent along the track, metres
 * @param sizeZ    height, metres
 * @param sides    five textures (four sides and top)
 */
public record Walker(String kind, Vec3 from, Vec3 to, double speed, double phase, double sizeX, double sizeY,
                     double sizeZ, List<Texture> sides) {

    /** Centre of the footprint at time t seconds. */
    public Vec3 positionAt(double t) {
        double length = to.minus(from).length();
        double cycle = 2 * length / speed;
        double f = (t / cycle + phase) % 1.0;
        if (f < 0) {
            f += 1;
        }
        double along = f < 0.5 ? 2 * f : 2 - 2 * f;
        return from.plus(to.minus(from).times(along));
    }

    /** The box surfaces at time t seconds. */
    public List<Surface> surfacesAt(double t) {
        Vec3 d = to.minus(from);
        double yaw = Math.atan2(d.y(), d.x()) - Math.PI / 2;
        return Surface.box(positionAt(t), sizeX, sizeY, sizeZ, yaw, sides, 1.0, "");
    }
}
