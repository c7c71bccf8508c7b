package revisit.scenario;

/**
 * A point or direction in world coordinates of the invented scenario (x east, y north, z up, metres).
 *
 * @param x east, metres
 * @param y north, metres
 * @param z up, metres
 */
public record Vec3(double x, double y, double z) {

    /** Straight up. */
    public static final Vec3 UP = new Vec3(0, 0, 1);

    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    public Vec3 minus(Vec3 o) {
        return new Vec3(x - o.x, y - o.y, z - o.z);
    }

    public Vec3 times(double s) {
        return new Vec3(x * s, y * s, z * s);
    }

    public double dot(Vec3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    public Vec3 cross(Vec3 o) {
        return new Vec3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    public double length() {
        return Math.sqrt(dot(this));
    }

    /** Unit vector in the same direction. */
    public Vec3 unit() {
        double n = length();
        if (!(n > 0)) {
            throw new IllegalArgumentException("cannot normalise a zero vector");
        }
        return times(1 / n);
    }
}
