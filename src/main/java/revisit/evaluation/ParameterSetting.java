package revisit.evaluation;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.StringJoiner;

/**
 * One point of a parameter space: a value for every parameter, in the space's order.
 *
 * @param values parameter name to value (copied, unmodifiable)
 */
public record ParameterSetting(Map<String, Double> values) {

    public ParameterSetting {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /**
     * The value of a parameter.
     *
     * @throws IllegalArgumentException when the setting has no such parameter
     */
    public double value(String name) {
        Double v = values.get(name);
        if (v == null) {
            throw new IllegalArgumentException("no parameter '" + name + "' in setting " + this);
        }
        return v;
    }

    /** The value of a whole-number parameter. */
    public int intValue(String name) {
        return (int) Math.round(value(name));
    }

    @Override
    public String toString() {
        StringJoiner j = new StringJoiner(", ");
        values.forEach((k, v) -> j.add(k + "=" + (v == Math.rint(v) && Math.abs(v) < 1e15
                ? Long.toString(v.longValue()) : Double.toString(v))));
        return j.toString();
    }
}
