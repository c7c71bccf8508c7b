package revisit.consistency;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;

/**
 * Largest set of mutually compatible closures: the maximum clique of the consistency graph (Mangelson, Dominic,
 * Eustice and Vasudevan, "Pairwise consistent measurement set maximization for robust multi-robot map merging",
 * ICRA 2018).
 *
 * <p>Two vertices are adjacent unless a tested pair conflicts, so the graph is dense and its complement, the conflict
 * graph, sparse. A clique is an independent set of the conflict graph, which splits over the conflict graph's
 * connected components: the maximum clique is the union of the best choice within every component, and a vertex in
 * no conflict is always in it. Each component is searched:
 * <ul>
 * <li>exactly, up to {@code maxExactVertices}, by branch and bound with a greedy-colouring bound (Tomita and Seki,
 * "An efficient branch-and-bound algorithm for finding a maximum clique", DMTCS 2003): candidates are coloured so
 * that no two of one colour are adjacent, and a branch is cut when clique size plus colour count cannot beat the
 * best; vertices are first ordered by degree; stopped after {@code nodeBudget} nodes with the best so far;</li>
 * <li>otherwise by a greedy heuristic: repeatedly drop the vertex with the most conflicts among those left (ties:
 * lower index first) until no conflict remains, then add back any dropped vertex that conflicts with none kept.
 * The heuristic result also seeds the exact search as its first lower bound.</li>
 * </ul>
 */
final class MaximumClique {

    /**
     * The clique and how it was found.
     *
     * @param members        vertex indices in increasing order
     * @param exact          true when every component was searched to completion
     * @param nodesExplored  branch-and-bound nodes visited over all components
     */
    record Result(int[] members, boolean exact, long nodesExplored) {
    }

    private MaximumClique() {
    }

    /**
     * @param conflicts        conflicts.get(v) holds the vertices v conflicts with (symmetric, no self-loops)
     * @param maxExactVertices components up to this size are searched exactly
     * @param nodeBudget       node limit per component for the exact search
     */
    static Result find(List<BitSet> conflicts, int maxExactVertices, long nodeBudget) {
        int n = conflicts.size();
        BitSet chosen = new BitSet(n);
        boolean exact = true;
        long nodes = 0;
        for (int[] component : components(conflicts)) {
            if (component.length == 1) {
                chosen.set(component[0]);
                continue;
            }
            BitSet greedy = greedy(conflicts, component);
            if (component.length > maxExactVertices) {
                exact = false;
                chosen.or(greedy);
                continue;
            }
            CliqueSearch search = new CliqueSearch(conflicts, component, greedy, nodeBudget);
            chosen.or(search.run());
            exact &= search.complete();
            nodes += search.nodes();
        }
        return new Result(chosen.stream().toArray(), exact, nodes);
    }

    /** Connected components of the conflict graph, each sorted. */
    static List<int[]> components(List<BitSet> conflicts) {
        int n = conflicts.size();
        int[] label = new int[n];
        Arrays.fill(label, -1);
        List<int[]> out = new ArrayList<>();
        for (int start = 0; start < n; start++) {
            if (label[start] >= 0) {
                continue;
            }
            BitSet members = new BitSet(n);
            int[] stack = new int[n];
            int top = 0;
            stack[top++] = start;
            label[start] = out.size();
            while (top > 0) {
                int v = stack[--top];
                members.set(v);
                for (int w = conflicts.get(v).nextSetBit(0); w >= 0; w = conflicts.get(v).nextSetBit(w + 1)) {
                    if (label[w] < 0) {
                        label[w] = out.size();
                        stack[top++] = w;
                    }
                }
            }
            out.add(members.stream().toArray());
        }
        return out;
    }

    /** The greedy heuristic on one component. */
    static BitSet greedy(List<BitSet> conflicts, int[] component) {
        BitSet kept = new BitSet();
        for (int v : component) {
            kept.set(v);
        }
        while (true) {
            int worst = -1;
            int worstCount = 0;
            for (int v = kept.nextSetBit(0); v >= 0; v = kept.nextSetBit(v + 1)) {
                BitSet c = (BitSet) conflicts.get(v).clone();
                c.and(kept);
                if (c.cardinality() > worstCount) {
                    worstCount = c.cardinality();
                    worst = v;
                }
            }
            if (worst < 0) {
                break;
            }
            kept.clear(worst);
        }
        for (int v : component) {
            if (!kept.get(v) && !conflicts.get(v).intersects(kept)) {
                kept.set(v);
            }
        }
        return kept;
    }
}
