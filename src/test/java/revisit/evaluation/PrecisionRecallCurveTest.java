package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class PrecisionRecallCurveTest {

    private static PrecisionRecallCurve curveOf(double[] scores, boolean[] correct, int positives) {
        List<JudgedDetection> ds = new ArrayList<>();
        for (int i = 0; i < scores.length; i++) {
            FrameKey q = new FrameKey("s", 100 + i);
            ds.add(new JudgedDetection(q, new FrameKey("s", i), scores[i], correct[i], true));
        }
        return Evaluator.curve(ds, positives);
    }

    @Test
    void recallAtFullPrecisionStopsBeforeTheFirstFalseDetection() {
        // Hand-worked list, 5 positives, scores high to low: T T F T T T.
        // threshold 0.9: 1/1 P=1 R=0.2; 0.8: 2/2 P=1 R=0.4; 0.7: 2/3; 0.6: 3/4; 0.5: 4/5 = 0.8 R=0.8;
        // 0.4: 5/6 = 0.833 R=1.0. Recall at 100% precision = 0.4 (threshold 0.8); at 95% also 0.4;
        // at 80% it is 1.0 at threshold 0.4 (precision rises again from 0.8 to 0.833).
        PrecisionRecallCurve c = curveOf(new double[]{0.9, 0.8, 0.7, 0.6, 0.5, 0.4},
                new boolean[]{true, true, false, true, true, true}, 5);
        assertEquals(0.4, c.atPrecision(1.0).recall(), 1e-12);
        assertEquals(0.8, c.atPrecision(1.0).threshold());
        assertEquals(0.4, c.atPrecision(0.95).recall(), 1e-12);
        assertEquals(1.0, c.atPrecision(0.8).recall(), 1e-12);
        assertEquals(0.4, c.atPrecision(0.8).threshold());
        // Threshold 0.55 between scores reports the top four (0.9, 0.8, 0.7, 0.6): TP 3, FP 1.
        assertEquals(3, c.at(0.55).truePositives());
        assertEquals(1, c.at(0.55).falsePositives());
    }

    @Test
    void tiedScoresEnterTogetherSoATieWithAFalseDetectionHasNoFullPrecisionPoint() {
        // Both at 0.9, one true one false: no threshold separates them, precision 1/2 at best.
        PrecisionRecallCurve c = curveOf(new double[]{0.9, 0.9}, new boolean[]{true, false}, 2);
        assertEquals(1, c.points().size());
        assertEquals(0.0, c.atPrecision(1.0).recall());
        assertEquals(Double.POSITIVE_INFINITY, c.atPrecision(1.0).threshold());
        assertEquals(1.0, c.atPrecision(1.0).precision());
        // AP: the true detection takes the group's precision 1/2; (1/2) / 2 positives = 0.25.
        assertEquals(0.25, c.averagePrecision(), 1e-12);
    }

    @Test
    void emptyCurveReportsNothingAndZeroAveragePrecision() {
        PrecisionRecallCurve c = curveOf(new double[0], new boolean[0], 3);
        assertEquals(0.0, c.averagePrecision());
        assertEquals(0.0, c.atPrecision(1.0).recall());
        assertEquals(3, c.atPrecision(1.0).falseNegatives());
    }
}
