package revisit.evaluation;

/**
 * One evaluated setting of a sweep.
 *
 * @param index            position in the sweep (0-based)
 * @param setting          the parameter values
 * @param chosen           best operating point at the target precision (its recall is the objective)
 * @param averagePrecision average precision over the whole curve (second tie-break)
 */
public record Trial(int index, ParameterSetting setting, OperatingPoint chosen, double averagePrecision) {

    /**
     * Whether this trial beats another: higher recall at the target precision, then higher F1 at that operating
     * point, then higher average precision; a full tie keeps the earlier trial.
     */
    public boolean beats(Trial other) {
        int c = Double.compare(chosen.recall(), other.chosen.recall());
        if (c == 0) {
            c = Double.compare(chosen.f1(), other.chosen.f1());
        }
        if (c == 0) {
            c = Double.compare(averagePrecision, other.averagePrecision);
        }
        return c > 0;
    }
}
