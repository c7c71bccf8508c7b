package revisit.index;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Groups candidates that are neighbours in time (Gálvez-López and Tardós, IEEE T-RO 2012): within a sequence,
 * candidates sorted by time join the current group while each is at most {@code gapSeconds} after the previous one.
 * A group's score is the sum of its members' normalised scores; its best member represents it.
 */
final class MatchGrouping {

    private static final Comparator<Candidate> BY_TIME = Comparator.comparingInt(Candidate::sequenceId)
            .thenComparingDouble(Candidate::timeSeconds).thenComparingInt(Candidate::frameId);
    private static final Comparator<MatchGroup> BEST_FIRST = Comparator.comparingDouble(MatchGroup::score)
            .reversed().thenComparing(g -> g.best().normalisedScore(), Comparator.reverseOrder())
            .thenComparingInt(MatchGroup::sequenceId).thenComparingInt(MatchGroup::firstFrameId);

    private MatchGrouping() {
    }

    /**
     * @param candidates candidates (any order), already filtered by score
     * @param gapSeconds largest time step inside a group, seconds
     * @return groups, best first
     */
    static List<MatchGroup> group(List<Candidate> candidates, double gapSeconds) {
        List<Candidate> sorted = new ArrayList<>(candidates);
        sorted.sort(BY_TIME);
        List<MatchGroup> groups = new ArrayList<>();
        int start = 0;
        for (int i = 1; i <= sorted.size(); i++) {
            boolean split = i == sorted.size()
                    || sorted.get(i).sequenceId() != sorted.get(i - 1).sequenceId()
                    || sorted.get(i).timeSeconds() - sorted.get(i - 1).timeSeconds() > gapSeconds;
            if (split) {
                groups.add(summarise(sorted.subList(start, i)));
                start = i;
            }
        }
        groups.sort(BEST_FIRST);
        return groups;
    }

    private static MatchGroup summarise(List<Candidate> members) {
        Candidate best = members.get(0);
        int firstFrame = Integer.MAX_VALUE;
        int lastFrame = Integer.MIN_VALUE;
        double score = 0;
        for (Candidate c : members) {
            score += c.normalisedScore();
            firstFrame = Math.min(firstFrame, c.frameId());
            lastFrame = Math.max(lastFrame, c.frameId());
            if (c.normalisedScore() > best.normalisedScore()) {
                best = c;
            }
        }
        return new MatchGroup(best.sequenceId(), firstFrame, lastFrame, members.get(0).timeSeconds(),
                members.get(members.size() - 1).timeSeconds(), score, members.size(), best);
    }
}
