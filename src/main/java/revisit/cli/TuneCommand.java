package revisit.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import revisit.camera.CameraFile;
import revisit.camera.CameraModel;
import revisit.evaluation.HeldOutResult;
import revisit.evaluation.HtmlReport;
import revisit.evaluation.ParameterRange;
import revisit.evaluation.ParameterSetting;
import revisit.evaluation.ParameterSpace;
import revisit.evaluation.QueryOutcome;
import revisit.evaluation.ReportInput;
import revisit.evaluation.RevisitLabels;
import revisit.evaluation.ScanOutcomes;
import revisit.evaluation.SweepConfig;
import revisit.evaluation.TunedSetting;
import revisit.evaluation.Tuner;
import revisit.evaluation.TuningResult;
import revisit.pipeline.ConfigFile;
import revisit.pipeline.FrameCache;
import revisit.pipeline.Replay;
import revisit.pipeline.ScanConfig;
import revisit.pipeline.ScanOutputs;
import revisit.pipeline.ScanResult;
import revisit.pipeline.TraceFile;
import revisit.vocabulary.VocabularyFile;

/** {@code revisit tune}: sweeps thresholds over a finished scan's cached features and writes the best config. */
@Command(name = "tune", mixinStandardHelpOptions = true,
        description = "Sweep detection thresholds over a finished scan (reusing its cached features and words), "
                + "pick the setting with the best recall at the target precision and write it as a config file "
                + "that 'revisit scan --config' reads.")
final class TuneCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCAN_DIR", description = "Output folder of revisit scan.")
    Path scanDir;

    @Mixin
    LabelOptions labels;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "FILE", description = "Config file to write.")
    Path out;

    @Option(names = "--vocabulary", paramLabel = "FILE", description = "The vocabulary the scan used (default: the "
            + "shipped one).")
    Path vocabulary;

    @Option(names = "--camera", paramLabel = "FILE", description = "Camera file the scan used, if any.")
    Path camera;

    @Option(names = "--trials", defaultValue = "60", paramLabel = "N", description = "Settings to try.")
    int trials;

    @Option(names = "--grid", description = "Grid instead of seeded random sampling.")
    boolean grid;

    @Option(names = "--seed", defaultValue = "7", paramLabel = "N", description = "Seed of the random sweep.")
    long seed;

    @Option(names = "--target-precision", defaultValue = "1.0", paramLabel = "P",
            description = "Precision the chosen setting must reach (default 1.0).")
    double targetPrecision;

    @Option(names = "--tune-on", split = ",", paramLabel = "NAME", description = "Tune on these sequences only and "
            + "report the others as held out (names as in the scan's sequences.txt).")
    List<String> tuneOn = new ArrayList<>();

    @Option(names = "--report", paramLabel = "DIR", description = "Write an HTML report of the chosen setting.")
    Path report;

    @Option(names = "--verbose", description = "Stack traces with errors.")
    boolean verbose;

    /** The swept parameters: names are config paths, so the winner is applied with the config overrides. */
    static ParameterSpace space() {
        return new ParameterSpace(List.of(
                ParameterRange.linear("index.minNormalisedScore", 0.1, 0.6, 6),
                ParameterRange.integers("index.consistencyQueries", 0, 4),
                ParameterRange.integers("verification.minInliers", 10, 40),
                ParameterRange.linear("verification.minInlierRatio", 0.15, 0.5, 8)));
    }

    @Override
    public Integer call() {
        ScanConfig base = ConfigFile.read(scanDir.resolve(ScanOutputs.CONFIG));
        TraceFile.Contents traces = TraceFile.read(scanDir.resolve(ScanOutputs.TRACES));
        Path vocabPath = vocabulary != null ? vocabulary : ProjectHome.defaultVocabulary();
        Optional<CameraModel> cam = Optional.ofNullable(camera).map(CameraFile::read);
        Replay replay = new Replay(FrameCache.readRecords(scanDir.resolve(ScanOutputs.CHECKPOINT)),
                VocabularyFile.read(vocabPath), cam, 10);
        var timeline = ScanOutcomes.timeline(traces.traces(), traces.sequenceNames());
        RevisitLabels truth = labels.load(timeline, base);
        SweepConfig sweep = SweepConfig.defaults().withMode(grid ? SweepConfig.Mode.GRID : SweepConfig.Mode.RANDOM)
                .withSamples(trials).withMaxTrials(trials).withSeed(seed).withTargetPrecision(targetPrecision)
                .withFrameTolerance(labels.frameTolerance);
        java.util.function.Function<ParameterSetting, List<QueryOutcome>> run = s -> {
            ScanResult r = replay.run(apply(base, s, 0));
            return ScanOutcomes.outcomes(r.traces(), traces.sequenceNames());
        };
        TunedSetting[] chosen = new TunedSetting[1];
        TuningResult tuning;
        var o = spec.commandLine().getOut();
        if (tuneOn.isEmpty()) {
            tuning = Tuner.tune(space(), sweep, run, truth, t -> chosen[0] = t);
        } else {
            HeldOutResult held = Tuner.tuneAndTest(space(), sweep, run, truth, new LinkedHashSet<>(tuneOn),
                    t -> chosen[0] = t);
            tuning = held.tuning();
            o.println("held-out sequences, at the tuned setting:");
            EvaluateCommand.print(o, held.heldOut());
        }
        double threshold = chosen[0].acceptanceThreshold();
        ScanConfig tuned = apply(base, chosen[0].setting(), Double.isFinite(threshold) ? Math.max(0, threshold) : 1e9);
        ConfigFile.write(out, tuned, String.format(Locale.ROOT, "written by revisit tune over %s: %d trials, "
                + "target precision %.3f; chosen %s, score threshold %.4f", scanDir, tuning.trials().size(),
                targetPrecision, chosen[0].setting(), threshold));
        o.printf(Locale.ROOT, "trials %d over %d frames (%d verifications computed once and reused)%n",
                tuning.trials().size(), replay.size(), replay.verificationsComputed());
        o.printf(Locale.ROOT, "chosen %s, score threshold %.4f%n", chosen[0].setting(), threshold);
        if (!Double.isFinite(threshold)) {
            o.println("no setting reached the target precision: the written config reports nothing; relax "
                    + "--target-precision or check the labels");
        }
        EvaluateCommand.print(o, tuning.bestEvaluation());
        o.println("config: " + out.toAbsolutePath().normalize());
        if (report != null) {
            Path index = HtmlReport.write(report, ReportInput.of("Revisit tuning: " + scanDir,
                    tuning.bestEvaluation(), truth).withTuning(tuning));
            o.println("report: " + index.toAbsolutePath().normalize());
        }
        return 0;
    }

    static ScanConfig apply(ScanConfig base, ParameterSetting s, double minScore) {
        List<String> sets = new ArrayList<>();
        s.values().forEach((name, v) -> sets.add(name + "=" + (v == Math.rint(v) && !name.contains("Ratio")
                && !name.contains("Score") ? String.valueOf((long) (double) v) : String.valueOf(v))));
        ScanConfig c = ConfigFile.override(base, sets);
        return c.withScan(c.scan().withMinScore(minScore));
    }

}
