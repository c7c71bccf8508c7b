package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class ChiSquareQuantileTest {

    @Test
    void matchesPublishedCriticalValues() {
        // NIST/SEMATECH e-Handbook of Statistical Methods, section 1.3.6.7.4, "Critical values of the chi-square
        // distribution" (upper-tail table, three decimals).
        assertEquals(3.841, ChiSquareQuantile.quantile(1, 0.95), 5e-4);
        assertEquals(6.635, ChiSquareQuantile.quantile(1, 0.99), 5e-4);
        assertEquals(9.210, ChiSquareQuantile.quantile(2, 0.99), 5e-4);
        assertEquals(11.345, ChiSquareQuantile.quantile(3, 0.99), 5e-4);
        assertEquals(15.086, ChiSquareQuantile.quantile(5, 0.99), 5e-4);
        assertEquals(16.812, ChiSquareQuantile.quantile(6, 0.99), 5e-4);
        assertEquals(12.592, ChiSquareQuantile.quantile(6, 0.95), 5e-4);
        assertEquals(18.307, ChiSquareQuantile.quantile(10, 0.95), 5e-4);
        assertEquals(124.342, ChiSquareQuantile.quantile(100, 0.95), 5e-3);
    }

    @Test
    void distributionWithTwoDegreesIsTheExponential() {
        // Closed form: chi-square with 2 dof has CDF 1 - exp(-x/2) (any statistics textbook).
        for (double x : new double[]{0.01, 0.5, 1, 2, 5, 10, 40}) {
            assertEquals(1 - Math.exp(-x / 2), ChiSquareQuantile.cdf(2, x), 1e-13);
        }
    }

    @Test
    void quantileInvertsTheDistribution() {
        for (int dof = 1; dof <= 12; dof++) {
            for (double p : new double[]{0.01, 0.5, 0.9, 0.999}) {
                assertEquals(p, ChiSquareQuantile.cdf(dof, ChiSquareQuantile.quantile(dof, p)), 1e-10);
            }
        }
    }

    @Test
    void refusesBadArguments() {
        assertThrows(IllegalArgumentException.class, () -> ChiSquareQuantile.quantile(0, 0.5));
        assertThrows(IllegalArgumentException.class, () -> ChiSquareQuantile.quantile(3, 1.0));
    }
}
