package revisit.evaluation;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

/**
 * The parameters a sweep may vary, each with its range.
 *
 * @param ranges one range per parameter, names unique (copied)
 */
public record ParameterSpace(List<ParameterRange> ranges) {

    public ParameterSpace {
        ranges = List.copyOf(ranges);
        if (ranges.isEmpty()) {
            throw new IllegalArgumentException("a parameter space needs at least one parameter");
        }
        Set<String> names = new HashSet<>();
        for (ParameterRange r : ranges) {
            if (!names.add(r.name())) {
                throw new IllegalArgumentException("parameter '" + r.name() + "' appears twice");
            }
        }
    }

    /** Number of grid points (product of the distinct values per parameter), saturating at Long.MAX_VALUE. */
    public long gridSize() {
        long n = 1;
        for (ParameterRange r : ranges) {
            int len = r.gridValues().length;
            if (n > Long.MAX_VALUE / len) {
                return Long.MAX_VALUE;
            }
            n *= len;
        }
        return n;
    }

    /**
     * Every grid point, the last parameter varying fastest.
     *
     * @param maxPoints refuse grids larger than this
     * @throws IllegalArgumentException when the grid holds more than maxPoints points
     */
    public List<ParameterSetting> grid(int maxPoints) {
        long size = gridSize();
        if (size > maxPoints) {
            throw new IllegalArgumentException("the grid holds " + size + " settings, more than " + maxPoints
                    + "; use fewer steps or a random search");
        }
        double[][] values = new double[ranges.size()][];
        for (int i = 0; i < values.length; i++) {
            values[i] = ranges.get(i).gridValues();
        }
        List<ParameterSetting> out = new ArrayList<>((int) size);
        int[] at = new int[values.length];
        for (long k = 0; k < size; k++) {
            Map<String, Double> m = new LinkedHashMap<>();
            for (int i = 0; i < values.length; i++) {
                m.put(ranges.get(i).name(), values[i][at[i]]);
            }
            out.add(new ParameterSetting(m));
            for (int i = values.length - 1; i >= 0 && ++at[i] == values[i].length; i--) {
                at[i] = 0;
            }
        }
        return out;
    }

    /** {@code count} independent random settings drawn with {@code new Random(seed)}. */
    public List<ParameterSetting> sample(int count, long seed) {
        Random random = new Random(seed);
        List<ParameterSetting> out = new ArrayList<>(count);
        for (int k = 0; k < count; k++) {
            Map<String, Double> m = new LinkedHashMap<>();
            for (ParameterRange r : ranges) {
                m.put(r.name(), r.sample(random));
            }
            out.add(new ParameterSetting(m));
        }
        return out;
    }
}
