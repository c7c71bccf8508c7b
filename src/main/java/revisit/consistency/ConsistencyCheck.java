package revisit.consistency;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import revisit.io.StampedPose;

/**
 * Checks loop closures for mutual consistency and keeps the largest consistent set (pairwise consistency
 * maximisation: Mangelson, Dominic, Eustice and Vasudevan, ICRA 2018). Every pair of closures joining the same two
 * sequences is tested by {@link LoopCheck}, through odometry when it is given and through time adjacency otherwise;
 * conflicting pairs form the conflict graph, whose complement's maximum clique ({@link MaximumClique}) is kept.
 * What is and is not tested is set out in docs/CONSISTENCY.md.
 */
public final class ConsistencyCheck {

    private final ConsistencyConfig config;

    /** @param config settings */
    public ConsistencyCheck(ConsistencyConfig config) {
        this.config = config;
    }

    /**
     * Checks closures without odometry: only closures whose ends are within the adjacency window of each other's
     * ends are tested.
     *
     * @param closures closures with unique ids
     */
    public ConsistencyReport check(List<ClosureConstraint> closures) {
        return run(closures, new AdjacentStretches(config));
    }

    /**
     * Checks closures against each other through odometry.
     *
     * @param closures closures with unique ids
     * @param odometry poses per sequence name (camera-to-world, times in the clock of the closures' frame times)
     */
    public ConsistencyReport check(List<ClosureConstraint> closures, Map<String, List<StampedPose>> odometry) {
        Map<String, OdometryTrack> tracks = new HashMap<>();
        odometry.forEach((name, poses) -> tracks.put(name, new OdometryTrack(poses)));
        return run(closures, new OdometryStretches(tracks, config));
    }

    private ConsistencyReport run(List<ClosureConstraint> closures, StretchMotion stretches) {
        requireUniqueIds(closures);
        int n = closures.size();
        LoopCheck loops = new LoopCheck(stretches, config);
        PairTally tally = new PairTally(n);
        List<PairOutcome> tested = new ArrayList<>();
        long untested = 0;
        for (List<Integer> group : groupsBySequencePair(closures)) {
            for (int x = 0; x < group.size(); x++) {
                for (int y = x + 1; y < group.size(); y++) {
                    int i = group.get(x);
                    int j = group.get(y);
                    PairOutcome outcome = loops.test(closures.get(i), closures.get(j));
                    tally.add(i, j, outcome);
                    if (outcome.state() == PairState.UNTESTED) {
                        untested++;
                    } else {
                        tested.add(outcome);
                    }
                }
            }
        }
        MaximumClique.Result clique = MaximumClique.find(tally.conflicts, config.maxExactCliqueVertices(),
                config.cliqueNodeBudget());
        BitSet kept = new BitSet(n);
        for (int v : clique.members()) {
            kept.set(v);
        }
        List<ClosureVerdict> verdicts = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            verdicts.add(tally.verdict(i, closures.get(i), kept, config));
        }
        return new ConsistencyReport(verdicts, tested, untested, clique.exact(), clique.nodesExplored(),
                config.keepUnchecked());
    }

    /** Indices grouped by the unordered pair of sequences their closures join. */
    private static List<List<Integer>> groupsBySequencePair(List<ClosureConstraint> closures) {
        Map<List<String>, List<Integer>> groups = new HashMap<>();
        for (int i = 0; i < closures.size(); i++) {
            String sa = closures.get(i).a().sequence();
            String sb = closures.get(i).b().sequence();
            List<String> key = sa.compareTo(sb) <= 0 ? List.of(sa, sb) : List.of(sb, sa);
            groups.computeIfAbsent(key, k -> new ArrayList<>()).add(i);
        }
        return groups.values().stream().sorted((p, q) -> Integer.compare(p.get(0), q.get(0))).toList();
    }

    private static void requireUniqueIds(List<ClosureConstraint> closures) {
        Set<String> seen = new HashSet<>();
        for (ClosureConstraint c : closures) {
            if (!seen.add(c.id())) {
                throw new IllegalArgumentException("closure id " + c.id() + " occurs twice; ids must be unique");
            }
        }
    }

    /** Per-closure counts of pair outcomes, and the conflict graph. */
    private static final class PairTally {
        final List<BitSet> conflicts = new ArrayList<>();
        final List<BitSet> agreements = new ArrayList<>();
        final int[][] reasons;
        final int[] tested;

        PairTally(int n) {
            for (int i = 0; i < n; i++) {
                conflicts.add(new BitSet(n));
                agreements.add(new BitSet(n));
            }
            reasons = new int[n][UncheckedReason.values().length];
            tested = new int[n];
        }

        void add(int i, int j, PairOutcome outcome) {
            switch (outcome.state()) {
                case CONSISTENT -> {
                    agreements.get(i).set(j);
                    agreements.get(j).set(i);
                    tested[i]++;
                    tested[j]++;
                }
                case CONFLICTING -> {
                    conflicts.get(i).set(j);
                    conflicts.get(j).set(i);
                    tested[i]++;
                    tested[j]++;
                }
                case UNTESTED -> {
                    int r = outcome.reason().orElseThrow().ordinal();
                    reasons[i][r]++;
                    reasons[j][r]++;
                }
            }
        }

        ClosureVerdict verdict(int i, ClosureConstraint closure, BitSet kept, ConsistencyConfig config) {
            BitSet support = (BitSet) agreements.get(i).clone();
            support.and(kept);
            int k = support.cardinality();
            int conflicting = conflicts.get(i).cardinality();
            double geometric = closure.inlierRatio()
                    * (1 - Math.exp(-closure.inlierCount() / config.inlierCountScale()));
            if (!kept.get(i)) {
                return new ClosureVerdict(closure.id(), Verdict.CONFLICTING, Optional.empty(), 0, k, conflicting,
                        tested[i]);
            }
            if (k > 0) {
                return new ClosureVerdict(closure.id(), Verdict.CONSISTENT, Optional.empty(),
                        geometric * (k + 1) / (k + 2), k, conflicting, tested[i]);
            }
            UncheckedReason reason = tested[i] > 0 ? UncheckedReason.NO_SUPPORT_IN_KEPT_SET : commonestReason(i);
            return new ClosureVerdict(closure.id(), Verdict.UNCHECKED, Optional.of(reason), geometric / 2, 0,
                    conflicting, tested[i]);
        }

        private UncheckedReason commonestReason(int i) {
            UncheckedReason best = UncheckedReason.NO_PARTNER;
            int bestCount = 0;
            for (UncheckedReason r : UncheckedReason.values()) {
                if (reasons[i][r.ordinal()] > bestCount) {
                    bestCount = reasons[i][r.ordinal()];
                    best = r;
                }
            }
            return best;
        }
    }
}
