package revisit.verification;

/**
 * Real roots of a polynomial of degree up to ten: Sturm's theorem counts the distinct real roots in an interval
 * from the sign changes of the Sturm sequence {@code p, p', -rem(p, p'), ...} (Sturm 1835; Press et al., Numerical
 * Recipes, 3rd ed. 2007, sec. 9.5), bisection isolates each root from the Cauchy bound
 * {@code |z| <= 1 + max |c_i / c_n|}, and a safeguarded Newton iteration on p alone (Numerical Recipes sec. 9.4,
 * "rtsafe") polishes it. Isolating with the sequence and polishing with p is cheaper than bisecting with the whole
 * sequence down to the final tolerance, which is what ddogleg's FindRealRootsSturm did in VerificationCpuTime's
 * profile (about 60% of a five-point sample). Holds scratch buffers: one instance per thread.
 */
final class SturmRoots {

    private static final int MAX_DEGREE = 10;
    /** Remainder coefficients below this share of the dividend's largest are treated as zero. */
    private static final double ZERO = 1e-13;
    private static final int MAX_SPLITS = 400;
    /** Unit roundoff of double precision, 2^-53. */
    private static final double ROUNDOFF = 0x1p-53;

    private final double[][] chain = new double[MAX_DEGREE + 1][MAX_DEGREE + 1];
    private final int[] degree = new int[MAX_DEGREE + 1];
    private final double[] stack = new double[4 * (MAX_SPLITS + 2)];
    private final double[] roots = new double[MAX_DEGREE];
    private int length;

    /** Roots found by the last {@link #solve}, ascending in their first {@code count} entries. */
    double[] roots() {
        return roots;
    }

    /**
     * Finds the distinct real roots of {@code c[0] + c[1] z + ... + c[n] z^n}.
     *
     * @param c coefficients in ascending powers (not modified)
     * @param n highest power given, at most 10
     * @return number of roots stored in {@link #roots()}
     */
    int solve(double[] c, int n) {
        if (!buildChain(c, n)) {
            return 0;
        }
        double[] p = chain[0];
        int d = degree[0];
        double bound = 0;
        for (int i = 0; i < d; i++) {
            bound = Math.max(bound, Math.abs(p[i] / p[d]));
        }
        bound += 1;
        return isolate(-bound, bound);
    }

    /** The Sturm sequence, each member scaled to unit largest coefficient; false when p is constant. */
    private boolean buildChain(double[] c, int n) {
        int d = trim(c, n);
        if (d < 1) {
            return false;
        }
        System.arraycopy(c, 0, chain[0], 0, d + 1);
        degree[0] = d;
        normalise(0);
        for (int i = 1; i <= d; i++) {
            chain[1][i - 1] = i * chain[0][i];
        }
        degree[1] = d - 1;
        normalise(1);
        length = 2;
        while (degree[length - 1] > 0) {
            int next = negatedRemainder(chain[length - 2], degree[length - 2], chain[length - 1],
                    degree[length - 1], chain[length]);
            if (next < 0) {
                break;
            }
            degree[length] = next;
            normalise(length);
            length++;
        }
        return true;
    }

    /** Writes {@code -(a mod b)} into out and returns its degree, -1 when the remainder vanishes. */
    private static int negatedRemainder(double[] a, int da, double[] b, int db, double[] out) {
        double[] r = out;
        System.arraycopy(a, 0, r, 0, da + 1);
        double scale = 0;
        for (int i = 0; i <= da; i++) {
            scale = Math.max(scale, Math.abs(a[i]));
        }
        for (int k = da; k >= db; k--) {
            double q = r[k] / b[db];
            for (int j = 0; j <= db; j++) {
                r[k - db + j] -= q * b[j];
            }
            r[k] = 0;
        }
        for (int i = 0; i < db; i++) {
            r[i] = -r[i];
        }
        int d = db - 1;
        while (d >= 0 && Math.abs(r[d]) <= ZERO * scale) {
            d--;
        }
        return d;
    }

    /** Degree after dropping zero leading coefficients (a small leading coefficient is kept: it is a large root). */
    private static int trim(double[] c, int n) {
        int d = n;
        while (d >= 0 && c[d] == 0) {
            d--;
        }
        return d;
    }

    private void normalise(int k) {
        double[] p = chain[k];
        double scale = 0;
        for (int i = 0; i <= degree[k]; i++) {
            scale = Math.max(scale, Math.abs(p[i]));
        }
        for (int i = 0; i <= degree[k]; i++) {
            p[i] /= scale;
        }
    }

    /** Number of sign changes of the Sturm sequence at x (zeros skipped). */
    private int signChanges(double x) {
        int changes = 0;
        double last = 0;
        for (int k = 0; k < length; k++) {
            double v = ZPolynomials.evaluate(chain[k], degree[k], x);
            if (v != 0) {
                changes += last != 0 && (v > 0) != (last > 0) ? 1 : 0;
                last = v;
            }
        }
        return changes;
    }

    /** Bisects [lo, hi] until each interval holds one root, then polishes it; returns the count. */
    private int isolate(double lo, double hi) {
        int count = 0;
        int top = 0;
        top = push(top, lo, hi, signChanges(lo), signChanges(hi));
        int splits = 0;
        while (top > 0 && count < MAX_DEGREE) {
            top -= 4;
            double a = stack[top];
            double b = stack[top + 1];
            int va = (int) stack[top + 2];
            int vb = (int) stack[top + 3];
            int inside = va - vb;
            if (inside <= 0) {
                continue;
            }
            double pa = ZPolynomials.evaluate(chain[0], degree[0], a);
            double pb = ZPolynomials.evaluate(chain[0], degree[0], b);
            boolean small = b - a <= 1e-12 * Math.max(1, Math.abs(a) + Math.abs(b));
            if (inside == 1 && pa * pb < 0) {
                roots[count++] = polish(a, b, pa);
            } else if (small || ++splits > MAX_SPLITS) {
                double m = 0.5 * (a + b);
                if (nearlyZero(m)) {
                    roots[count++] = m;
                }
            } else {
                double m = 0.5 * (a + b);
                int vm = signChanges(m);
                top = push(top, m, b, vm, vb);
                top = push(top, a, m, va, vm);
            }
        }
        sortRoots(count);
        return count;
    }

    /** Insertion sort of the first count roots (at most ten; Arrays.sort was 7% of a five-point sample, JFR). */
    private void sortRoots(int count) {
        for (int i = 1; i < count; i++) {
            double v = roots[i];
            int j = i - 1;
            while (j >= 0 && roots[j] > v) {
                roots[j + 1] = roots[j];
                j--;
            }
            roots[j + 1] = v;
        }
    }

    /**
     * True when p(x) is within rounding of zero: |p(x)| &lt;= 1e-10 sum |c_i x^i| (a root of even multiplicity, or
     * two roots closer than the bisection can split, leaves no sign change to bracket).
     */
    private boolean nearlyZero(double x) {
        double[] p = chain[0];
        double magnitude = 0;
        double power = 1;
        for (int i = 0; i <= degree[0]; i++) {
            magnitude += Math.abs(p[i]) * power;
            power *= Math.abs(x);
        }
        return Math.abs(ZPolynomials.evaluate(p, degree[0], x)) <= 1e-10 * magnitude;
    }

    private int push(int top, double a, double b, int va, int vb) {
        stack[top] = a;
        stack[top + 1] = b;
        stack[top + 2] = va;
        stack[top + 3] = vb;
        return top + 4;
    }

    /**
     * Newton's method kept inside the bracket [a, b] where p changes sign; a step that leaves the bracket or that
     * would not halve the one before it is replaced by bisection (Numerical Recipes sec. 9.4, "rtsafe"). p and p'
     * come from one Horner pass over p (two interleaved recurrences) instead of two evaluations. It also stops
     * when |p(x)| is within the rounding error bound of Horner's rule, {@code 2 d u sum |c_i| |x|^i} (Higham,
     * Accuracy and Stability of Numerical Algorithms, 2nd ed. 2002, sec. 5.1): closer to the root the sign of p
     * is noise and the safeguard only bisected on (on the 200 matches without geometry of VerificationCpuTime,
     * 17.6 steps per root, 10.9 of them bisections, with the 1e-15 step rule alone; 8.1 and 1.6 with this stop).
     */
    private double polish(double a, double b, double pa) {
        double lo = pa < 0 ? a : b;
        double hi = pa < 0 ? b : a;
        double x = 0.5 * (a + b);
        double step = Math.abs(b - a);
        double before;
        double[] p = chain[0];
        int d = degree[0];
        for (int it = 0; it < 200; it++) {
            double f = p[d];
            double df = 0;
            double ax = Math.abs(x);
            double magnitude = Math.abs(f);
            for (int k = d - 1; k >= 0; k--) {
                df = df * x + f;
                f = f * x + p[k];
                magnitude = magnitude * ax + Math.abs(p[k]);
            }
            if (Math.abs(f) <= 2 * d * ROUNDOFF * magnitude) {
                return x;
            }
            if (f < 0) {
                lo = x;
            } else if (f > 0) {
                hi = x;
            } else {
                return x;
            }
            double next = x - f / df;
            before = step;
            if (!(next > Math.min(lo, hi) && next < Math.max(lo, hi)) || Math.abs(2 * f) > Math.abs(before * df)) {
                next = 0.5 * (lo + hi);
            }
            step = Math.abs(next - x);
            if (step <= 1e-15 * Math.max(1, Math.abs(x))) {
                return next;
            }
            x = next;
        }
        return x;
    }
}
