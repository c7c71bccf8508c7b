package revisit.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import revisit.evaluation.EvaluationConfig;
import revisit.evaluation.EvaluationResult;
import revisit.evaluation.Evaluator;
import revisit.evaluation.ExclusionWindow;
import revisit.evaluation.FrameTimeline;
import revisit.evaluation.HtmlReport;
import revisit.evaluation.IndexWindows;
import revisit.evaluation.MissReason;
import revisit.evaluation.PairsFile;
import revisit.evaluation.PoseAlignment;
import revisit.evaluation.PoseLabelConfig;
import revisit.evaluation.PoseLabels;
import revisit.evaluation.ReportInput;
import revisit.evaluation.RevisitLabels;
import revisit.evaluation.ScanOutcomes;
import revisit.evaluation.ScanReportPairs;
import revisit.io.BadInputException;
import revisit.io.StampedPose;
import revisit.io.TrajectoryFile;
import revisit.pipeline.ConfigFile;
import revisit.pipeline.ScanConfig;
import revisit.pipeline.ScanOutputs;
import revisit.pipeline.TraceFile;

/** {@code revisit evaluate}: precision/recall of a finished scan against labelled revisits. */
@Command(name = "evaluate", mixinStandardHelpOptions = true,
        description = "Compare a scan's detections with labelled revisits (a pairs file or ground-truth poses) and "
                + "print precision/recall; optionally write an HTML report with plots.")
final class EvaluateCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCAN_DIR", description = "Output folder of revisit scan.")
    Path scanDir;

    @ArgGroup(exclusive = true, multiplicity = "1")
    LabelSource labels;

    static final class LabelSource {
        @Option(names = "--pairs", paramLabel = "FILE", description = "Revisit pairs file (docs/FORMAT-labels.md).")
        Path pairs;

        @Option(names = "--poses", paramLabel = "FILE", description = "Ground-truth trajectory, one per sequence in "
                + "scan order (repeat the option).")
        List<Path> poses;
    }

    @Option(names = "--max-distance", defaultValue = "1.0", paramLabel = "D",
            description = "With --poses: camera centres closer than this are a revisit (trajectory units).")
    double maxDistance;

    @Option(names = "--max-angle", defaultValue = "0", paramLabel = "DEG",
            description = "With --poses: also require viewing directions within this angle (0 = no limit).")
    double maxAngleDeg;

    @Option(names = "--frame-tolerance", defaultValue = "0", paramLabel = "N",
            description = "A detection within N frames of a labelled match counts as true.")
    int frameTolerance;

    @Option(names = "--threshold", defaultValue = "0", paramLabel = "T",
            description = "Acceptance threshold on the normalised score for the headline counts.")
    double threshold;

    @Option(names = "--report", paramLabel = "DIR", description = "Write an HTML report with plots here.")
    Path report;

    @Option(names = "--verbose", description = "Stack traces with errors.")
    boolean verbose;

    @Override
    public Integer call() {
        TraceFile.Contents traces = TraceFile.read(scanDir.resolve(ScanOutputs.TRACES));
        ScanConfig config = ConfigFile.read(scanDir.resolve(ScanOutputs.CONFIG));
        FrameTimeline timeline = ScanOutcomes.timeline(traces.traces(), traces.sequenceNames());
        ExclusionWindow window = IndexWindows.of(config.index());
        List<StampedPose> firstPoses = new ArrayList<>();
        RevisitLabels truth = labels.pairs != null ? PairsFile.read(labels.pairs, timeline, window)
                : fromPoses(timeline, window, firstPoses);
        EvaluationResult result = Evaluator.evaluate(ScanOutcomes.outcomes(traces.traces(), traces.sequenceNames()),
                truth, EvaluationConfig.defaults().withFrameTolerance(frameTolerance)
                        .withAcceptanceThreshold(threshold));
        print(spec.commandLine().getOut(), result);
        if (report != null) {
            ReportInput input = ReportInput.of("Revisit evaluation: " + scanDir.toAbsolutePath().normalize(),
                    result, truth).withPairs(ScanReportPairs.pairs(scanDir, result, 12));
            if (!firstPoses.isEmpty()) {
                input = input.withPoses(firstPoses);
            }
            Path index = HtmlReport.write(report, input);
            spec.commandLine().getOut().println("report: " + index.toAbsolutePath().normalize());
        }
        return 0;
    }

    private RevisitLabels fromPoses(FrameTimeline timeline, ExclusionWindow window, List<StampedPose> firstPoses) {
        if (labels.poses.size() != timeline.sequences().size()) {
            throw new BadInputException("--poses: " + labels.poses.size() + " trajectories given for "
                    + timeline.sequences().size() + " scanned sequences; give one per sequence in scan order");
        }
        Map<String, List<StampedPose>> bySeq = new LinkedHashMap<>();
        for (int s = 0; s < labels.poses.size(); s++) {
            var frames = timeline.sequences().get(s);
            List<StampedPose> aligned = PoseAlignment.align(TrajectoryFile.read(labels.poses.get(s)), frames,
                    labels.poses.get(s));
            bySeq.put(frames.sequenceId(), aligned);
            if (s == 0) {
                firstPoses.addAll(aligned);
            }
        }
        PoseLabelConfig cfg = PoseLabelConfig.defaults().withMaxDistance(maxDistance)
                .withMaxViewAngleDegrees(maxAngleDeg).withWindow(window);
        return PoseLabels.derive(bySeq, cfg);
    }

    static void print(PrintWriter out, EvaluationResult r) {
        out.printf(Locale.ROOT, "queries %d, labelled revisit queries %d%n", r.queries(), r.positives());
        out.printf(Locale.ROOT, "recall at 100%% precision  %.3f  (threshold %.3f)%n", r.atFullPrecision().recall(),
                r.atFullPrecision().threshold());
        out.printf(Locale.ROOT, "recall at 95%% precision   %.3f%n", r.at95Precision().recall());
        out.printf(Locale.ROOT, "average precision          %.3f%n", r.averagePrecision());
        var p = r.atThreshold();
        out.printf(Locale.ROOT, "at threshold %.3f: precision %.3f recall %.3f F1 %.3f (%d true, %d false, %d missed)%n",
                p.threshold(), p.precision(), p.recall(), p.f1(), p.truePositives(), p.falsePositives(),
                p.falseNegatives());
        for (MissReason m : MissReason.values()) {
            out.printf(Locale.ROOT, "  missed: %-16s %d%n", m.name().toLowerCase(Locale.ROOT),
                    r.missReasons().get(m));
        }
        out.flush();
    }
}
