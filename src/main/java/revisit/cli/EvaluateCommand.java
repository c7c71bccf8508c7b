package revisit.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import revisit.evaluation.EvaluationConfig;
import revisit.evaluation.EvaluationResult;
import revisit.evaluation.Evaluator;
import revisit.evaluation.FrameTimeline;
import revisit.evaluation.HtmlReport;
import revisit.evaluation.MissReason;
import revisit.evaluation.ReportInput;
import revisit.evaluation.RevisitLabels;
import revisit.evaluation.ScanOutcomes;
import revisit.evaluation.ScanReportPairs;
import revisit.evaluation.ScanSimilarity;
import revisit.index.WordWeights;
import revisit.pipeline.ConfigFile;
import revisit.pipeline.FrameCache;
import revisit.pipeline.ScanConfig;
import revisit.pipeline.ScanOutputs;
import revisit.pipeline.TraceFile;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;

/** {@code revisit evaluate}: precision/recall of a finished scan against labelled revisits. */
@Command(name = "evaluate", mixinStandardHelpOptions = true,
        description = "Compare a scan's detections with labelled revisits (a pairs file or ground-truth poses) and "
                + "print precision/recall; optionally write an HTML report with plots.")
final class EvaluateCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SCAN_DIR", description = "Output folder of revisit scan.")
    Path scanDir;

    @Mixin
    LabelOptions labels;

    @Option(names = "--threshold", defaultValue = "0", paramLabel = "T",
            description = "Acceptance threshold on the normalised score for the headline counts.")
    double threshold;

    @Option(names = "--report", paramLabel = "DIR", description = "Write an HTML report with plots here.")
    Path report;

    @Option(names = "--vocabulary", paramLabel = "FILE", description = "The vocabulary the scan used, for the "
            + "report's similarity map (default: the shipped one).")
    Path vocabulary;

    @Option(names = "--verbose", description = "Stack traces with errors.")
    boolean verbose;

    @Override
    public Integer call() {
        TraceFile.Contents traces = TraceFile.read(scanDir.resolve(ScanOutputs.TRACES));
        ScanConfig config = ConfigFile.read(scanDir.resolve(ScanOutputs.CONFIG));
        FrameTimeline timeline = ScanOutcomes.timeline(traces.traces(), traces.sequenceNames());
        RevisitLabels truth = labels.load(timeline, config);
        EvaluationResult result = Evaluator.evaluate(ScanOutcomes.outcomes(traces.traces(), traces.sequenceNames()),
                truth, EvaluationConfig.defaults().withFrameTolerance(labels.frameTolerance)
                        .withAcceptanceThreshold(threshold));
        print(spec.commandLine().getOut(), result);
        if (report != null) {
            ReportInput input = ReportInput.of("Revisit evaluation: " + scanDir.toAbsolutePath().normalize(),
                    result, truth).withPairs(ScanReportPairs.pairs(scanDir, result, 12));
            if (!labels.allPoses.isEmpty()) {
                input = input.withPoses(labels.allPoses);
            }
            Path checkpoint = scanDir.resolve(ScanOutputs.CHECKPOINT);
            if (Files.exists(checkpoint)) {
                Path vocabPath = vocabulary != null ? vocabulary : ProjectHome.defaultVocabulary();
                Vocabulary vocab = VocabularyFile.read(vocabPath);
                input = input.withSimilarity(ScanSimilarity.of(FrameCache.readRecords(checkpoint),
                        traces.sequenceNames(), timeline, new WordWeights(vocab.wordCount(), vocab.weights()),
                        config.index().scoreNorm(), ScanSimilarity.DEFAULT_MAX_FRAMES, 256));
            }
            Path index = HtmlReport.write(report, input);
            spec.commandLine().getOut().println("report: " + index.toAbsolutePath().normalize());
        }
        return 0;
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
