package revisit.consistency;

import java.util.ArrayList;
import java.util.List;

/**
 * Result of a consistency check.
 *
 * @param verdicts     one per input closure, in input order
 * @param testedPairs  every pair that was tested (consistent or conflicting); untested pairs are only counted
 * @param untestedPairs number of pairs that could not be tested
 * @param exactClique  true when the kept set is a proven maximum clique (false when the heuristic or the node budget
 *                     decided some component)
 * @param cliqueNodes  branch-and-bound nodes visited
 * @param keepsUnchecked whether {@link #trusted} keeps UNCHECKED closures ({@link ConsistencyConfig#keepUnchecked()})
 */
public record ConsistencyReport(List<ClosureVerdict> verdicts, List<PairOutcome> testedPairs, long untestedPairs,
                                boolean exactClique, long cliqueNodes, boolean keepsUnchecked) {

    public ConsistencyReport {
        verdicts = List.copyOf(verdicts);
        testedPairs = List.copyOf(testedPairs);
    }

    /**
     * The closures to trust: CONSISTENT ones, plus UNCHECKED ones when the configuration keeps them.
     *
     * @param closures the closures that were checked, in the same order
     */
    public List<ClosureConstraint> trusted(List<ClosureConstraint> closures) {
        if (closures.size() != verdicts.size()) {
            throw new IllegalArgumentException("expected the " + verdicts.size() + " checked closures, got "
                    + closures.size());
        }
        List<ClosureConstraint> kept = new ArrayList<>();
        for (int i = 0; i < closures.size(); i++) {
            ClosureVerdict v = verdicts.get(i);
            if (!v.closureId().equals(closures.get(i).id())) {
                throw new IllegalArgumentException("closure " + i + " is " + closures.get(i).id()
                        + ", but the report was made for " + v.closureId());
            }
            if (v.verdict() == Verdict.CONSISTENT || (keepsUnchecked && v.verdict() == Verdict.UNCHECKED)) {
                kept.add(closures.get(i));
            }
        }
        return kept;
    }

    /** Number of closures with a verdict. */
    public long count(Verdict verdict) {
        return verdicts.stream().filter(v -> v.verdict() == verdict).count();
    }
}
