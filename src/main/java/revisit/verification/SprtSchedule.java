package revisit.verification;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The sequence of {@link Sprt} tests one RANSAC run uses, their estimates and its stopping rule (Chum &amp; Matas,
 * "Optimal Randomized RANSAC", IEEE PAMI 30(8), 2008).
 *
 * <p>Estimates: epsilon, the share of points consistent with a good model, is {@code max(minShare, w_best)}: the
 * smallest share the caller can accept, raised to the inlier share of the best model so far (models below the bar
 * need not be told from bad ones). delta, the share consistent with a bad model, is the consistent fraction of the
 * points checked on hypotheses the test rejected. A new test is designed when epsilon rises or when delta's
 * estimate moves by more than 5% of the value the current test was designed with.
 *
 * <p>Stopping rule: a sample is all-inlier with probability {@code P_g = epsilon^s}, and test i then rejects its
 * good model with probability {@code alpha_i} ({@link Sprt#falseRejection}), so after {@code k_i} samples under
 * each test the good model has been missed with probability {@code prod_i (1 - P_g (1 - alpha_i))^k_i}; the run
 * stops when that falls below {@code 1 - confidence}. Without rejections (alpha = 0) this is Fischler &amp;
 * Bolles' {@code N = log(1 - p) / log(1 - epsilon^s)}.
 */
final class SprtSchedule {

    /**
     * First guess of delta, used until {@link #MIN_REJECTIONS} rejections have been seen; the estimate then settles
     * at about 0.045 on the 200 matches without geometry of VerificationCpuTime (docs/VERIFICATION.md).
     */
    static final double INITIAL_DELTA = 0.05;
    /** Rejections needed before delta's estimate replaces the first guess. */
    private static final int MIN_REJECTIONS = 10;

    private final int sampleSize;
    private final double sampleCost;
    private final double logMissTarget;
    private final boolean enabled;
    private final List<Sprt> tests = new ArrayList<>();
    private final List<long[]> samplesPerTest = new ArrayList<>();
    private double[] logMissPerSample;
    private double epsilon;
    private long checkedOnRejected;
    private long consistentOnRejected;
    private int rejections;
    private int mostChecked;
    private boolean lastWasLongest;
    private long samples;
    private long models;

    /**
     * @param minShare   smallest inlier share the caller can accept, in (0, 1]; 0 turns the test off (every
     *                   hypothesis is checked on all points) and the stopping rule uses the best share alone
     * @param sampleCost t_M of {@link Sprt#design}, points checked in the time of one sample
     */
    SprtSchedule(int sampleSize, double minShare, double sampleCost, double confidence) {
        this.sampleSize = sampleSize;
        this.sampleCost = sampleCost;
        this.logMissTarget = Math.log(1 - confidence);
        this.enabled = minShare > 0 && minShare < 1;
        this.epsilon = minShare;
        startTest(INITIAL_DELTA);
        logMissPerSample = new double[]{logMiss(0)};
    }

    /** False when every hypothesis is checked on all points (no test). */
    boolean testing() {
        return enabled;
    }

    /** The test to apply now; only when {@link #testing()}. */
    Sprt current() {
        return tests.get(tests.size() - 1);
    }

    /** Counts a drawn sample and the models it gave. */
    void sampled(int modelCount) {
        samples++;
        models += modelCount;
        samplesPerTest.get(samplesPerTest.size() - 1)[0]++;
    }

    /** Records a hypothesis the current test rejected after {@code checked} points, {@code consistent} of them. */
    void rejected(int checked, int consistent) {
        checkedOnRejected += checked;
        consistentOnRejected += consistent;
        rejections++;
        lastWasLongest = checked > mostChecked;
        mostChecked = Math.max(mostChecked, checked);
        if (rejections >= MIN_REJECTIONS) {
            double delta = clampDelta((double) consistentOnRejected / checkedOnRejected);
            double designed = current().delta();
            if (Math.abs(delta - designed) > 0.05 * designed) {
                startTest(delta);
                logMissPerSample = append(logMissPerSample, logMiss(tests.size() - 1));
            }
        }
    }

    /** Records a new best model with the given inlier share. */
    void newBest(double share) {
        if (share > epsilon) {
            epsilon = share;
            startTest(enabled ? clampDelta(current().delta()) : INITIAL_DELTA);
            logMissPerSample = new double[samplesPerTest.size()];
            for (int i = 0; i < logMissPerSample.length; i++) {
                logMissPerSample[i] = logMiss(i);
            }
        }
    }

    /** True when the good model, if it exists, has been found with the configured confidence. */
    boolean done() {
        double logMiss = 0;
        for (int i = 0; i < logMissPerSample.length; i++) {
            logMiss += samplesPerTest.get(i)[0] * logMissPerSample[i];
        }
        return logMiss <= logMissTarget;
    }

    /** True when the latest rejected hypothesis survived more points than every one rejected before it. */
    boolean lastRejectionLongest() {
        return lastWasLongest;
    }

    private void startTest(double delta) {
        if (enabled) {
            double perSample = samples == 0 ? 1 : (double) models / samples;
            tests.add(Sprt.design(Math.min(epsilon, 0.999), clampDelta(delta), sampleCost, perSample));
        }
        samplesPerTest.add(new long[1]);
    }

    /** ln of the probability that one sample under test i misses the good model at the current epsilon. */
    private double logMiss(int i) {
        double good = Math.pow(epsilon, sampleSize);
        double alpha = enabled ? tests.get(i).falseRejection(epsilon) : 0;
        return Math.log1p(-Math.min(good * (1 - alpha), 1 - 1e-16));
    }

    /**
     * delta used to design a test, within [0.001, epsilon / 2]. The false-rejection rate of good models depends only
     * on the design and epsilon, so a clamped delta costs time, never confidence; above epsilon / 2 the test would
     * barely tell bad models from good ones and its threshold A would fall towards 1.
     */
    private double clampDelta(double delta) {
        return Math.min(Math.max(delta, 1e-3), 0.5 * Math.min(epsilon, 0.999));
    }

    private static double[] append(double[] a, double v) {
        double[] b = Arrays.copyOf(a, a.length + 1);
        b[a.length] = v;
        return b;
    }
}
