package revisit.verification;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;

/**
 * RANSAC (Fischler &amp; Bolles, CACM 1981) with MSAC scoring (Torr &amp; Zisserman, CVIU 2000: each point costs
 * {@code min(e^2, t^2)}), the adaptive sample count {@code N = log(1 - p) / log(1 - w^s)} updated from the best
 * inlier ratio w so far (Hartley &amp; Zisserman 2004, sec. 4.7.1, algorithm 4.5), and a final linear refit on
 * all inliers repeated while it lowers the cost. Each call starts a fresh generator from the given seed, so the
 * same input and seed give the same result.
 *
 * <p>Early stop for hopeless inputs: a caller that will only accept a model with at least {@code minSupport}
 * inliers among the {@code m} pooled points needs an inlier share of at least {@code w_min = minSupport / m}. If
 * such a model exists, Fischler &amp; Bolles' bound says {@code N_min = log(1 - p) / log(1 - w_min^s)} samples
 * contain an all-inlier sample with probability p, so the run draws at most {@code N_min}. This never cuts a run
 * that has found a model meeting the bar: its adaptive count, from a share w &gt;= w_min, is already at most
 * N_min.
 *
 * <p>Hypotheses are checked with a sequential probability ratio test ({@link Sprt}, {@link SprtSchedule}; Matas &amp;
 * Chum, ICCV 2005; Chum &amp; Matas, IEEE PAMI 2008): points in a seeded random order, a hypothesis abandoned as
 * soon as its likelihood ratio of being bad passes the threshold A. The stopping rule then counts the good models
 * the test may have rejected, and the exact MSAC bail-out (a hypothesis whose partial cost already passes the
 * best is not finished) still applies.
 */
final class AdaptiveRansac {

    /** Fits the models that pass through a minimal sample. */
    interface Sampler {
        int sampleSize();

        /** Time to draw a sample and fit its models, in residual evaluations (t_M of {@link Sprt#design}). */
        double sampleCost();

        /** Adds to {@code out} every model (row-major 3x3) that fits the first {@code size} indices. */
        void fit(int[] indices, int size, List<double[]> out);
    }

    /** Squared error of point {@code i} under {@code model}, pixels squared. */
    interface Residual {
        double squared(double[] model, int i);
    }

    /** A model fitted to all inliers, starting from the current model, or empty. */
    interface Refitter {
        Optional<double[]> fit(double[] current, int[] indices, int size);
    }

    /**
     * Best model found.
     *
     * @param model       row-major 3x3
     * @param inliers     per point, true when its squared error is within the cut
     * @param inlierCount number of true entries of {@code inliers}
     * @param cost        MSAC cost, pixels squared
     * @param iterations  samples drawn
     * @param earlier     models that were best earlier in the run, most recent first, at most {@link #EARLIER}
     */
    record Fit(double[] model, boolean[] inliers, int inlierCount, double cost, int iterations,
               List<double[]> earlier) {
    }

    /** Earlier best models kept for a caller that refines several starts. */
    static final int EARLIER = 3;

    private AdaptiveRansac() {
    }

    /**
     * Runs RANSAC over all {@code n} points, drawing no more samples than would find a model with
     * {@code minSupport} inliers with the configured confidence (see the class comment).
     *
     * @param thresholdSq inlier cut on the squared error, pixels squared
     * @param minSupport  fewest inliers of a model the caller can accept, 0 for no early stop (and no SPRT)
     * @return the best model (when the SPRT rejected every hypothesis, the one it checked longest, refined), or
     *         empty when no sample produced a model
     */
    static Optional<Fit> run(int n, Sampler sampler, Residual residual, Refitter refitter, double thresholdSq,
                             int minSupport, VerificationConfig config) {
        return run(n, identity(n), config.maxIterations(), (double) minSupport / n, sampler, residual, refitter,
                thresholdSq, config);
    }

    /**
     * Runs RANSAC with samples drawn from, and hypotheses scored on, the points in {@code pool}; the final refit
     * and the returned inliers cover all {@code n} points. Every hypothesis is checked on the whole pool (no SPRT).
     *
     * @param pool          indices of the points to sample from and score on (not modified)
     * @param maxIterations cap on samples for this call
     * @param thresholdSq   inlier cut on the squared error, pixels squared
     * @return the best model, or empty when no sample produced one
     */
    static Optional<Fit> run(int n, int[] pool, int maxIterations, Sampler sampler, Residual residual,
                             Refitter refitter, double thresholdSq, VerificationConfig config) {
        return run(n, pool, maxIterations, 0, sampler, residual, refitter, thresholdSq, config);
    }

    /**
     * @param minShare smallest inlier share of the pool the caller can accept: the early stop and the epsilon of
     *                 the SPRT start there; 0 checks every hypothesis on the whole pool in pool order
     */
    private static Optional<Fit> run(int n, int[] pool, int maxIterations, double minShare, Sampler sampler,
                                     Residual residual, Refitter refitter, double thresholdSq,
                                     VerificationConfig config) {
        int s = sampler.sampleSize();
        int size = pool.length;
        if (size < s) {
            return Optional.empty();
        }
        SprtSchedule schedule = new SprtSchedule(s, minShare, sampler.sampleCost(), config.confidence());
        SplittableRandom random = new SplittableRandom(config.seed());
        int[] order = pool.clone();
        int[] checks = schedule.testing() ? shuffled(pool, new SplittableRandom(config.seed()).split()) : pool;
        List<double[]> models = new ArrayList<>();
        List<double[]> earlier = new ArrayList<>();
        Fit best = null;
        double[] longestRejected = null;
        int it = 0;
        while (it < maxIterations && !schedule.done()) {
            it++;
            drawSample(random, order, s);
            models.clear();
            sampler.fit(order, s, models);
            schedule.sampled(models.size());
            for (double[] m : models) {
                double bound = best == null ? Double.POSITIVE_INFINITY : best.cost();
                double cost = cost(m, checks, residual, thresholdSq, bound, schedule);
                if (cost == Double.POSITIVE_INFINITY && schedule.lastRejectionLongest()) {
                    longestRejected = m;
                }
                if (cost < bound) {
                    Fit local = refine(pool, n, m, residual, refitter, thresholdSq, it);
                    if (best != null) {
                        remember(earlier, best.model());
                    }
                    best = local;
                    schedule.newBest((double) best.inlierCount() / size);
                }
            }
        }
        return best == null && longestRejected == null ? Optional.empty()
                : Optional.of(finish(best != null ? best.model() : longestRejected, n, residual, refitter,
                thresholdSq, it, earlier));
    }

    /** The final refit over all n points, with the run's sample count and earlier best models. */
    private static Fit finish(double[] model, int n, Residual residual, Refitter refitter, double thresholdSq,
                              int iterations, List<double[]> earlier) {
        Fit fit = refine(identity(n), n, model, residual, refitter, thresholdSq, iterations);
        return new Fit(fit.model(), fit.inliers(), fit.inlierCount(), fit.cost(), iterations, List.copyOf(earlier));
    }

    /**
     * MSAC cost of {@code m} over {@code points} in that order; returns at least {@code bound} once the partial
     * cost reaches it, and +Infinity when the schedule's current SPRT rejects the hypothesis (recorded there).
     */
    private static double cost(double[] m, int[] points, Residual residual, double thresholdSq, double bound,
                               SprtSchedule schedule) {
        boolean testing = schedule.testing();
        double logConsistent = testing ? schedule.current().logConsistent() : 0;
        double logInconsistent = testing ? schedule.current().logInconsistent() : 0;
        double logThreshold = testing ? schedule.current().logThreshold() : Double.POSITIVE_INFINITY;
        double cost = 0;
        double logRatio = 0;
        int consistent = 0;
        for (int q = 0; q < points.length && cost < bound; q++) {
            double e = residual.squared(m, points[q]);
            if (e <= thresholdSq) {
                cost += e;
                consistent++;
                logRatio += logConsistent;
            } else {
                cost += thresholdSq;
                logRatio += logInconsistent;
                if (logRatio > logThreshold) {
                    schedule.rejected(q + 1, consistent);
                    return Double.POSITIVE_INFINITY;
                }
            }
        }
        return cost;
    }

    /** Moves a uniform random sample of s distinct entries of {@code order} to its front (partial Fisher-Yates). */
    private static void drawSample(SplittableRandom random, int[] order, int s) {
        for (int k = 0; k < s; k++) {
            int pick = k + random.nextInt(order.length - k);
            int tmp = order[k];
            order[k] = order[pick];
            order[pick] = tmp;
        }
    }

    /** Puts a replaced best model first in {@code earlier}, keeping at most {@link #EARLIER}. */
    private static void remember(List<double[]> earlier, double[] model) {
        earlier.add(0, model);
        if (earlier.size() > EARLIER) {
            earlier.remove(EARLIER);
        }
    }

    private static int[] identity(int n) {
        int[] all = new int[n];
        for (int i = 0; i < n; i++) {
            all[i] = i;
        }
        return all;
    }

    /** A copy of {@code a} in random order (Fisher-Yates). */
    private static int[] shuffled(int[] a, SplittableRandom random) {
        int[] out = a.clone();
        for (int i = out.length - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int tmp = out[i];
            out[i] = out[j];
            out[j] = tmp;
        }
        return out;
    }

    /** Samples needed to draw one all-inlier sample of size s with probability p when the inlier ratio is w. */
    static long requiredSamples(double w, int s, double p) {
        double allInlier = Math.pow(w, s);
        if (allInlier >= 1) {
            return 1;
        }
        if (allInlier <= 0) {
            return Long.MAX_VALUE;
        }
        return (long) Math.ceil(Math.log(1 - p) / Math.log(1 - allInlier));
    }

    /**
     * Local optimisation (Chum, Matas &amp; Kittler, "Locally optimized RANSAC", DAGM 2003): the refitter is applied
     * to the inliers among {@code points} while that lowers the MSAC cost over {@code points}. Called on every new
     * best hypothesis and once at the end over all points; the returned mask covers all n points but only
     * {@code points} are marked.
     */
    private static Fit refine(int[] points, int n, double[] start, Residual residual, Refitter refitter,
                              double thresholdSq, int iterations) {
        double[] model = start;
        boolean[] inliers = new boolean[n];
        double cost = classify(points, model, residual, thresholdSq, inliers);
        int[] idx = new int[points.length];
        for (int round = 0; round < 3; round++) {
            int count = 0;
            for (int i : points) {
                if (inliers[i]) {
                    idx[count++] = i;
                }
            }
            Optional<double[]> refit = refitter.fit(model, idx, count);
            if (refit.isEmpty()) {
                break;
            }
            boolean[] refitInliers = new boolean[n];
            double refitCost = classify(points, refit.get(), residual, thresholdSq, refitInliers);
            if (!(refitCost < cost)) {
                break;
            }
            model = refit.get();
            cost = refitCost;
            inliers = refitInliers;
        }
        int count = 0;
        for (boolean b : inliers) {
            count += b ? 1 : 0;
        }
        return new Fit(model, inliers, count, cost, iterations, List.of());
    }

    private static double classify(int[] points, double[] model, Residual residual, double thresholdSq,
                                   boolean[] inliers) {
        double cost = 0;
        for (int i : points) {
            double e = residual.squared(model, i);
            inliers[i] = e <= thresholdSq;
            cost += inliers[i] ? e : thresholdSq;
        }
        return cost;
    }

    /** Marks inliers of {@code model} and returns its MSAC cost. */
    static double classify(int n, double[] model, Residual residual, double thresholdSq, boolean[] inliers) {
        double cost = 0;
        for (int i = 0; i < n; i++) {
            double e = residual.squared(model, i);
            inliers[i] = e <= thresholdSq;
            cost += inliers[i] ? e : thresholdSq;
        }
        return cost;
    }
}
