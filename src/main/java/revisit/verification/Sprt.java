package revisit.verification;

/**
 * One sequential probability ratio test (Wald 1947) deciding whether a RANSAC hypothesis is bad, as in Matas &amp;
 * Chum, "Randomized RANSAC with Sequential Probability Ratio Test", ICCV 2005, and Chum &amp; Matas, "Optimal
 * Randomized RANSAC", IEEE PAMI 30(8), 2008. Points are checked in random order; a good model makes a point
 * consistent with probability {@code epsilon}, a bad one with probability {@code delta < epsilon}. After j points
 * the likelihood ratio is {@code lambda_j = prod (delta/epsilon)^x ((1-delta)/(1-epsilon))^(1-x)} (x = 1 for a
 * consistent point); the hypothesis is rejected as soon as {@code lambda_j > A}. A good model is then rejected with
 * probability at most {@code 1/A}.
 *
 * <p>The threshold minimises the expected run time (Chum &amp; Matas 2008; the formula as recalled from the paper):
 * {@code A = t_M C / m_S + 1 + ln A}, solved by fixed-point iteration from {@code A_0 = t_M C / m_S + 1}, where
 * t_M is the time to draw a sample and fit its models in units of one point check, m_S the mean number of models
 * per sample and {@code C = (1 - delta) ln((1 - delta)/(1 - epsilon)) + delta ln(delta/epsilon)}.
 *
 * @param epsilon      share of points consistent with a good model the test was designed for, in (0, 1)
 * @param delta        share of points consistent with a bad model, in (0, epsilon)
 * @param logThreshold ln A
 */
record Sprt(double epsilon, double delta, double logThreshold) {

    Sprt {
        if (!(delta > 0 && delta < epsilon && epsilon < 1)) {
            throw new IllegalArgumentException("need 0 < delta < epsilon < 1, was delta " + delta + ", epsilon "
                    + epsilon);
        }
    }

    /**
     * Designs the test of smallest expected cost for these parameters.
     *
     * @param sampleCost      t_M, points checked in the time one sample is drawn and fitted
     * @param modelsPerSample m_S, values below 1 count as 1
     */
    static Sprt design(double epsilon, double delta, double sampleCost, double modelsPerSample) {
        double c = (1 - delta) * Math.log((1 - delta) / (1 - epsilon)) + delta * Math.log(delta / epsilon);
        double k = sampleCost * c / Math.max(1, modelsPerSample);
        double a = k + 1;
        for (int i = 0; i < 10; i++) {
            a = k + 1 + Math.log(a);
        }
        return new Sprt(epsilon, delta, Math.log(a));
    }

    /** ln of the likelihood-ratio factor of a consistent point, negative. */
    double logConsistent() {
        return Math.log(delta / epsilon);
    }

    /** ln of the likelihood-ratio factor of an inconsistent point, positive. */
    double logInconsistent() {
        return Math.log((1 - delta) / (1 - epsilon));
    }

    /**
     * Probability that this test rejects a good model whose points are consistent with probability {@code share}:
     * {@code A^-h}, h the positive root of {@code share (delta/epsilon)^h + (1 - share)((1-delta)/(1-epsilon))^h = 1}
     * (Wald's approximation, Chum &amp; Matas 2008 sec. 4.1); h = 1 when share = epsilon. It is 1 when the test
     * drifts towards rejection even for such a model (no positive root).
     */
    double falseRejection(double share) {
        double la = logConsistent();
        double lb = logInconsistent();
        if (share * la + (1 - share) * lb >= 0) {
            return 1;
        }
        double hi = 1;
        while (moment(share, la, lb, hi) < 0 && hi < 1e6) {
            hi *= 2;
        }
        double lo = 0;
        for (int i = 0; i < 100 && hi - lo > 1e-12 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (moment(share, la, lb, mid) < 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.exp(-0.5 * (lo + hi) * logThreshold);
    }

    /** {@code share e^(h la) + (1 - share) e^(h lb) - 1}: negative between 0 and the root h, positive above it. */
    private static double moment(double share, double la, double lb, double h) {
        return share * Math.exp(h * la) + (1 - share) * Math.exp(h * lb) - 1;
    }
}
