package revisit.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * A textured planar rectangle of the world. Points are {@code origin + u axisU + v axisV} for u in [0, widthM] and
 * v in [0, heightM]; texel (s, t) = (u, v) scaled to the texture's size, so the origin is the texture's top-left
 * corner. The surface is one-sided: it is seen from the side its {@link #facing()} normal points to
 * ({@code axisV x axisU}), where its texture reads unmirrored.
 *
 * @param origin   top-left corner, metres
 * @param axisU    unit direction of growing u (texture columns)
 * @param axisV    unit direction of growing v (texture rows), orthogonal to axisU
 * @param widthM   extent along axisU, metres
 * @param heightM  extent along axisV, metres
 * @param texture  albedo texture stretched over the rectangle
 * @param albedo   material brightness factor, typically 0.6 to 1.2
 * @param place    name of the place the surface belongs to, or "" for none
 */
public record Surface(Vec3 origin, Vec3 axisU, Vec3 axisV, double widthM, double heightM, Texture texture,
                      double albedo, String place) {

    public Surface {
        if (!(widthM > 0) || !(heightM > 0)) {
            throw new IllegalArgumentException("surface size must be positive, was " + widthM + " x " + heightM);
        }
        if (Math.abs(axisU.length() - 1) > 1e-9 || Math.abs(axisV.length() - 1) > 1e-9
                || Math.abs(axisU.dot(axisV)) > 1e-9) {
            throw new IllegalArgumentException("surface axes must be orthonormal");
        }
    }

    /** Normal on the visible side. */
    public Vec3 facing() {
        return axisV.cross(axisU);
    }

    /** The world point at surface coordinates (u, v), metres. */
    public Vec3 pointAt(double u, double v) {
        return origin.plus(axisU.times(u)).plus(axisV.times(v));
    }

    /** The four corners: top-left, top-right, bottom-right, bottom-left. */
    public List<Vec3> corners() {
        return List.of(pointAt(0, 0), pointAt(widthM, 0), pointAt(widthM, heightM), pointAt(0, heightM));
    }

    /**
     * An upright rectangle whose visible side faces the horizontal direction {@code outward}.
     *
     * @param bottomCentre middle of the bottom edge, metres
     * @param outward      horizontal direction the surface faces (normalised here)
     */
    public static Surface upright(Vec3 bottomCentre, Vec3 outward, double widthM, double heightM, Texture texture,
                                  double albedo, String place) {
        Vec3 n = new Vec3(outward.x(), outward.y(), 0).unit();
        Vec3 u = Vec3.UP.cross(n);
        Vec3 origin = bottomCentre.minus(u.times(widthM / 2)).plus(Vec3.UP.times(heightM));
        return new Surface(origin, u, Vec3.UP.times(-1), widthM, heightM, texture, albedo, place);
    }

    /** A horizontal rectangle facing up, texture north at the top. */
    public static Surface horizontal(double xMin, double yMin, double xMax, double yMax, double z, Texture texture,
                                     double albedo, String place) {
        return new Surface(new Vec3(xMin, yMax, z), new Vec3(1, 0, 0), new Vec3(0, -1, 0), xMax - xMin, yMax - yMin,
                texture, albedo, place);
    }

    /**
     * A closed box standing on the floor (four sides and a top, no bottom).
     *
     * @param centre   centre of the footprint on the floor
     * @param yawRad   rotation of the box about the vertical, radians
     * @param sides    textures for the four sides in order +x', +y', -x', -y' (box axes), then the top
     */
    public static List<Surface> box(Vec3 centre, double sizeX, double sizeY, double sizeZ, double yawRad,
                                    List<Texture> sides, double albedo, String place) {
        if (sides.size() != 5) {
            throw new IllegalArgumentException("a box needs 5 textures (4 sides and top), got " + sides.size());
        }
        Vec3 ex = new Vec3(Math.cos(yawRad), Math.sin(yawRad), 0);
        Vec3 ey = new Vec3(-Math.sin(yawRad), Math.cos(yawRad), 0);
        List<Surface> out = new ArrayList<>(5);
        out.add(upright(centre.plus(ex.times(sizeX / 2)), ex, sizeY, sizeZ, sides.get(0), albedo, place));
        out.add(upright(centre.plus(ey.times(sizeY / 2)), ey, sizeX, sizeZ, sides.get(1), albedo, place));
        out.add(upright(centre.minus(ex.times(sizeX / 2)), ex.times(-1), sizeY, sizeZ, sides.get(2), albedo, place));
        out.add(upright(centre.minus(ey.times(sizeY / 2)), ey.times(-1), sizeX, sizeZ, sides.get(3), albedo, place));
        Vec3 topOrigin = centre.plus(Vec3.UP.times(sizeZ)).minus(ex.times(sizeX / 2)).plus(ey.times(sizeY / 2));
        out.add(new Surface(topOrigin, ex, ey.times(-1), sizeX, sizeY, sides.get(4), albedo, place));
        return out;
    }
}
