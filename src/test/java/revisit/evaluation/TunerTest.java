package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

class TunerTest {

    private static final int FRAMES = 400;

    /**
     * An invented detector with one real knob, the minimum inlier count. Queries 200..399 of each sequence revisit
     * frame q - 200 and find it with 10 + q % 20 inliers (10..29), score = inliers. Queries 0..199 have no revisit
     * and find a wrong frame with {@code q % falseModulus} inliers and score 50, above every true score, so no
     * acceptance threshold can remove a verified false match without removing all true ones.
     */
    private static List<QueryOutcome> detect(String seq, int minInliers, int falseModulus) {
        List<QueryOutcome> out = new ArrayList<>();
        for (int q = 0; q < FRAMES; q++) {
            FrameKey query = new FrameKey(seq, q);
            boolean positive = q >= 200;
            int inliers = positive ? 10 + q % 20 : q % falseModulus;
            FrameKey match = new FrameKey(seq, positive ? q - 200 : q / 2);
            double score = positive ? inliers : 50;
            StageReached stage = inliers >= minInliers ? StageReached.VERIFIED : StageReached.CONSISTENT;
            out.add(q == 0 ? QueryOutcome.noCandidate(query) : QueryOutcome.of(query, match, score, stage));
        }
        return out;
    }

    private static RevisitLabels labels(String... sequences) {
        List<SequenceFrames> seqs = new ArrayList<>();
        for (String s : sequences) {
            seqs.add(SequenceFrames.uniform(s, FRAMES, 10));
        }
        LabelBuilder b = new LabelBuilder(new FrameTimeline(seqs), ExclusionWindow.defaults());
        for (String s : sequences) {
            for (int q = 200; q < FRAMES; q++) {
                b.add(new FrameKey(s, q), new FrameKey(s, q - 200));
            }
        }
        return b.build();
    }

    /** Labels where only queries 300..303 of sequence "a" are positive, each revisiting q - 200. */
    private static RevisitLabels fourPositives() {
        LabelBuilder builder = new LabelBuilder(FrameTimeline.of(SequenceFrames.uniform("a", FRAMES, 10)),
                ExclusionWindow.defaults());
        for (int k = 300; k <= 303; k++) {
            builder.add(new FrameKey("a", k), new FrameKey("a", k - 200));
        }
        return builder.build();
    }

    private static final ParameterSpace SPACE = new ParameterSpace(List.of(ParameterRange.integers("minInliers", 0, 30),
            ParameterRange.linear("unused", 0, 1, 3)));

    @Test
    void gridSweepFindsTheSettingWithBestRecallAtFullPrecision() {
        // Worked by hand: false matches have 0..14 inliers, so minInliers >= 15 removes them all; at 15 the true
        // matches with q % 20 >= 5 survive: 150 of 200, recall 0.75, threshold = lowest kept true score 15.
        // At 16 only 140 survive. "unused" changes nothing, so the tie goes to the first grid point (unused = 0).
        List<TunedSetting> written = new ArrayList<>();
        TuningResult r = Tuner.tune(SPACE, SweepConfig.defaults(),
                s -> detect("a", s.intValue("minInliers"), 15), labels("a"), written::add);
        assertEquals(31 * 3, r.trials().size());
        assertEquals(15, r.chosen().setting().intValue("minInliers"));
        assertEquals(0.0, r.chosen().setting().value("unused"));
        assertEquals(15.0, r.chosen().acceptanceThreshold());
        assertEquals(0.75, r.best().chosen().recall(), 1e-12);
        assertEquals(List.of(r.chosen()), written);
        assertEquals(150, r.bestEvaluation().atThreshold().truePositives());
        assertEquals(0, r.bestEvaluation().atThreshold().falsePositives());
        // The 50 lost positives failed verification (q % 20 < 5 -> fewer than 15 inliers).
        assertEquals(50, r.bestEvaluation().missReasons().get(MissReason.VERIFICATION));
    }

    @Test
    void randomSweepIsReproducibleAndKeepsTheBestOfItsDraws() {
        SweepConfig random = SweepConfig.defaults().withMode(SweepConfig.Mode.RANDOM).withSamples(12).withSeed(42);
        TuningResult a = Tuner.tune(SPACE, random, s -> detect("a", s.intValue("minInliers"), 15), labels("a"), t -> { });
        TuningResult b = Tuner.tune(SPACE, random, s -> detect("a", s.intValue("minInliers"), 15), labels("a"), t -> { });
        assertEquals(a.trials(), b.trials());
        TuningResult c = Tuner.tune(SPACE, random.withSeed(43), s -> detect("a", s.intValue("minInliers"), 15),
                labels("a"), t -> { });
        assertNotEquals(a.trials().stream().map(Trial::setting).toList(),
                c.trials().stream().map(Trial::setting).toList());
        double bestRecall = a.trials().stream().mapToDouble(t -> t.chosen().recall()).max().orElseThrow();
        assertEquals(bestRecall, a.best().chosen().recall());
        for (Trial t : a.trials()) {
            int m = t.setting().intValue("minInliers");
            assertTrue(m >= 0 && m <= 30);
            // Independent check of each trial: recall at 100% precision is 0 below 15, else (30 - m) / 20 capped at 1.
            double expected = m < 15 ? 0 : Math.min(1.0, (30 - m) / 20.0);
            assertEquals(expected, t.chosen().recall(), 1e-12, "minInliers=" + m);
        }
    }

    @Test
    void breaksRecallTiesByF1ThenAveragePrecision() {
        // Hand-made outcome lists, 4 positives (queries 300..303 revisit q - 200).
        RevisitLabels labels = fourPositives();
        FrameKey[] q = {new FrameKey("a", 300), new FrameKey("a", 301), new FrameKey("a", 302), new FrameKey("a", 303)};
        FrameKey wrong = new FrameKey("a", 7);
        QueryOutcome t0 = QueryOutcome.of(q[0], new FrameKey("a", 100), 9, StageReached.VERIFIED);
        QueryOutcome t1 = QueryOutcome.of(q[1], new FrameKey("a", 101), 8, StageReached.VERIFIED);
        QueryOutcome t2 = QueryOutcome.of(q[2], new FrameKey("a", 102), 1, StageReached.VERIFIED);
        QueryOutcome f = QueryOutcome.of(new FrameKey("a", 50), wrong, 5, StageReached.VERIFIED);
        QueryOutcome fHigh = QueryOutcome.of(new FrameKey("a", 51), wrong, 8.5, StageReached.VERIFIED);
        // Variant 0: recall at 100% precision 0.5 (t0, t1 before f); AP (1 + 1 + 3/4) / 4 = 0.6875.
        // Variant 1: same recall and F1, no t2: AP (1 + 1) / 4 = 0.5.
        // Variant 2: fHigh between t0 and t1: recall at 100% only 0.25.
        Map<Integer, List<QueryOutcome>> variants = Map.of(
                0, List.of(t0, t1, f, t2),
                1, List.of(t0, t1, f),
                2, List.of(t0, fHigh, t1));
        ParameterSpace space = new ParameterSpace(List.of(ParameterRange.integers("variant", 0, 2)));
        TuningResult r = Tuner.tune(space, SweepConfig.defaults(), s -> variants.get(s.intValue("variant")), labels,
                t -> { });
        assertEquals(0, r.chosen().setting().intValue("variant"));
        assertEquals(r.trials().get(0).chosen().f1(), r.trials().get(1).chosen().f1());
        assertEquals(0.6875, r.trials().get(0).averagePrecision(), 1e-12);
        assertEquals(0.5, r.trials().get(1).averagePrecision(), 1e-12);
        assertEquals(0.25, r.trials().get(2).chosen().recall(), 1e-12);
        // At target precision 0.75, variant 2 reaches recall 0.5 with precision 2/3 < 0.75 -> not allowed;
        // variant 0 at threshold 1 reaches recall 0.75 with precision 3/4: it wins on recall.
        TuningResult loose = Tuner.tune(space, SweepConfig.defaults().withTargetPrecision(0.75),
                s -> variants.get(s.intValue("variant")), labels, t -> { });
        assertEquals(0, loose.chosen().setting().intValue("variant"));
        assertEquals(0.75, loose.best().chosen().recall(), 1e-12);
        assertEquals(1.0, loose.chosen().acceptanceThreshold());
    }

    @Test
    void prefersHigherF1AtTheTargetOverHigherAveragePrecision() {
        // Target precision 0.6, 4 positives. Variant 0 (swept first): t0 9, false 8.5, t1 8, false 7, 6.5, 6.2,
        // t2 6: best recall at precision >= 0.6 is 0.5 at threshold 8 with precision 2/3 (F1 4/7 = 0.571);
        // AP (1 + 2/3 + 3/7) / 4 = 0.524. Variant 1: t0 9, t1 8, false 5: recall 0.5 with precision 1 (F1 2/3);
        // AP (1 + 1) / 4 = 0.5. Same recall; variant 1 wins on F1 although its AP is lower.
        RevisitLabels labels = fourPositives();
        List<QueryOutcome> variant0 = new ArrayList<>();
        List<QueryOutcome> variant1 = new ArrayList<>();
        variant0.add(QueryOutcome.of(new FrameKey("a", 300), new FrameKey("a", 100), 9, StageReached.VERIFIED));
        variant0.add(QueryOutcome.of(new FrameKey("a", 301), new FrameKey("a", 101), 8, StageReached.VERIFIED));
        variant0.add(QueryOutcome.of(new FrameKey("a", 302), new FrameKey("a", 102), 6, StageReached.VERIFIED));
        double[] falseScores = {8.5, 7, 6.5, 6.2};
        for (int k = 0; k < falseScores.length; k++) {
            variant0.add(QueryOutcome.of(new FrameKey("a", 50 + k), new FrameKey("a", 7), falseScores[k],
                    StageReached.VERIFIED));
        }
        variant1.add(variant0.get(0));
        variant1.add(variant0.get(1));
        variant1.add(QueryOutcome.of(new FrameKey("a", 60), new FrameKey("a", 7), 5, StageReached.VERIFIED));
        ParameterSpace space = new ParameterSpace(List.of(ParameterRange.integers("variant", 0, 1)));
        TuningResult r = Tuner.tune(space, SweepConfig.defaults().withTargetPrecision(0.6),
                s -> s.intValue("variant") == 0 ? variant0 : variant1, labels, t -> { });
        assertEquals((1 + 2.0 / 3 + 3.0 / 7) / 4, r.trials().get(0).averagePrecision(), 1e-12);
        assertEquals(4.0 / 7, r.trials().get(0).chosen().f1(), 1e-12);
        assertEquals(2.0 / 3, r.trials().get(1).chosen().f1(), 1e-12);
        assertEquals(1, r.chosen().setting().intValue("variant"));
        assertEquals(8.0, r.chosen().acceptanceThreshold());
    }

    @Test
    void testsTheTunedSettingOnHeldOutSequences() {
        // Sequence "tune" as above (false inliers 0..14); sequence "test" has false inliers q % 18 (0..17), so at the
        // tuned minInliers 15 the negatives with q % 18 in {15, 16, 17} pass: q in 0..197 gives 11 cycles x 3 = 33
        // false positives (198, 199 have residues 0, 1). True positives 150 as before: precision 150 / 183.
        RevisitLabels labels = labels("tune", "test");
        HeldOutResult r = Tuner.tuneAndTest(new ParameterSpace(List.of(ParameterRange.integers("minInliers", 0, 30))),
                SweepConfig.defaults(), s -> {
                    List<QueryOutcome> all = new ArrayList<>(detect("tune", s.intValue("minInliers"), 15));
                    all.addAll(detect("test", s.intValue("minInliers"), 18));
                    return all;
                }, labels, Set.of("tune"), t -> { });
        assertEquals(15, r.tuning().chosen().setting().intValue("minInliers"));
        assertEquals(200, r.tuning().bestEvaluation().positives());
        assertEquals(200, r.heldOut().positives());
        assertEquals(150, r.heldOut().atThreshold().truePositives());
        assertEquals(33, r.heldOut().atThreshold().falsePositives());
        assertEquals(150.0 / 183, r.heldOut().atThreshold().precision(), 1e-12);
        assertEquals(0.0, r.heldOut().atFullPrecision().recall());
    }

    @Test
    void refusesOversizedGridsAndImproperSplits() {
        ParameterSpace big = new ParameterSpace(List.of(ParameterRange.integers("a", 0, 999),
                ParameterRange.integers("b", 0, 999)));
        assertThrows(IllegalArgumentException.class, () -> Tuner.tune(big, SweepConfig.defaults(),
                s -> List.of(), labels("a"), t -> { }));
        assertThrows(IllegalArgumentException.class, () -> Tuner.tuneAndTest(SPACE, SweepConfig.defaults(),
                s -> List.of(), labels("a"), Set.of("a"), t -> { }));
    }
}
