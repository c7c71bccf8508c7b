package revisit.evaluation;

import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import revisit.pipeline.Closure;
import revisit.pipeline.ClosureStatus;

/**
 * Recall at 100% precision of a scan's trusted closures: closures are taken in order of falling confidence (then
 * score) until the first false one; the query frames of the closures before it are the ones found.
 */
public final class TrustedRecall {

    /**
     * @param trusted        trusted closures
     * @param trustedTrue    trusted closures that are true by the labels
     * @param foundAtFullPrecision query frames found before the first false closure
     */
    public record Result(int trusted, int trustedTrue, Set<FrameKey> foundAtFullPrecision) {

        public Result {
            foundAtFullPrecision = Set.copyOf(foundAtFullPrecision);
        }
    }

    private TrustedRecall() {
    }

    /**
     * Judges trusted closures.
     *
     * @param closures      closures of a scan (any status; only TRUSTED ones count)
     * @param sequenceNames name of each sequence id, in scan order (the label keys)
     * @param labels        ground-truth labels over the same sequences
     */
    public static Result of(List<Closure> closures, List<String> sequenceNames, RevisitLabels labels) {
        List<Closure> trusted = closures.stream().filter(c -> c.status() == ClosureStatus.TRUSTED)
                .sorted(Comparator.comparingDouble(Closure::confidence).thenComparingDouble(Closure::score)
                        .reversed()).toList();
        Set<FrameKey> found = new HashSet<>();
        int trueCount = 0;
        boolean clean = true;
        for (Closure c : trusted) {
            FrameKey q = new FrameKey(sequenceNames.get(c.querySequence()), c.queryFrame());
            FrameKey m = new FrameKey(sequenceNames.get(c.matchSequence()), c.matchFrame());
            boolean ok = labels.isTrueMatch(q, m, 0);
            trueCount += ok ? 1 : 0;
            clean &= ok;
            if (clean) {
                found.add(q);
            }
        }
        return new Result(trusted.size(), trueCount, found);
    }
}
