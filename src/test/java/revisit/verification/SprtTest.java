package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class SprtTest {

    @Test
    void thresholdSolvesTheOptimalityEquation() {
        Sprt t = Sprt.design(0.3, 0.05, 2000, 4.5);
        double c = 0.95 * Math.log(0.95 / 0.7) + 0.05 * Math.log(0.05 / 0.3);
        double a = Math.exp(t.logThreshold());
        assertEquals(2000 * c / 4.5 + 1 + Math.log(a), a, 1e-9 * a);
    }

    @Test
    void goodModelAtTheDesignShareIsRejectedWithProbabilityOneOverA() {
        Sprt t = Sprt.design(0.3, 0.05, 2000, 4.5);
        assertEquals(Math.exp(-t.logThreshold()), t.falseRejection(0.3), 1e-9);
        assertTrue(t.falseRejection(0.5) < t.falseRejection(0.3));
        assertEquals(1, t.falseRejection(0.06), "a model barely above delta drifts towards rejection");
    }

    /** Wald's bound (Wald 1947): a Bernoulli(epsilon) stream is rejected with probability at most about 1/A. */
    @Test
    void simulatedGoodModelsAreRarelyRejectedAndBadOnesQuickly() {
        Sprt t = Sprt.design(0.3, 0.05, 200, 1);
        SplittableRandom random = new SplittableRandom(17);
        int trials = 20000;
        int rejectedGood = 0;
        long checksBad = 0;
        for (int i = 0; i < trials; i++) {
            rejectedGood += checksToRejection(t, 0.3, random, 2000) > 0 ? 1 : 0;
            checksBad += checksToRejection(t, 0.05, random, 2000);
        }
        double alpha = Math.exp(-t.logThreshold());
        assertTrue(rejectedGood <= 1.1 * alpha * trials + 30, rejectedGood + " of " + trials + ", 1/A " + alpha);
        // Wald's approximation of the mean length under the bad hypothesis: ln A / E[log ratio per point]
        double drift = 0.05 * t.logConsistent() + 0.95 * t.logInconsistent();
        double expected = t.logThreshold() / drift;
        double mean = (double) checksBad / trials;
        assertTrue(mean >= expected && mean < expected + 3, "mean " + mean + ", Wald " + expected);
    }

    /** Points checked until rejection, 0 when the stream of n points is not rejected. */
    private static int checksToRejection(Sprt t, double share, SplittableRandom random, int n) {
        double ratio = 0;
        for (int j = 0; j < n; j++) {
            ratio += random.nextDouble() < share ? t.logConsistent() : t.logInconsistent();
            if (ratio > t.logThreshold()) {
                return j + 1;
            }
        }
        return 0;
    }

    @Test
    void withoutTheTestTheStopIsFischlerAndBollesBound() {
        SprtSchedule s = new SprtSchedule(5, 0, 2000, 0.99);
        s.newBest(0.5);
        long n = AdaptiveRansac.requiredSamples(0.5, 5, 0.99);
        assertEquals(n, samplesUntilDone(s));
    }

    @Test
    void withTheTestTheStopAllowsForRejectedGoodModels() {
        SprtSchedule s = new SprtSchedule(5, 0.5, 50, 0.99);
        double alpha = s.current().falseRejection(0.5);
        long plain = AdaptiveRansac.requiredSamples(0.5, 5, 0.99);
        long expected = (long) Math.ceil(Math.log(0.01) / Math.log(1 - Math.pow(0.5, 5) * (1 - alpha)));
        assertTrue(alpha > 0 && expected > plain);
        assertEquals(expected, samplesUntilDone(s));
    }

    private static long samplesUntilDone(SprtSchedule s) {
        long k = 0;
        while (!s.done()) {
            s.sampled(1);
            k++;
        }
        return k;
    }
}
