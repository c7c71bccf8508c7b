package revisit.evaluation;

import java.util.Arrays;
import java.util.Random;

/**
 * The values one tunable parameter may take in a sweep.
 *
 * @param name    parameter name, as the setting callback will see it (letters, digits, '_', '.', '-')
 * @param min     smallest value, in the parameter's own unit
 * @param max     largest value, >= min
 * @param steps   number of grid values from min to max inclusive, >= 1 (1 = min only)
 * @param scale   spacing of grid values and distribution of random draws
 * @param integer round every value to a whole number (duplicates removed)
 */
public record ParameterRange(String name, double min, double max, int steps, Scale scale, boolean integer) {

    /** Spacing of values. */
    public enum Scale {
        /** Evenly spaced; random draws uniform. */
        LINEAR,
        /** Evenly spaced in log(value) (needs min > 0); random draws log-uniform. */
        LOG
    }

    public ParameterRange {
        FrameKey.requireValidSequenceId(name);
        if (!Double.isFinite(min) || !Double.isFinite(max) || min > max) {
            throw new IllegalArgumentException("parameter '" + name + "': need finite min <= max, were " + min
                    + ", " + max);
        }
        if (steps < 1) {
            throw new IllegalArgumentException("parameter '" + name + "': steps must be >= 1, was " + steps);
        }
        if (scale == null || (scale == Scale.LOG && !(min > 0))) {
            throw new IllegalArgumentException("parameter '" + name + "': a log scale needs min > 0");
        }
    }

    /** Evenly spaced real values. */
    public static ParameterRange linear(String name, double min, double max, int steps) {
        return new ParameterRange(name, min, max, steps, Scale.LINEAR, false);
    }

    /** Values evenly spaced in log(value), min > 0. */
    public static ParameterRange log(String name, double min, double max, int steps) {
        return new ParameterRange(name, min, max, steps, Scale.LOG, false);
    }

    /** Every whole number from min to max. */
    public static ParameterRange integers(String name, int min, int max) {
        return new ParameterRange(name, min, max, max - min + 1, Scale.LINEAR, true);
    }

    /** A single value (kept fixed during the sweep). */
    public static ParameterRange fixed(String name, double value) {
        return new ParameterRange(name, value, value, 1, Scale.LINEAR, false);
    }

    /** The grid values, ascending, duplicates (after rounding) removed. */
    public double[] gridValues() {
        double[] v = new double[steps];
        for (int i = 0; i < steps; i++) {
            double f = steps == 1 ? 0 : (double) i / (steps - 1);
            v[i] = round(at(f));
        }
        return Arrays.stream(v).distinct().sorted().toArray();
    }

    /** One random value, uniform (LINEAR) or log-uniform (LOG) in [min, max]. */
    public double sample(Random random) {
        return round(at(random.nextDouble()));
    }

    private double at(double fraction) {
        if (fraction >= 1) {
            return max;
        }
        return scale == Scale.LOG ? Math.exp(Math.log(min) + fraction * (Math.log(max) - Math.log(min)))
                : min + fraction * (max - min);
    }

    private double round(double v) {
        return integer ? Math.min(Math.max(Math.rint(v), Math.ceil(min)), Math.floor(max)) : v;
    }
}
