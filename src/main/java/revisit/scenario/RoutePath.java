package revisit.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * A ground path through waypoints with every corner rounded by a circular arc of a fixed radius, parametrised by
 * arc length. Position and tangent heading are exact at any arc position, so the trajectory is smooth (continuous
 * heading, bounded turn rate) and the place where the path passes a point is known from the design itself.
 */
final class RoutePath {

    /** One piece of the path: a straight line (radius 0) or an arc. */
    private record Piece(double startS, double length, double x0, double y0, double heading0, double curvature) {

        double[] at(double s) {
            double d = s - startS;
            if (curvature == 0) {
                return new double[]{x0 + d * Math.cos(heading0), y0 + d * Math.sin(heading0), heading0};
            }
            double h = heading0 + d * curvature;
            double r = 1 / curvature;
            return new double[]{x0 + r * (Math.sin(h) - Math.sin(heading0)),
                    y0 - r * (Math.cos(h) - Math.cos(heading0)), h};
        }
    }

    private final List<Piece> pieces = new ArrayList<>();
    private final double length;

    /**
     * @param waypoints  (x, y) pairs in metres; consecutive points distinct
     * @param cornerRadiusM radius of every corner arc, metres
     */
    RoutePath(List<double[]> waypoints, double cornerRadiusM) {
        if (waypoints.size() < 2) {
            throw new IllegalArgumentException("a route needs at least two waypoints");
        }
        double s = 0;
        double[] cursor = waypoints.get(0);
        for (int i = 1; i < waypoints.size(); i++) {
            double[] p = waypoints.get(i);
            double headingIn = Math.atan2(p[1] - cursor[1], p[0] - cursor[0]);
            double trim = 0;
            double turn = 0;
            if (i + 1 < waypoints.size()) {
                double[] q = waypoints.get(i + 1);
                turn = wrap(Math.atan2(q[1] - p[1], q[0] - p[0]) - headingIn);
                trim = cornerRadiusM * Math.tan(Math.abs(turn) / 2);
            }
            double straight = Math.hypot(p[0] - cursor[0], p[1] - cursor[1]) - trim;
            if (straight < -1e-9) {
                throw new IllegalArgumentException("waypoints too close for corner radius " + cornerRadiusM);
            }
            pieces.add(new Piece(s, straight, cursor[0], cursor[1], headingIn, 0));
            s += straight;
            double[] arcStart = pieces.get(pieces.size() - 1).at(s);
            if (turn != 0) {
                double arcLength = cornerRadiusM * Math.abs(turn);
                Piece arc = new Piece(s, arcLength, arcStart[0], arcStart[1], headingIn,
                        Math.signum(turn) / cornerRadiusM);
                pieces.add(arc);
                s += arcLength;
                cursor = arc.at(s);
            } else {
                cursor = arcStart;
            }
        }
        length = s;
    }

    /** Total length, metres. */
    double length() {
        return length;
    }

    /** (x, y, heading) at arc position s (clamped to the path); heading in radians from +x towards +y. */
    double[] at(double s) {
        double c = Math.max(0, Math.min(length, s));
        for (Piece p : pieces) {
            if (c <= p.startS + p.length) {
                return p.at(c);
            }
        }
        return pieces.get(pieces.size() - 1).at(c);
    }

    /**
     * Arc positions where the path passes within {@code maxDistanceM} of a point, one per straight piece that
     * passes it (closest point of that piece). Arcs are skipped: places are planted on straight lanes.
     */
    List<Double> passes(double x, double y, double maxDistanceM) {
        List<Double> out = new ArrayList<>();
        for (Piece p : pieces) {
            if (p.curvature != 0) {
                continue;
            }
            double dx = Math.cos(p.heading0);
            double dy = Math.sin(p.heading0);
            double along = (x - p.x0) * dx + (y - p.y0) * dy;
            double across = -(x - p.x0) * dy + (y - p.y0) * dx;
            if (along >= 0 && along <= p.length && Math.abs(across) <= maxDistanceM) {
                out.add(p.startS + along);
            }
        }
        return out;
    }

    /** Angle wrapped into (-pi, pi]. */
    static double wrap(double a) {
        double w = Math.IEEEremainder(a, 2 * Math.PI);
        return w <= -Math.PI ? w + 2 * Math.PI : w;
    }
}
