package revisit.features;

import java.util.SplittableRandom;

/**
 * The 256 point pairs of our BRIEF test pattern, in pixels relative to the keypoint, before steering.
 *
 * <p>A seeded pool of {@value #POOL} candidate pairs is drawn as in Calonder et al.'s sampling "G II" (ECCV 2010):
 * both points from an isotropic Gaussian with sigma = 31/5 pixels, keeping points within {@value #RADIUS} pixels of
 * the centre and pairs at least 2 pixels apart (so rounding cannot merge them). From the pool, pairs are chosen
 * greedily, each time the one whose largest correlation with the pairs already chosen is smallest, in the spirit of
 * the learned test selection of Rublee et al. (ICCV 2011), which picks uncorrelated tests from training data.
 * We use no training data: the correlation is that of the two intensity differences in a smooth random image whose
 * autocorrelation is {@code exp(-d^2 / (2 l^2))} with {@code l} = {@value #CORRELATION_LENGTH_PX} pixels. On three
 * rotated photos this choice gave about 10% more correct matches than the plain Gaussian pattern for each of three
 * seeds (docs/FEATURES.md).
 */
final class BriefPattern {

    /** Largest distance of a pattern point from the centre, pixels; rotated and rounded it stays within 14. */
    static final int RADIUS = 13;
    /** Number of pairs. */
    static final int PAIRS = FrameFeatures.DESCRIPTOR_BITS;
    private static final int POOL = 2048;
    private static final double SIGMA = 31.0 / 5.0;
    private static final double MIN_PAIR_DISTANCE = 2.0;
    private static final double CORRELATION_LENGTH_PX = 5.0;

    private BriefPattern() {
    }

    /**
     * @param seed seed of the candidate pool
     * @return x1, y1, x2, y2 of each of the {@link #PAIRS} pairs, in selection order
     */
    static double[] create(long seed) {
        double[] pool = candidates(seed, POOL);
        double[] worst = new double[POOL];
        boolean[] used = new boolean[POOL];
        double[] pattern = new double[4 * PAIRS];
        int pick = 0;
        for (int k = 0; k < PAIRS; k++) {
            used[pick] = true;
            System.arraycopy(pool, 4 * pick, pattern, 4 * k, 4);
            int next = -1;
            for (int c = 0; c < POOL; c++) {
                if (!used[c]) {
                    worst[c] = Math.max(worst[c], Math.abs(correlation(pool, pick, c)));
                    if (next < 0 || worst[c] < worst[next]) {
                        next = c;
                    }
                }
            }
            pick = next;
        }
        return pattern;
    }

    /** {@code count} Gaussian pairs inside the disc, at least the minimum distance apart. */
    static double[] candidates(long seed, int count) {
        SplittableRandom random = new SplittableRandom(seed);
        double[] pool = new double[4 * count];
        int n = 0;
        double r2 = RADIUS * RADIUS;
        while (n < count) {
            double x1 = gaussian(random);
            double y1 = gaussian(random);
            double x2 = gaussian(random);
            double y2 = gaussian(random);
            if (x1 * x1 + y1 * y1 <= r2 && x2 * x2 + y2 * y2 <= r2
                    && Math.hypot(x2 - x1, y2 - y1) >= MIN_PAIR_DISTANCE) {
                pool[4 * n] = x1;
                pool[4 * n + 1] = y1;
                pool[4 * n + 2] = x2;
                pool[4 * n + 3] = y2;
                n++;
            }
        }
        return pool;
    }

    private static double gaussian(SplittableRandom random) {
        double u1 = random.nextDouble();
        double u2 = random.nextDouble();
        return SIGMA * Math.sqrt(-2 * Math.log(1 - u1)) * Math.cos(2 * Math.PI * u2);
    }

    /** Model correlation of the differences I(a) - I(b) of pairs {@code t} and {@code s} of {@code q}. */
    static double correlation(double[] q, int t, int s) {
        int a = 4 * t;
        int b = 4 * s;
        double cov = similarity(q, a, b) - similarity(q, a, b + 2) - similarity(q, a + 2, b)
                + similarity(q, a + 2, b + 2);
        double varT = 2 - 2 * similarity(q, a, a + 2);
        double varS = 2 - 2 * similarity(q, b, b + 2);
        return cov / Math.sqrt(varT * varS);
    }

    /** Autocorrelation of the image model between the points at {@code i} and {@code j} of {@code q}. */
    private static double similarity(double[] q, int i, int j) {
        double dx = q[i] - q[j];
        double dy = q[i + 1] - q[j + 1];
        return Math.exp(-(dx * dx + dy * dy) / (2 * CORRELATION_LENGTH_PX * CORRELATION_LENGTH_PX));
    }
}
