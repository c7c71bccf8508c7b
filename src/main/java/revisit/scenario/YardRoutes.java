package revisit.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * The routes walked through Tallow Yard and the visits they plant. Session 1 starts at Lantern Gate heading east
 * and walks the ring anticlockwise; with two loops it then takes the cross lane north and walks the ring
 * clockwise, which revisits every ring place from the opposite direction, or obliquely where the camera glances
 * at a facade on both passes. Session 2 starts on the east lane and walks the ring anticlockwise in evening light.
 */
final class YardRoutes {

    /** Corner radius of every turn, metres (a walker's or cart's smooth turn; chosen here). */
    static final double CORNER_RADIUS = 3;
    /** A pass counts as a visit when the lane runs within this distance of the anchor, metres. */
    static final double PASS_TOLERANCE = 0.3;

    private YardRoutes() {
    }

    static List<double[]> firstSessionWaypoints(int loops) {
        List<double[]> w = new ArrayList<>(List.of(new double[]{10, 5}, new double[]{24, 5}, new double[]{24, 17},
                new double[]{6, 17}, new double[]{6, 5}));
        if (loops == 1) {
            w.add(new double[]{13, 5});
            return w;
        }
        w.addAll(List.of(new double[]{15, 5}, new double[]{15, 17}, new double[]{24, 17}, new double[]{24, 5},
                new double[]{6, 5}, new double[]{6, 17}, new double[]{13, 17}));
        return w;
    }

    static List<double[]> secondSessionWaypoints() {
        return List.of(new double[]{24, 8}, new double[]{24, 17}, new double[]{6, 17}, new double[]{6, 5},
                new double[]{24, 5}, new double[]{24, 14});
    }

    /** The sessions of a scenario: one, or two when the config asks for the second. */
    static List<Session> sessions(ScenarioConfig c, List<Place> places) {
        List<Session> out = new ArrayList<>();
        out.add(session("session1", firstSessionWaypoints(c.loopCount()), c.frameCount(), c, places,
                Lighting.morning(), 0, 1));
        if (c.secondSession()) {
            out.add(session("session2", secondSessionWaypoints(), c.secondSessionFrames(), c, places,
                    Lighting.evening(), 3600, 2));
        }
        return out;
    }

    private static Session session(String name, List<double[]> waypoints, int frames, ScenarioConfig c,
                                   List<Place> places, Lighting light, double clockOffset, int key) {
        RoutePath path = new RoutePath(waypoints, CORNER_RADIUS);
        double duration = (frames - 1) / c.rateHz();
        double speed = path.length() / duration;
        if (speed > ScenarioConfig.MAX_SPEED) {
            int needed = (int) Math.ceil(path.length() / ScenarioConfig.MAX_SPEED * c.rateHz()) + 1;
            throw new IllegalArgumentException(name + " route is " + Math.round(path.length()) + " m: " + frames
                    + " frames would move " + String.format(java.util.Locale.ROOT, "%.1f", speed)
                    + " m/s, above " + ScenarioConfig.MAX_SPEED + " m/s; use at least " + needed
                    + " frames for this session");
        }
        List<Route.Glance> glances = new ArrayList<>();
        for (Place p : places) {
            for (double s : path.passes(p.x(), p.y(), PASS_TOLERANCE)) {
                glances.add(new Route.Glance(s, Math.toRadians(glanceSign(path, s, p) * p.glanceDeg())));
            }
        }
        Route route = new Route(path, duration, glances, SeedMixer.derive(c.seed(), 70, key));
        return new Session(name, route, frames, c.rateHz(), light, clockOffset);
    }

    /** +1 when the outer wall is on the left of the travel direction at s (turn left to face it), else -1. */
    private static int glanceSign(RoutePath path, double s, Place p) {
        double h = path.at(s)[2];
        double ox = p.x() - YardWorld.RING_X;
        double oy = p.y() - YardWorld.RING_Y;
        return -Math.sin(h) * ox + Math.cos(h) * oy > 0 ? 1 : -1;
    }

    /** All planned visits, session by session, in time order. */
    static List<Visit> visits(List<Session> sessions, List<Place> places) {
        List<Visit> out = new ArrayList<>();
        for (int si = 0; si < sessions.size(); si++) {
            Session ses = sessions.get(si);
            Route route = ses.route();
            double metresPerFrame = route.speed() / ses.rateHz();
            for (Place p : places) {
                for (double s : route.path().passes(p.x(), p.y(), PASS_TOLERANCE)) {
                    int frame = (int) Math.min(ses.frameCount() - 1, Math.round(s / metresPerFrame));
                    double heading = Math.toDegrees(route.path().at(s)[2] + route.glanceAt(s));
                    out.add(new Visit(p.name(), si, frame, ((heading % 360) + 360) % 360));
                }
            }
        }
        out.sort((a, b) -> a.session() != b.session() ? Integer.compare(a.session(), b.session())
                : Integer.compare(a.frame(), b.frame()));
        return out;
    }
}
