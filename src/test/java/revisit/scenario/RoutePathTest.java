package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import java.util.List;
import org.junit.jupiter.api.Test;

class RoutePathTest {

    private static final List<double[]> SQUARE = List.of(new double[]{0, 0}, new double[]{10, 0},
            new double[]{10, 10}, new double[]{0, 10});

    @Test
    void roundedCornersShortenThePathByTheGeometricAmount() {
        // A quarter arc of radius r replaces two legs of length r: saves r (2 - pi/2) per corner (geometry).
        RoutePath p = new RoutePath(SQUARE, 2);
        assertEquals(30 - 2 * 2 * (2 - Math.PI / 2), p.length(), 1e-9);
    }

    @Test
    void positionAndHeadingFollowLinesAndArcs() {
        RoutePath p = new RoutePath(SQUARE, 2);
        double[] a = p.at(3);
        assertEquals(3, a[0], 1e-9);
        assertEquals(0, a[1], 1e-9);
        assertEquals(0, a[2], 1e-9);
        double arcMid = 8 + Math.PI / 2;
        double[] m = p.at(arcMid);
        assertEquals(8 + 2 * Math.sin(Math.PI / 4), m[0], 1e-9, "arc centre (8, 2), radius 2, 45 degrees in");
        assertEquals(2 - 2 * Math.cos(Math.PI / 4), m[1], 1e-9);
        assertEquals(Math.PI / 4, m[2], 1e-9);
        double[] after = p.at(8 + Math.PI + 1);
        assertEquals(10, after[0], 1e-9);
        assertEquals(3, after[1], 1e-9);
        for (double s = 0; s < p.length(); s += 0.05) {
            double turn = Math.abs(RoutePath.wrap(p.at(s + 0.05)[2] - p.at(s)[2]));
            assertTrue(turn <= 0.05 / 2 + 1e-9, "heading changes at most by step / radius at " + s);
        }
    }

    @Test
    void passesFindEachStraightPieceThatCrossesAPoint() {
        RoutePath p = new RoutePath(List.of(new double[]{0, 0}, new double[]{10, 0}, new double[]{10, 4},
                new double[]{0, 4}, new double[]{0, 0.1}, new double[]{10, 0.1}), 1);
        List<Double> passes = p.passes(5, 0, 0.3);
        assertEquals(2, passes.size(), passes.toString());
        assertEquals(5, passes.get(0), 1e-9);
        assertTrue(p.passes(5, 2, 0.3).isEmpty());
    }

    @Test
    void levelPoseLooksAlongTheHeadingWithYDown() {
        Se3_F64 east = Route.pose(1, 2, 1.5, 0, 0, 0);
        assertEquals(1, east.R.get(0, 2), 1e-12, "optical axis (camera z) points east");
        assertEquals(-1, east.R.get(2, 1), 1e-12, "camera y points down");
        assertEquals(-1, east.R.get(1, 0), 1e-12, "camera x points south when facing east");
        assertThrows(IllegalArgumentException.class, () -> new RoutePath(List.of(new double[]{0, 0}), 1));
    }
}
