package revisit.verification;

/**
 * Quantiles of the chi-square distribution with an integer number of degrees of freedom, for gating squared
 * Mahalanobis distances.
 *
 * <p>The distribution function is the regularised lower incomplete gamma function {@code P(k/2, x/2)}, evaluated by
 * its power series below {@code a + 1} and by the continued fraction of the upper function above (both in Abramowitz
 * and Stegun, Handbook of Mathematical Functions, 1964, 6.5.29 and 6.5.31). {@code Gamma(k/2)} is exact for integer
 * and half-integer arguments by the recurrence {@code Gamma(a + 1) = a Gamma(a)} from {@code Gamma(1) = 1} and
 * {@code Gamma(1/2) = sqrt(pi)}. The quantile is found by bisection to 1e-12 relative.
 */
public final class ChiSquareQuantile {

    private static final int MAX_TERMS = 10_000;
    private static final double EPS = 1e-15;
    private static final double TINY = 1e-300;

    private ChiSquareQuantile() {
    }

    /**
     * The value x with {@code P(X <= x) = probability} for X chi-square with {@code dof} degrees of freedom.
     *
     * @param dof         degrees of freedom, 1..1000
     * @param probability in (0, 1)
     * @return the quantile, >= 0
     */
    public static double quantile(int dof, double probability) {
        if (dof < 1 || dof > 1000) {
            throw new IllegalArgumentException("degrees of freedom must be in 1..1000, was " + dof);
        }
        if (!(probability > 0 && probability < 1)) {
            throw new IllegalArgumentException("probability must be in (0, 1), was " + probability);
        }
        double lo = 0;
        double hi = Math.max(1.0, dof);
        while (cdf(dof, hi) < probability) {
            lo = hi;
            hi *= 2;
        }
        for (int iter = 0; iter < 200 && hi - lo > 1e-12 * hi; iter++) {
            double mid = 0.5 * (lo + hi);
            if (cdf(dof, mid) < probability) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * Distribution function {@code P(X <= x)}.
     *
     * @param dof degrees of freedom, 1..1000
     * @param x   value, >= 0
     * @return probability in [0, 1]
     */
    public static double cdf(int dof, double x) {
        if (x <= 0) {
            return 0;
        }
        double a = 0.5 * dof;
        double h = 0.5 * x;
        double logPrefix = a * Math.log(h) - h - logGammaHalfInteger(dof);
        if (h < a + 1) {
            return Math.exp(logPrefix) * series(a, h);
        }
        return 1 - Math.exp(logPrefix) * continuedFraction(a, h);
    }

    /** sum_{n>=0} x^n / (a (a+1) ... (a+n)), so that P(a, x) = e^-x x^a / Gamma(a) times this. */
    private static double series(double a, double x) {
        double term = 1 / a;
        double sum = term;
        for (int n = 1; n < MAX_TERMS; n++) {
            term *= x / (a + n);
            sum += term;
            if (Math.abs(term) < Math.abs(sum) * EPS) {
                break;
            }
        }
        return sum;
    }

    /** Continued fraction with Q(a, x) = e^-x x^a / Gamma(a) times this, by the modified Lentz method. */
    private static double continuedFraction(double a, double x) {
        double b = x + 1 - a;
        double c = 1 / TINY;
        double d = 1 / b;
        double f = d;
        for (int n = 1; n < MAX_TERMS; n++) {
            double an = -n * (n - a);
            b += 2;
            d = an * d + b;
            d = Math.abs(d) < TINY ? TINY : d;
            c = b + an / c;
            c = Math.abs(c) < TINY ? TINY : c;
            d = 1 / d;
            double delta = d * c;
            f *= delta;
            if (Math.abs(delta - 1) < EPS) {
                break;
            }
        }
        return f;
    }

    /** ln Gamma(dof / 2), exact recurrence for integer and half-integer arguments. */
    private static double logGammaHalfInteger(int dof) {
        double value = dof % 2 == 0 ? 0 : 0.5 * Math.log(Math.PI);
        for (int twiceArg = dof % 2 == 0 ? 2 : 1; twiceArg < dof; twiceArg += 2) {
            value += Math.log(0.5 * twiceArg);
        }
        return value;
    }
}
