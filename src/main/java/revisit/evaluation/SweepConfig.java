package revisit.evaluation;

/**
 * How a parameter sweep runs and what it optimises.
 *
 * @param mode            GRID tries every grid point; RANDOM draws {@code samples} settings. Default GRID.
 * @param samples         random draws in RANDOM mode, >= 1; typical 20-200. Default 32.
 * @param seed            seed of the random draws (fixed so that every run is reproducible). Default 1.
 * @param targetPrecision the precision the chosen setting must keep, in (0, 1]. Default 1.0: the headline
 *                        metric is recall at 100% precision, because one false revisit can bend a whole map.
 * @param maxTrials       refuse sweeps with more settings than this, >= 1. Default 10000.
 * @param frameTolerance  frames a match may be off and still count as true (see {@link EvaluationConfig}). Default 0.
 */
public record SweepConfig(Mode mode, int samples, long seed, double targetPrecision, int maxTrials,
                          int frameTolerance) {

    /** Search strategy. */
    public enum Mode { GRID, RANDOM }

    public SweepConfig {
        if (mode == null) {
            throw new IllegalArgumentException("mode must not be null");
        }
        if (samples < 1) {
            throw new IllegalArgumentException("samples must be >= 1, was " + samples);
        }
        if (!(targetPrecision > 0 && targetPrecision <= 1)) {
            throw new IllegalArgumentException("targetPrecision must be in (0, 1], was " + targetPrecision);
        }
        if (maxTrials < 1) {
            throw new IllegalArgumentException("maxTrials must be >= 1, was " + maxTrials);
        }
        if (frameTolerance < 0) {
            throw new IllegalArgumentException("frameTolerance must be >= 0, was " + frameTolerance);
        }
    }

    /** Defaults: grid search, 32 random samples if switched to RANDOM, seed 1, 100% precision. */
    public static SweepConfig defaults() {
        return new SweepConfig(Mode.GRID, 32, 1L, 1.0, 10_000, 0);
    }

    /** Copy with another mode. */
    public SweepConfig withMode(Mode value) {
        return new SweepConfig(value, samples, seed, targetPrecision, maxTrials, frameTolerance);
    }

    /** Copy with another number of random samples. */
    public SweepConfig withSamples(int value) {
        return new SweepConfig(mode, value, seed, targetPrecision, maxTrials, frameTolerance);
    }

    /** Copy with another seed. */
    public SweepConfig withSeed(long value) {
        return new SweepConfig(mode, samples, value, targetPrecision, maxTrials, frameTolerance);
    }

    /** Copy with another target precision. */
    public SweepConfig withTargetPrecision(double value) {
        return new SweepConfig(mode, samples, seed, value, maxTrials, frameTolerance);
    }

    /** Copy with another trial cap. */
    public SweepConfig withMaxTrials(int value) {
        return new SweepConfig(mode, samples, seed, targetPrecision, value, frameTolerance);
    }

    /** Copy with another frame tolerance. */
    public SweepConfig withFrameTolerance(int value) {
        return new SweepConfig(mode, samples, seed, targetPrecision, maxTrials, value);
    }
}
