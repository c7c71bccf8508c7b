package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.ddogleg.solver.Polynomial;
import org.ddogleg.solver.impl.FindRealRootsSturm;
import org.junit.jupiter.api.Test;

class SturmRootsTest {

    /** Coefficients (ascending) of the product of (z - r) over the given roots, times (z^2 + 1) per extra pair. */
    private static double[] fromRoots(double[] roots, int complexPairs) {
        double[] c = {1};
        for (double r : roots) {
            c = multiply(c, new double[]{-r, 1});
        }
        for (int k = 0; k < complexPairs; k++) {
            c = multiply(c, new double[]{1 + k, 0, 1});
        }
        return c;
    }

    private static double[] multiply(double[] a, double[] b) {
        double[] out = new double[a.length + b.length - 1];
        ZPolynomials.multiplyAdd(a, b, 1, out);
        return out;
    }

    @Test
    void findsTheRootsOfAHandMadePolynomial() {
        double[] truth = {-3, -0.5, 0.25, 2, 7};
        double[] c = fromRoots(truth, 2);
        SturmRoots solver = new SturmRoots();
        int n = solver.solve(c, 9);
        assertEquals(5, n, "the pairs of complex roots (z^2 + 1)(z^2 + 2) are not real");
        assertArrayEquals(truth, Arrays.copyOf(solver.roots(), n), 1e-12);
    }

    @Test
    void constantHasNoRoots() {
        assertEquals(0, new SturmRoots().solve(new double[]{3, 0, 0}, 2));
    }

    /** Ten real roots in [-5, 5] at least 0.05 apart, and random degree-10 polynomials (seeds 1 and 2). */
    @Test
    void agreesWithDdoglegOnRandomPolynomials() {
        SturmRoots ours = new SturmRoots();
        FindRealRootsSturm reference = new FindRealRootsSturm(11, -1, 1e-12, 200, 200);
        Polynomial p = new Polynomial(11);
        Random rnd = new Random(1);
        for (int trial = 0; trial < 500; trial++) {
            double[] c = new double[11];
            if (trial % 2 == 0) {
                double[] r = new double[10];
                for (int k = 0; k < 10; k++) {
                    r[k] = -5 + k + 0.05 + 0.9 * rnd.nextDouble();
                }
                c = fromRoots(r, 0);
            } else {
                for (int k = 0; k < 11; k++) {
                    c[k] = rnd.nextGaussian() * (k == 10 ? Math.pow(10, rnd.nextInt(7) - 3) : 1);
                }
            }
            p.size = 11;
            System.arraycopy(c, 0, p.c, 0, 11);
            reference.process(p);
            double[] expected = Arrays.copyOf(reference.getRoots(), reference.getNumberOfRoots());
            Arrays.sort(expected);
            int n = ours.solve(c, 10);
            assertEquals(expected.length, n, "trial " + trial);
            for (int k = 0; k < n; k++) {
                double tol = 1e-8 * Math.max(1, Math.abs(expected[k]));
                assertEquals(expected[k], ours.roots()[k], tol, "trial " + trial + " root " + k);
            }
        }
        assertTrue(ours.solve(fromRoots(new double[]{1, 2}, 0), 2) == 2);
    }
}
