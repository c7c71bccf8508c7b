package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class FrameTimelineTest {

    private final FrameTimeline timeline = new FrameTimeline(List.of(
            new SequenceFrames("a", new double[]{0.0, 0.1, 0.25, 0.3}),
            SequenceFrames.uniform("b", 3, 2)));

    @Test
    void numbersFramesInScanOrder() {
        assertEquals(7, timeline.size());
        assertEquals(4, timeline.globalIndex(new FrameKey("b", 0)));
        for (int g = 0; g < timeline.size(); g++) {
            assertEquals(g, timeline.globalIndex(timeline.keyOf(g)));
        }
        assertEquals(1.0, timeline.timeOf(6));
        assertEquals(1, timeline.sequencePosition(4));
        assertFalse(timeline.contains(new FrameKey("a", 4)));
        assertFalse(timeline.contains(new FrameKey("c", 0)));
        assertThrows(IllegalArgumentException.class, () -> timeline.globalIndex(new FrameKey("b", 3)));
    }

    @Test
    void snapsTimesToTheNearestFrameWithTiesGoingEarlier() {
        SequenceFrames a = timeline.sequence("a").orElseThrow();
        assertEquals(2, a.nearestFrame(0.26));
        assertEquals(3, a.nearestFrame(9.0));
        assertEquals(0, a.nearestFrame(-1.0));
        assertEquals(0, a.nearestFrame(0.05));
        // Gaps 0.1, 0.15, 0.05: the median is 0.1.
        assertEquals(0.1, a.medianIntervalSeconds(), 1e-12);
    }

    @Test
    void refusesBadTimesAndDuplicateIds() {
        assertThrows(IllegalArgumentException.class, () -> new SequenceFrames("a", new double[]{0, 0}));
        assertThrows(IllegalArgumentException.class, () -> new SequenceFrames("a", new double[]{0, Double.NaN}));
        assertThrows(IllegalArgumentException.class, () -> new SequenceFrames("a b", new double[]{0}));
        assertThrows(IllegalArgumentException.class, () -> new FrameTimeline(List.of(
                SequenceFrames.uniform("a", 2, 1), SequenceFrames.uniform("a", 2, 1))));
        assertTrue(timeline.sequence("b").isPresent());
    }
}
