package revisit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class MatchGroupingTest {

    private static Candidate c(int sequence, int frame, double time, double eta) {
        return new Candidate(sequence, frame, time, eta / 2, eta);
    }

    @Test
    void groupsNeighboursInTimeAndRanksBySummedScore() {
        List<Candidate> candidates = List.of(c(0, 20, 10.0, 0.9), c(0, 2, 1.0, 0.4), c(0, 4, 2.0, 0.5),
                c(0, 3, 1.5, 0.6), c(1, 2, 1.0, 0.7), c(0, 21, 10.5, 0.35));
        List<MatchGroup> groups = MatchGrouping.group(candidates, 1.0);
        assertEquals(3, groups.size());
        MatchGroup first = groups.get(0);
        assertEquals(0, first.sequenceId());
        assertEquals(2, first.firstFrameId());
        assertEquals(4, first.lastFrameId());
        assertEquals(1.5, first.score(), 1e-12);
        assertEquals(3, first.memberCount());
        assertEquals(3, first.best().frameId());
        assertEquals(1.25, groups.get(1).score(), 1e-12);
        assertEquals(20, groups.get(1).best().frameId());
        assertEquals(1, groups.get(2).sequenceId());
    }

    @Test
    void gapBetweenGroupsIsZeroWhenTheyOverlap() {
        MatchGroup a = MatchGrouping.group(List.of(c(0, 1, 1.0, 1), c(0, 3, 3.0, 1)), 5).get(0);
        MatchGroup b = MatchGrouping.group(List.of(c(0, 2, 2.0, 1), c(0, 6, 6.0, 1)), 5).get(0);
        MatchGroup far = MatchGrouping.group(List.of(c(0, 9, 9.5, 1)), 5).get(0);
        assertEquals(0.0, a.gapSeconds(b));
        assertEquals(6.5, a.gapSeconds(far));
        assertEquals(Double.POSITIVE_INFINITY, a.gapSeconds(MatchGrouping.group(List.of(c(1, 2, 2, 1)), 5).get(0)));
    }
}
