package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class ExclusionWindowTest {

    @Test
    void excludesGapsUpToAndIncludingTheWindow() {
        ExclusionWindow frames = new ExclusionWindow(0, 10);
        assertTrue(frames.excludes(10, 100.0));
        assertFalse(frames.excludes(11, 0.001));
        ExclusionWindow seconds = new ExclusionWindow(2.0, 0);
        assertTrue(seconds.excludes(1000, 2.0));
        assertFalse(seconds.excludes(1, 2.0001));
        ExclusionWindow both = new ExclusionWindow(2.0, 10);
        assertTrue(both.excludes(50, 1.0));
        assertTrue(both.excludes(5, 50.0));
        assertFalse(both.excludes(11, 2.5));
        assertFalse(ExclusionWindow.none().excludes(1, 1e-9));
    }

    @Test
    void timelineAllowsOnlyEarlierFramesOutsideTheWindowOrInEarlierSequences() {
        FrameTimeline t = new FrameTimeline(List.of(SequenceFrames.uniform("a", 10, 1),
                SequenceFrames.uniform("b", 10, 1)));
        ExclusionWindow w = new ExclusionWindow(0, 3);
        int b0 = t.globalIndex(new FrameKey("b", 0));
        assertEquals(10, b0);
        assertTrue(t.allows(w, b0, t.globalIndex(new FrameKey("a", 9))), "other sequence: never excluded");
        assertFalse(t.allows(w, t.globalIndex(new FrameKey("a", 5)), t.globalIndex(new FrameKey("b", 9))),
                "a later frame is never a match");
        assertFalse(t.allows(w, 14, 11));
        assertTrue(t.allows(w, 14, 10));
        assertFalse(t.allows(w, 14, 14));
    }

    @Test
    void refusesNegativeOrNonFiniteWindows() {
        assertThrows(IllegalArgumentException.class, () -> new ExclusionWindow(-1, 0));
        assertThrows(IllegalArgumentException.class, () -> new ExclusionWindow(Double.NaN, 0));
        assertThrows(IllegalArgumentException.class, () -> new ExclusionWindow(0, -1));
        assertEquals(new ExclusionWindow(2.5, 30), ExclusionWindow.defaults().withSeconds(2.5));
    }
}
