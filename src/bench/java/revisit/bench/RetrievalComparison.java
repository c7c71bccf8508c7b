package revisit.bench;

import boofcv.concurrency.BoofConcurrency;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import revisit.evaluation.ExclusionWindow;
import revisit.evaluation.IndexWindows;
import revisit.evaluation.RevisitLabels;
import revisit.index.IndexConfig;
import revisit.scenario.Scenario;
import revisit.scenario.ScenarioConfig;
import revisit.vocabulary.TrainingOrigin;
import revisit.vocabulary.TrainingProgress;
import revisit.vocabulary.TrainingSet;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyTrainer;

/**
 * Retrieval, ours ({@code revisit.index}) against BoofCV 1.1.7's vocabulary-tree scene recognition, on the same
 * training descriptors and the same frames:
 * <ol>
 *   <li>both vocabularies (k = 10, L = 5, our default shape) are trained on the descriptors our extractor finds in
 *   every frame of the small scenario preset generated with the training seed;</li>
 *   <li>top-1 / top-5 recall on the small preset with the test seed (7, the default), labels from its poses, the
 *   index's exclusion window (20 s) for both systems and the labels;</li>
 *   <li>add and query cost and retained memory at growing database sizes of synthetic frames drawn from the
 *   training descriptors ({@link DescriptorFrames}: 500 per frame, 8 bits flipped; revisits keep 70%).</li>
 * </ol>
 * Prints one Markdown table (metric, ours, BoofCV, ratio) and writes the latency plot.
 *
 * <p>Run: {@code mvn -B -o -Pbench -DskipTests package && java -Xmx6g -XX:+UseParallelGC
 * -Djol.magicFieldOffset=true -cp target/benchmarks.jar revisit.bench.RetrievalComparison
 * [--sizes 1000,10000,100000] [--boof-max-frames N] [--queries 200] [--rounds 3] [--plot docs/retrieval-latency.png]
 * [--train-seed 8] [--test-seed 7]}
 */
public final class RetrievalComparison {

    private static final int BRANCHING = 10;
    private static final int DEPTH = 5;
    private static final int PER_FRAME = 500;
    private static final int FLIP_BITS = 8;
    private static final double KEEP = 0.7;
    private static final long FRAME_SEED = 42L;

    private RetrievalComparison() {
    }

    public static void main(String[] args) throws IOException {
        Options o = Options.parse(args);
        BoofConcurrency.USE_CONCURRENT = true;
        long wall0 = System.nanoTime();
        System.out.println("load average at start: " + loadAverage());
        IndexConfig indexConfig = IndexConfig.defaults();
        Trained trained = train(o.trainSeed, indexConfig);
        List<ScenarioDescriptors.SceneFrame> test = ScenarioDescriptors.describe(
                Scenario.build(ScenarioConfig.small().withSeed(o.testSeed)));
        RetrievalRecall.Run ourRun = RetrievalRecall.scan(new OurRetrieval(trained.vocabulary, indexConfig, 2),
                test, 5);
        RetrievalRecall.Run boofRun = RetrievalRecall.scan(trained.boof, test, 5);
        trained.boof.clear();

        DescriptorFrames frames = new DescriptorFrames(trained.set.descriptors(), trained.set.count(), PER_FRAME,
                FLIP_BITS, FRAME_SEED);
        List<RetrievalScale.Point> ours = RetrievalScale.run(new OurRetrieval(trained.vocabulary, indexConfig, 2),
                frames, o.sizes, o.queries, o.rounds, KEEP);
        System.gc();
        int[] boofSizes = Arrays.stream(o.sizes).filter(s -> s <= o.boofMaxFrames).toArray();
        List<RetrievalScale.Point> theirs = RetrievalScale.run(trained.boof, frames, boofSizes, o.queries, o.rounds,
                KEEP);

        RetrievalTable table = new RetrievalTable(System.out);
        table.row("training wall s", trained.ourClocks[0] / 1e9, trained.boofClocks[0] / 1e9, "%.1f");
        table.row("training process CPU s", trained.ourClocks[1] / 1e9, trained.boofClocks[1] / 1e9, "%.1f");
        recall(table, test, ourRun, boofRun, IndexWindows.of(indexConfig));
        table.scale(ours, theirs);
        List<RetrievalScale.Point> all = new ArrayList<>(ours);
        all.addAll(theirs);
        RetrievalPlot.write(o.plot, all);
        long[] end = clocks();
        System.out.printf(Locale.ROOT, "total wall %.1f s, process CPU %.1f s; load average at end: %s; plot: %s%n",
                (end[0] - wall0) / 1e9, end[1] / 1e9, loadAverage(), o.plot);
    }

    /** Both vocabularies trained on one set, and the wall and process CPU nanoseconds each training took. */
    private record Trained(TrainingSet set, Vocabulary vocabulary, BoofRetrieval boof, long[] ourClocks,
                           long[] boofClocks) {
    }

    private static Trained train(long seed, IndexConfig indexConfig) {
        List<ScenarioDescriptors.SceneFrame> training = ScenarioDescriptors.describe(
                Scenario.build(ScenarioConfig.small().withSeed(seed)));
        TrainingSet set = ScenarioDescriptors.trainingSet(training);
        System.out.printf(Locale.ROOT, "training: %d descriptors from %d frames (small preset, seed %d)%n",
                set.count(), set.imageCount(), seed);
        long[] t0 = clocks();
        Vocabulary vocabulary = new VocabularyTrainer(VocabularyConfig.defaults().withBranching(BRANCHING)
                .withDepth(DEPTH)).train(set, new TrainingOrigin("revisit steered BRIEF 256", List.of("scenario"),
                "RetrievalComparison", Instant.EPOCH), TrainingProgress.NONE);
        long[] t1 = clocks();
        BoofRetrieval boof = BoofRetrieval.train(set, BRANCHING, DEPTH, indexConfig.exclusionSeconds());
        long[] t2 = clocks();
        return new Trained(set, vocabulary, boof, new long[]{t1[0] - t0[0], t1[1] - t0[1]},
                new long[]{t2[0] - t1[0], t2[1] - t1[1]});
    }

    /** Recall rows under the demo's rule (5 m, 50 degrees) and a looser one (7 m, 80 degrees), then query cost. */
    private static void recall(RetrievalTable table, List<ScenarioDescriptors.SceneFrame> test,
                               RetrievalRecall.Run ourRun, RetrievalRecall.Run boofRun, ExclusionWindow window) {
        for (double[] rule : new double[][]{{5, 50}, {7, 80}}) {
            RevisitLabels labels = RetrievalRecall.labels(test, rule[0], rule[1], window);
            table.recall(RetrievalRecall.recall(ourRun, test, labels, rule[0], rule[1]),
                    RetrievalRecall.recall(boofRun, test, labels, rule[0], rule[1]));
        }
        table.row(String.format(Locale.ROOT, "scenario query CPU p50 us (%d frames, %.0f features mean)",
                test.size(), test.stream().mapToInt(f -> f.frame().count()).average().orElse(0)),
                RetrievalScale.percentile(ourRun.queryCpuNanos(), 0.5),
                RetrievalScale.percentile(boofRun.queryCpuNanos(), 0.5), "%.0f");
    }

    /** Wall nanoseconds and process CPU nanoseconds (all threads). */
    private static long[] clocks() {
        var os = (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        return new long[]{System.nanoTime(), os.getProcessCpuTime()};
    }

    private static String loadAverage() throws IOException {
        Path proc = Path.of("/proc/loadavg");
        if (Files.isReadable(proc)) {
            String[] f = Files.readString(proc).trim().split("\\s+");
            return f[0] + " " + f[1] + " " + f[2] + " (1, 5, 15 min)";
        }
        return String.format(Locale.ROOT, "%.2f (1 min)", ManagementFactory.getOperatingSystemMXBean()
                .getSystemLoadAverage());
    }

    private record Options(int[] sizes, int boofMaxFrames, int queries, int rounds, Path plot, long trainSeed,
                           long testSeed) {

        static Options parse(String[] args) {
            int[] sizes = {1000, 10_000, 100_000};
            int boofMax = Integer.MAX_VALUE;
            int queries = 200;
            int rounds = 3;
            Path plot = Path.of("docs/retrieval-latency.png");
            long trainSeed = 8;
            long testSeed = 7;
            for (int i = 0; i + 1 < args.length; i += 2) {
                String v = args[i + 1];
                switch (args[i]) {
                    case "--sizes" -> sizes = Arrays.stream(v.split(",")).mapToInt(Integer::parseInt).toArray();
                    case "--boof-max-frames" -> boofMax = Integer.parseInt(v);
                    case "--queries" -> queries = Integer.parseInt(v);
                    case "--rounds" -> rounds = Integer.parseInt(v);
                    case "--plot" -> plot = Path.of(v);
                    case "--train-seed" -> trainSeed = Long.parseLong(v);
                    case "--test-seed" -> testSeed = Long.parseLong(v);
                    default -> throw new IllegalArgumentException("unknown option " + args[i] + "; see the Javadoc"
                            + " of RetrievalComparison");
                }
            }
            if (args.length % 2 != 0) {
                throw new IllegalArgumentException("option " + args[args.length - 1] + " has no value");
            }
            return new Options(sizes, boofMax, queries, rounds, plot, trainSeed, testSeed);
        }
    }
}
