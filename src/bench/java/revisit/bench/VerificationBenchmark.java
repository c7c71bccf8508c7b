package revisit.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import nu.pattern.OpenCV;
import org.opencv.core.KeyPoint;
import org.opencv.core.Mat;
import org.opencv.core.MatOfKeyPoint;
import org.opencv.features2d.ORB;
import org.opencv.imgcodecs.Imgcodecs;
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
import revisit.features.FrameFeatures;
import revisit.verification.Correspondences;
import revisit.verification.DescriptorMatcher;
import revisit.verification.PairVerifier;
import revisit.verification.Verification;
import revisit.verification.VerificationConfig;

/**
 * Verification of one candidate pair on one core: Middlebury templeSparseRing views 7 and 8 (Seitz et al., CVPR
 * 2006; exact camera from templeSR_par.txt), 1000 ORB features per view from OpenCV (stand-in until the project's
 * extractor is merged). Node ids for the restricted matcher are the top 6 descriptor bits (64 groups), a stand-in
 * for vocabulary nodes. Run: {@code mvn -B -Pbench -DskipTests package && java -jar target/benchmarks.jar
 * VerificationBenchmark}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@Threads(1)
public class VerificationBenchmark {

    private FrameFeatures a;
    private FrameFeatures b;
    private int[] nodesA;
    private int[] nodesB;
    private Correspondences matches;
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
        a = orb(dir.resolve(f[0]));
        b = orb(dir.resolve(lines.get(8).trim().split("\\s+")[0]));
        nodesA = topBits(a);
        nodesB = topBits(b);
        VerificationConfig config = VerificationConfig.defaults();
        verifier = new PairVerifier(config);
        matcher = new DescriptorMatcher(config);
        matches = matcher.matchAll(a, b);
    }

    /** Brute-force matching plus verification: the cost of one candidate. */
    @Benchmark
    public Verification matchAndVerify() {
        return verifier.verify(a, b, Optional.of(camera));
    }

    /** Node-restricted matching plus verification. */
    @Benchmark
    public Verification matchWithinNodesAndVerify() {
        return verifier.verify(a, nodesA, b, nodesB, Optional.of(camera));
    }

    /** Verification of precomputed matches only. */
    @Benchmark
    public Verification verifyOnly() {
        return verifier.verify(a, b, matches, Optional.of(camera));
    }

    @Benchmark
    public Correspondences matchBruteForce() {
        return matcher.matchAll(a, b);
    }

    @Benchmark
    public Correspondences matchWithinNodes() {
        return matcher.matchWithinNodes(a, nodesA, b, nodesB);
    }

    static int[] topBits(FrameFeatures f) {
        int[] nodes = new int[f.count()];
        for (int i = 0; i < f.count(); i++) {
            nodes[i] = (int) (f.descriptors()[i * FrameFeatures.STRIDE] >>> 58);
        }
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

    static FrameFeatures orb(Path image) {
        OpenCV.loadLocally();
        Mat gray = Imgcodecs.imread(image.toString(), Imgcodecs.IMREAD_GRAYSCALE);
        MatOfKeyPoint kps = new MatOfKeyPoint();
        Mat desc = new Mat();
        ORB.create(1000).detectAndCompute(gray, new Mat(), kps, desc);
        KeyPoint[] k = kps.toArray();
        int n = k.length;
        float[] x = new float[n];
        float[] y = new float[n];
        long[] d = new long[n * FrameFeatures.STRIDE];
        byte[] row = new byte[32];
        for (int i = 0; i < n; i++) {
            x[i] = (float) k[i].pt.x;
            y[i] = (float) k[i].pt.y;
            desc.get(i, 0, row);
            for (int j = 0; j < 32; j++) {
                d[i * 4 + j / 8] |= (row[j] & 0xFFL) << (8 * (j % 8));
            }
        }
        return new FrameFeatures(n, x, y, new float[n], new int[n], new float[n], new float[n], d);
    }
}
