package revisit.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import revisit.camera.CameraModel;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.ImageFiles;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;
import revisit.verification.Correspondences;
import revisit.verification.DescriptorMatcher;
import revisit.verification.PairVerifier;
import revisit.verification.Verification;
import revisit.verification.VerificationConfig;

/**
 * Verification of one candidate pair on one core: Middlebury templeSparseRing views 7 and 8 (Seitz et al., CVPR
 * 2006; exact camera from templeSR_par.txt), 1000 features per view from the project's extractor. Node ids for
 * the restricted matcher are the level-2 nodes of the shipped vocabulary (the scan's default matching level).
 * Each benchmark also sums the thread CPU time of its calls ({@link CpuTimeCounters}: {@code cpuNanos / items} is
 * CPU nanoseconds per call), the figure to read on the shared machine. Run: {@code mvn -B -Pbench -DskipTests
 * package && java -jar target/benchmarks.jar VerificationBenchmark}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@Threads(1)
public class VerificationBenchmark {

    /** Vocabulary level whose nodes restrict matching: the scan default (ScanSettings.matchingNodeLevel). */
    static final int NODE_LEVEL = 2;

    /** Putative matches of {@link #verifyMatchesWithoutGeometry}. */
    static final int UNRELATED_MATCHES = 200;

    private FrameFeatures a;
    private FrameFeatures b;
    private int[] nodesA;
    private int[] nodesB;
    private int[] nodesFar1;
    private int[] nodesFar2;
    private Correspondences matches;
    private FrameFeatures far1;
    private FrameFeatures far2;
    private Correspondences unrelated;
    private CameraModel camera;
    private PairVerifier verifier;
    private DescriptorMatcher matcher;

    @Setup
    public void setup() throws Exception {
        Path dir = dataFolder().resolve("middlebury/templeSparseRing");
        List<String> lines = Files.readAllLines(dir.resolve("templeSR_par.txt"));
        String[] f = lines.get(7).trim().split("\\s+");
        camera = new CameraModel(640, 480, Double.parseDouble(f[1]), Double.parseDouble(f[5]),
                Double.parseDouble(f[2]), Double.parseDouble(f[3]), Double.parseDouble(f[6]), 0, 0, 0, 0, 0);
        a = features(dir.resolve(f[0]));
        b = features(dir.resolve(lines.get(8).trim().split("\\s+")[0]));
        far1 = features(dir.resolve(lines.get(2).trim().split("\\s+")[0]));
        far2 = features(dir.resolve(lines.get(3).trim().split("\\s+")[0]));
        Vocabulary vocabulary = VocabularyFile.read(Path.of(System.getProperty("user.dir")).resolve("vocab/default.rvoc"));
        nodesA = nodes(vocabulary, a);
        nodesB = nodes(vocabulary, b);
        nodesFar1 = nodes(vocabulary, far1);
        nodesFar2 = nodes(vocabulary, far2);
        VerificationConfig config = VerificationConfig.defaults();
        verifier = new PairVerifier(config);
        matcher = new DescriptorMatcher(config);
        matches = matcher.matchAll(a, b);
        unrelated = indexPairs(UNRELATED_MATCHES);
    }

    /**
     * The first n features of templeSR0002 paired with the first n of templeSR0003 by index: putative matches with
     * no common geometry, so RANSAC finds no model near the acceptance bar and draws its full sample cap.
     */
    private static Correspondences indexPairs(int n) {
        int[] idx = new int[n];
        for (int i = 0; i < n; i++) {
            idx[i] = i;
        }
        return new Correspondences(n, idx, idx.clone(), new int[n]);
    }

    /** Brute-force matching plus verification: the cost of one candidate. */
    @Benchmark
    public Verification matchAndVerify(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Verification result = verifier.verify(a, b, Optional.of(camera));
        cpu.add(start, 1);
        return result;
    }

    /** Node-restricted matching plus verification. */
    @Benchmark
    public Verification matchWithinNodesAndVerify(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Verification result = verifier.verify(a, nodesA, b, nodesB, Optional.of(camera));
        cpu.add(start, 1);
        return result;
    }

    /** Verification of precomputed matches only. */
    @Benchmark
    public Verification verifyOnly(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Verification result = verifier.verify(a, b, matches, Optional.of(camera));
        cpu.add(start, 1);
        return result;
    }

    /** A candidate that must be rejected: templeSR0002 / templeSR0003, 54 degrees apart (24 matches, 9 samples). */
    @Benchmark
    public Verification matchAndRejectFarPair(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Verification result = verifier.verify(far1, far2, Optional.of(camera));
        cpu.add(start, 1);
        return result;
    }

    /** The far pair with node-restricted matching, as the scan matches a candidate. */
    @Benchmark
    public Verification matchWithinNodesAndRejectFarPair(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Verification result = verifier.verify(far1, nodesFar1, far2, nodesFar2, Optional.of(camera));
        cpu.add(start, 1);
        return result;
    }

    /** The worst case for RANSAC: 200 matches with no geometry (30% bar: the sample cap, 250 by default, binds). */
    @Benchmark
    public Verification verifyMatchesWithoutGeometry(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Verification result = verifier.verify(far1, far2, unrelated, Optional.of(camera));
        cpu.add(start, 1);
        return result;
    }

    @Benchmark
    public Correspondences matchBruteForce(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Correspondences result = matcher.matchAll(a, b);
        cpu.add(start, 1);
        return result;
    }

    @Benchmark
    public Correspondences matchWithinNodes(CpuTimeCounters cpu) {
        long start = CpuTimeCounters.now();
        Correspondences result = matcher.matchWithinNodes(a, nodesA, b, nodesB);
        cpu.add(start, 1);
        return result;
    }

    /** Node of each feature at level 2 of the vocabulary (the scan's default matching level). */
    static int[] nodes(Vocabulary vocabulary, FrameFeatures f) {
        int[] words = new int[f.count()];
        int[] nodes = new int[f.count()];
        vocabulary.lookup(f, NODE_LEVEL, words, nodes);
        return nodes;
    }

    static Path dataFolder() {
        Path cwd = Path.of(System.getProperty("user.dir"));
        for (Path p : List.of(cwd.resolve("../shared/data"), cwd.resolve("../../shared/data"),
                Path.of("/work/shared/data"))) {
            if (Files.isDirectory(p)) {
                return p;
            }
        }
        throw new IllegalStateException("../shared/data not found from " + cwd);
    }

    static FrameFeatures features(Path image) {
        return new FeatureExtractor(FeatureConfig.defaults()).extract(ImageFiles.readGray(image));
    }
}
