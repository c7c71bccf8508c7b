package revisit.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import revisit.camera.CameraFile;
import revisit.camera.CameraModel;
import revisit.evaluation.BenchFrame;
import revisit.evaluation.ExclusionWindow;
import revisit.evaluation.FrameKey;
import revisit.evaluation.MatcherComparison;
import revisit.evaluation.PoseLabelConfig;
import revisit.evaluation.PoseLabels;
import revisit.evaluation.RevisitLabels;
import revisit.evaluation.TrustedRecall;
import revisit.evaluation.VerificationCeiling;
import revisit.io.BadInputException;
import revisit.io.FrameSourceOptions;
import revisit.io.StampedPose;
import revisit.io.TrajectoryFile;
import revisit.pipeline.Closure;
import revisit.pipeline.ConfigFile;
import revisit.pipeline.ScanConfig;
import revisit.pipeline.ScanListener;
import revisit.pipeline.ScanResult;
import revisit.pipeline.Scanner;
import revisit.pipeline.SequenceInput;
import revisit.scenario.DriftingOdometry;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;

/**
 * {@code revisit bench}: side-by-side measurements on a generated scenario: per-stage scan times at 2 and 1
 * threads, the scan's recall and verification cost against exhaustive pairwise verification, and node-restricted
 * against brute-force matching.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Measure the scan on a generated scenario: stage times, recall and cost against exhaustive "
                + "pairwise verification, node-restricted against brute-force matching.")
final class BenchCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--scenario", paramLabel = "DIR", description = "Folder written by make-scenario (default: "
            + "generate the small preset into a temporary folder, deleted afterwards).")
    Path scenario;

    @Option(names = "--vocabulary", paramLabel = "FILE", description = "Vocabulary file (default: the shipped "
            + ProjectHome.DEFAULT_VOCABULARY + ").")
    Path vocabulary;

    @Option(names = "--stride", defaultValue = "4", paramLabel = "N",
            description = "Frame stride of the exhaustive comparison (default: ${DEFAULT-VALUE}).")
    int stride;

    @Option(names = "--frames", defaultValue = "2147483647", paramLabel = "N",
            description = "Use at most N frames of each session (after the stride).")
    int frames;

    @Option(names = "--max-distance", split = ",", defaultValue = "5," + DemoCommand.MAX_DISTANCE_M,
            paramLabel = "M", description = "Label rules: camera centres within M metres, one rule per value, paired "
            + "with --max-angle (default: a stricter one and the demo's, ${DEFAULT-VALUE}).")
    List<Double> maxDistance;

    @Option(names = "--max-angle", split = ",", defaultValue = "50," + DemoCommand.MAX_ANGLE_DEG,
            paramLabel = "DEG", description = "Label rules: viewing directions within DEG degrees, paired with "
            + "--max-distance (default: ${DEFAULT-VALUE}).")
    List<Double> maxAngle;

    @Option(names = "--set", paramLabel = "SECTION.FIELD=VALUE", description = "Override one scan setting for "
            + "every measurement, e.g. index.consistencyQueries=1 (repeatable; docs/FORMAT-config.md).")
    List<String> overrides = new ArrayList<>();

    @Option(names = "--timing-only", description = "Only the stage times (warm-up, 2 and 1 threads); skip the "
            + "exhaustive comparison, which takes minutes.")
    boolean timingOnly;

    @Option(names = "--verbose", description = "Stack traces with errors.")
    boolean verbose;

    /** Frames of the first session scanned once, unreported, so the timed runs do not pay JIT compilation. */
    static final int WARM_UP_FRAMES = 300;

    @Override
    public Integer call() {
        if (stride < 1 || frames < 1) {
            throw new BadInputException("--stride and --frames must be at least 1");
        }
        if (maxDistance.size() != maxAngle.size()) {
            throw new BadInputException("--max-distance and --max-angle: give as many values of one as of the other");
        }
        if (scenario != null) {
            return measure(scenario);
        }
        try (BenchScenario temp = BenchScenario.generateSmall(spec.commandLine().getErr())) {
            return measure(temp.folder());
        }
    }

    private int measure(Path folder) {
        if (!Files.exists(folder.resolve("manifest.json"))) {
            throw new BadInputException(folder + ": no manifest.json; give a folder made by 'revisit make-scenario'");
        }
        Path vocabPath = vocabulary != null ? vocabulary : ProjectHome.defaultVocabulary();
        if (!Files.exists(vocabPath)) {
            throw new BadInputException(vocabPath + ": vocabulary not found; pass --vocabulary FILE");
        }
        Vocabulary vocab = VocabularyFile.read(vocabPath);
        Optional<CameraModel> cam = Optional.of(CameraFile.read(folder.resolve("camera.json")));
        List<SequenceInput> sessions = sessions(folder);
        ScanConfig cfg = ConfigFile.override(ScanConfig.defaults(), overrides);
        PrintWriter o = spec.commandLine().getOut();
        BenchTables.header(o, folder, vocabPath, sessions);
        FrameSourceOptions all = FrameSourceOptions.defaults().withMaxFrames(frames);
        new Scanner(cfg, vocab, cam, Scanner.Options.defaults().withSourceOptions(FrameSourceOptions.defaults()
                .withMaxFrames(Math.min(frames, WARM_UP_FRAMES)))).run(sessions.subList(0, 1), ScanListener.silent());
        for (int threads : new int[] {2, 1}) {
            long t0 = System.nanoTime();
            ScanResult r = new Scanner(cfg.withScan(cfg.scan().withThreads(threads)), vocab, cam,
                    Scanner.Options.defaults().withSourceOptions(all)).run(sessions, ScanListener.silent());
            BenchTables.stages(o, threads, r, System.nanoTime() - t0);
        }
        if (timingOnly) {
            return 0;
        }
        compareWithCeiling(o, folder, sessions, cfg, vocab, cam);
        return 0;
    }

    private void compareWithCeiling(PrintWriter o, Path folder, List<SequenceInput> sessions, ScanConfig cfg,
                                    Vocabulary vocab, Optional<CameraModel> cam) {
        FrameSourceOptions thin = FrameSourceOptions.defaults().withStride(stride).withMaxFrames(frames)
                .withFrameRateHz(cfg.scan().frameRateHz());
        Map<String, List<StampedPose>> poses = new LinkedHashMap<>();
        Map<String, List<StampedPose>> odometry = new LinkedHashMap<>();
        for (SequenceInput s : sessions) {
            List<StampedPose> truth = TrajectoryFile.read(folder.resolve(s.name()).resolve("poses.txt"));
            poses.put(s.name(), truth);
            // The demo's drift: 1 % step-length error and 0.1 degree per step (common practice).
            odometry.put(s.name(), DriftingOdometry.simulate(truth, 0.01, Math.toRadians(0.1), 7 + s.name().hashCode()));
        }
        ScanResult ours = new Scanner(cfg, vocab, cam, Scanner.Options.defaults().withKeepRejected(true)
                .withSourceOptions(thin).withOdometry(odometry)).run(sessions, ScanListener.silent());
        List<BenchFrame> thinned = new ArrayList<>();
        for (SequenceInput s : sessions) {
            thinned.addAll(BenchFrame.read(s.path(), s.name(), thin, cfg.features(), vocab,
                    cfg.scan().matchingNodeLevel()));
        }
        ExclusionWindow window = new ExclusionWindow(cfg.index().exclusionSeconds(), cfg.index().exclusionFrames());
        List<BenchFrame[]> pairs = VerificationCeiling.allowedPairs(thinned, window);
        VerificationCeiling.Result ceiling = VerificationCeiling.run(pairs, cfg.verification(), cam, 2);
        List<String> names = sessions.stream().map(SequenceInput::name).toList();
        MatcherComparison.Result matching = MatcherComparison.run(verifiedPairs(ours.closures(), names, thinned),
                cfg.verification(), cam);
        BenchTables.cost(o, thinned.size(), stride, ours, matching, ceiling);
        BenchTables.recallHeader(o);
        for (int i = 0; i < maxDistance.size(); i++) {
            RevisitLabels labels = PoseLabels.derive(poses, PoseLabelConfig.defaults()
                    .withMaxDistance(maxDistance.get(i)).withMaxViewAngleDegrees(maxAngle.get(i)).withWindow(window));
            BenchTables.recall(o, maxDistance.get(i), maxAngle.get(i), ceiling, labels,
                    TrustedRecall.of(ours.closures(), names, labels));
        }
        BenchTables.matchers(o, matching);
    }

    /** The pairs the scan verified (accepted or rejected), as prepared frames. */
    private static List<BenchFrame[]> verifiedPairs(List<Closure> closures, List<String> names,
                                                    List<BenchFrame> frames) {
        Map<FrameKey, BenchFrame> byKey = new LinkedHashMap<>();
        frames.forEach(f -> byKey.put(f.key(), f));
        List<BenchFrame[]> out = new ArrayList<>();
        for (Closure c : closures) {
            BenchFrame q = byKey.get(new FrameKey(names.get(c.querySequence()), c.queryFrame()));
            BenchFrame m = byKey.get(new FrameKey(names.get(c.matchSequence()), c.matchFrame()));
            if (q == null || m == null) {
                throw new IllegalStateException("scan and benchmark read different frames: " + c);
            }
            out.add(new BenchFrame[] {q, m});
        }
        return out;
    }

    /** session1 and, when present, session2 of the scenario, read through their frame lists. */
    private static List<SequenceInput> sessions(Path folder) {
        List<SequenceInput> out = new ArrayList<>();
        for (String name : List.of("session1", "session2")) {
            Path list = folder.resolve(name).resolve("frames.txt");
            if (Files.exists(list)) {
                out.add(new SequenceInput(list, name));
            }
        }
        if (out.isEmpty()) {
            throw new BadInputException(folder + ": no session1/frames.txt; give a folder made by 'revisit make-scenario'");
        }
        return out;
    }
}
