package revisit.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import revisit.camera.CameraFile;
import revisit.camera.CameraModel;
import revisit.io.BadFramePolicy;
import revisit.io.BadInputException;
import revisit.io.FrameSourceOptions;
import revisit.pipeline.ConfigFile;
import revisit.pipeline.ScanConfig;
import revisit.pipeline.ScanOutputs;
import revisit.pipeline.ScanResult;
import revisit.pipeline.Scanner;
import revisit.pipeline.SequenceInput;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;

/** {@code revisit scan}: the main job. */
@Command(name = "scan", mixinStandardHelpOptions = true,
        description = "Scan one or more sequences (image folders, frame lists, videos) for revisits and write "
                + "verified closures (JSON Lines, CSV, pose-graph edges) into the output folder.")
final class ScanCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "INPUT", description = "Image folder, frame-list file or video; "
            + "several are scanned in order and matched against each other.")
    List<Path> inputs = new ArrayList<>();

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "DIR", description = "Output folder.")
    Path out;

    @Option(names = "--vocabulary", paramLabel = "FILE", description = "Vocabulary file (default: the shipped "
            + ProjectHome.DEFAULT_VOCABULARY + ").")
    Path vocabulary;

    @Option(names = "--camera", paramLabel = "FILE", description = "Camera file (docs/FORMAT-camera.md); enables "
            + "relative poses.")
    Path camera;

    @Option(names = "--config", paramLabel = "FILE", description = "Configuration file, e.g. one written by tune.")
    Path config;

    @Option(names = "--set", paramLabel = "SECTION.FIELD=VALUE", description = "Override one setting, e.g. "
            + "--set index.exclusionSeconds=10 (repeatable).")
    List<String> overrides = new ArrayList<>();

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads, 0 = all cores.")
    Integer threads;

    @Option(names = "--stride", defaultValue = "1", paramLabel = "N", description = "Use every N-th frame.")
    int stride;

    @Option(names = "--max-frames", defaultValue = "2147483647", paramLabel = "N",
            description = "Stop each sequence after N frames.")
    int maxFrames;

    @Option(names = "--bad-frames", paramLabel = "skip|stop", description = "On an unreadable frame: skip it "
            + "(default) or stop, keeping what was found.")
    String badFrames;

    @Option(names = "--odometry", paramLabel = "FILE", description = "Odometry trajectory of a sequence for the "
            + "consistency check, one per sequence in input order (repeatable; docs/FORMAT-trajectory.md).")
    List<Path> odometry = new ArrayList<>();

    @Option(names = "--depth", paramLabel = "DIR", description = "Folder of 16-bit depth images registered to a "
            + "sequence's frames (n-th image = frame n), one per sequence in input order (repeatable); with --camera "
            + "it makes closures metric.")
    List<Path> depth = new ArrayList<>();

    @Option(names = "--depth-unit", defaultValue = "0.001", paramLabel = "METRES",
            description = "Metres per depth unit (default ${DEFAULT-VALUE}, millimetres).")
    double depthUnit;

    @Option(names = "--keep-rejected", description = "Also list candidates that failed verification.")
    boolean keepRejected;

    @Option(names = "--include-unchecked", description = "Also write closures the consistency check could not "
            + "corroborate (no partner closure, no odometry) to the edge file; by default only trusted ones go there.")
    boolean includeUnchecked;

    @Option(names = "--fresh", description = "Ignore an existing checkpoint in the output folder.")
    boolean fresh;

    @Option(names = "--quiet", description = "No progress bar.")
    boolean quiet;

    @Option(names = "--verbose", description = "Stack traces with errors.")
    boolean verbose;

    @Override
    public Integer call() {
        ScanConfig cfg = effectiveConfig();
        Path vocabPath = vocabulary != null ? vocabulary : ProjectHome.defaultVocabulary();
        if (!Files.exists(vocabPath)) {
            throw new BadInputException(vocabPath + ": vocabulary not found; pass --vocabulary FILE or train one"
                    + " with 'revisit vocab-train'");
        }
        Vocabulary vocab = VocabularyFile.read(vocabPath);
        Optional<CameraModel> cam = Optional.ofNullable(camera).map(CameraFile::read);
        for (Path in : inputs) {
            if (!Files.exists(in)) {
                throw new BadInputException(in + ": input not found; give an image folder, a frame list or a video");
            }
        }
        Path checkpoint = out.resolve(ScanOutputs.CHECKPOINT);
        if (fresh) {
            deleteCheckpoint(checkpoint);
        }
        FrameSourceOptions so = FrameSourceOptions.defaults().withStride(stride).withMaxFrames(maxFrames);
        List<SequenceInput> sequences = SequenceInput.ofAll(inputs);
        Scanner scanner = new Scanner(cfg, vocab, cam, Scanner.Options.defaults().withKeepRejected(keepRejected)
                .withCheckpoint(checkpoint).withSourceOptions(so).withOdometry(odometryBySequence(sequences))
                .withDepth(depthBySequence(sequences, cam.isPresent()), depthUnit));
        ScanResult result;
        try (ScanProgress progress = new ScanProgress(!quiet, spec.commandLine().getErr())) {
            result = scanner.run(sequences, progress);
        }
        ScanOutputs.write(out, result, cfg, includeUnchecked);
        var o = spec.commandLine().getOut();
        o.print(ScanOutputs.summary(result));
        o.println("outputs: " + out.resolve(ScanOutputs.JSONL) + ", " + ScanOutputs.CSV + ", " + ScanOutputs.EDGES);
        o.flush();
        if (!result.stoppedEarly().isEmpty()) {
            throw new BadInputException("stopped at a bad frame (--bad-frames stop); results so far are written: "
                    + result.stoppedEarly());
        }
        return 0;
    }

    private ScanConfig effectiveConfig() {
        ScanConfig cfg = config != null ? ConfigFile.read(config) : ScanConfig.defaults();
        cfg = ConfigFile.override(cfg, overrides);
        if (threads != null) {
            cfg = cfg.withScan(cfg.scan().withThreads(threads));
        }
        if (badFrames != null) {
            BadFramePolicy p = switch (badFrames.toLowerCase(java.util.Locale.ROOT)) {
                case "skip" -> BadFramePolicy.SKIP;
                case "stop" -> BadFramePolicy.STOP;
                default -> throw new BadInputException("--bad-frames " + badFrames + ": expected skip or stop");
            };
            cfg = cfg.withScan(cfg.scan().withBadFrames(p));
        }
        return cfg;
    }

    private java.util.Map<String, List<revisit.io.StampedPose>> odometryBySequence(List<SequenceInput> sequences) {
        if (odometry.isEmpty()) {
            return java.util.Map.of();
        }
        if (odometry.size() != sequences.size()) {
            throw new BadInputException("--odometry: " + odometry.size() + " trajectories for " + sequences.size()
                    + " inputs; give one per input, in the same order");
        }
        java.util.Map<String, List<revisit.io.StampedPose>> map = new java.util.HashMap<>();
        for (int i = 0; i < sequences.size(); i++) {
            map.put(sequences.get(i).name(), revisit.io.TrajectoryFile.read(odometry.get(i)));
        }
        return map;
    }

    private java.util.Map<String, Path> depthBySequence(List<SequenceInput> sequences, boolean calibrated) {
        if (depth.isEmpty()) {
            return java.util.Map.of();
        }
        if (!calibrated) {
            throw new BadInputException("--depth needs --camera: metric poses need the calibration of the frames");
        }
        if (depth.size() != sequences.size()) {
            throw new BadInputException("--depth: " + depth.size() + " folders for " + sequences.size()
                    + " inputs; give one per input, in the same order");
        }
        java.util.Map<String, Path> map = new java.util.HashMap<>();
        for (int i = 0; i < sequences.size(); i++) {
            map.put(sequences.get(i).name(), depth.get(i));
        }
        return map;
    }

    private static void deleteCheckpoint(Path checkpoint) {
        try {
            Files.deleteIfExists(checkpoint);
        } catch (java.io.IOException e) {
            throw new BadInputException(checkpoint + ": cannot delete old checkpoint (" + e.getMessage() + ")", e);
        }
    }
}
