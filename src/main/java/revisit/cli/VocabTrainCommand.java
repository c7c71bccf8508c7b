package revisit.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import revisit.features.FeatureConfig;
import revisit.io.BadFrameException;
import revisit.io.FrameSource;
import revisit.io.FrameSourceOptions;
import revisit.io.FrameSources;
import revisit.vocabulary.TrainingFrames;
import revisit.vocabulary.TrainingOrigin;
import revisit.vocabulary.TrainingSet;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyFile;
import revisit.vocabulary.VocabularyTrainer;
import revisit.vocabulary.VocabularySummary;

/** {@code revisit vocab-train}: trains a vocabulary on image folders, frame lists and videos. */
@Command(name = "vocab-train", mixinStandardHelpOptions = true,
        description = "Trains a visual vocabulary (hierarchical k-means on the frames' binary descriptors, idf "
                + "weights) and writes it to a file.")
final class VocabTrainCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "INPUT", description = "Image folders, frame lists or videos.")
    private List<Path> inputs;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "FILE", description = "Vocabulary to write.")
    private Path out;

    @Option(names = "--branching", paramLabel = "K", description = "Children per node (default ${DEFAULT-VALUE}).")
    private int branching = VocabularyConfig.defaults().branching();

    @Option(names = "--depth", paramLabel = "L", description = "Tree levels (default ${DEFAULT-VALUE}).")
    private int depth = VocabularyConfig.defaults().depth();

    @Option(names = "--iterations", paramLabel = "N",
            description = "k-means iterations per node at most (default ${DEFAULT-VALUE}).")
    private int iterations = VocabularyConfig.defaults().maxIterations();

    @Option(names = "--seed", description = "Seed of the k-means++ seeding (default ${DEFAULT-VALUE}).")
    private long seed = VocabularyConfig.defaults().seed();

    @Option(names = "--threads",
            description = "Threads for feature extraction and training (default: all processors, ${DEFAULT-VALUE}).")
    private int threads = VocabularyConfig.defaults().threads();

    @Option(names = "--video-step", paramLabel = "N",
            description = "Use every N-th frame of a video; folders and frame lists are used whole "
                    + "(default ${DEFAULT-VALUE}).")
    private int videoStep = 15;

    @Option(names = "--max-descriptors", paramLabel = "N",
            description = "Stop reading frames once this many descriptors are collected (default ${DEFAULT-VALUE}).")
    private int maxDescriptors = 5_000_000;

    @Option(names = "--quiet", description = "No progress bars.")
    private boolean quiet;

    @Option(names = "--verbose", description = "Show stack traces of errors.")
    private boolean verbose;

    @Override
    public Integer call() {
        VocabularyConfig config = config();
        FeatureConfig features = FeatureConfig.defaults();
        TrainingSet.Builder set = new TrainingSet.Builder();
        List<String> sources = new ArrayList<>();
        try (TrainingFrames extraction = new TrainingFrames(features, config.threads())) {
            for (Path input : inputs) {
                sources.add(set.count() >= maxDescriptors
                        ? input + " (not read: --max-descriptors " + maxDescriptors + " reached)"
                        : collect(input, extraction, set));
            }
        }
        TrainingOrigin origin = new TrainingOrigin(descriptorKind(features), sources,
                "revisit " + String.join(" ", spec.commandLine().getParseResult().originalArgs()),
                Instant.now());
        Vocabulary vocabulary;
        try (ProgressDisplay bar = ProgressDisplay.open("training", !quiet)) {
            vocabulary = new VocabularyTrainer(config).train(set.build(), origin, bar);
        }
        VocabularyFile.write(out, vocabulary);
        VocabInfoCommand.print(spec.commandLine().getOut(), out, sizeOf(out), VocabularySummary.of(vocabulary));
        return 0;
    }

    private VocabularyConfig config() {
        if (videoStep < 1 || maxDescriptors < 2) {
            throw new ParameterException(spec.commandLine(), "--video-step must be >= 1 and --max-descriptors >= 2");
        }
        try {
            return new VocabularyConfig(branching, depth, iterations, seed, threads);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage(), e);
        }
    }

    /** Adds the descriptors of every usable frame of {@code input}; returns the provenance line. */
    private String collect(Path input, TrainingFrames extraction, TrainingSet.Builder set) {
        boolean video = FrameSources.VIDEO_EXTENSIONS.contains(extension(input));
        FrameSourceOptions options = FrameSourceOptions.defaults().withStride(video ? videoStep : 1);
        TrainingFrames.Collected got;
        try (FrameSource source = FrameSources.open(input, options);
             ProgressDisplay bar = ProgressDisplay.open(input.getFileName().toString(), !quiet)) {
            bar.maxHint(source.frameCount().orElse(-1));
            got = extraction.collect(source, set, maxDescriptors, new TrainingFrames.Listener() {
                @Override
                public void frameAdded(int frames) {
                    bar.stepTo(frames);
                }

                @Override
                public void frameSkipped(BadFrameException problem) {
                    spec.commandLine().getErr().println("revisit: skipped " + problem.getMessage());
                }
            });
        }
        return String.format(Locale.ROOT, "%s (%d frames%s, %d descriptors%s)", input, got.frames(),
                video && videoStep > 1 ? ", every " + ordinal(videoStep) : "", got.descriptors(),
                got.badFrames() > 0 ? ", " + got.badFrames() + " unreadable frames skipped" : "");
    }

    /** 2 -> "2nd", 5 -> "5th", 11 -> "11th", 21 -> "21st". */
    static String ordinal(int n) {
        int lastTwo = n % 100;
        int last = n % 10;
        String suffix = lastTwo >= 11 && lastTwo <= 13 ? "th"
                : last == 1 ? "st" : last == 2 ? "nd" : last == 3 ? "rd" : "th";
        return n + suffix;
    }

    static String descriptorKind(FeatureConfig f) {
        return String.format(Locale.ROOT, "revisit steered BRIEF 256 bits, pattern seed 0x%X, %d angle bins, blur "
                + "sigma %.2f px", f.patternSeed(), f.angleBins(), f.blurSigma());
    }

    private static String extension(Path p) {
        String name = p.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot < 0 ? "" : name.substring(dot + 1).toLowerCase(Locale.ROOT);
    }

    private static long sizeOf(Path p) {
        try {
            return Files.size(p);
        } catch (IOException e) {
            throw new UncheckedIOException(p + ": written but cannot be read back (" + e.getMessage() + ")",
                    e);
        }
    }
}
