package revisit.verification;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import nu.pattern.OpenCV;
import org.opencv.core.Mat;
import org.opencv.core.MatOfKeyPoint;
import org.opencv.core.KeyPoint;
import org.opencv.features2d.ORB;
import org.opencv.imgcodecs.Imgcodecs;
import revisit.camera.CameraModel;
import revisit.features.FrameFeatures;

/**
 * Access to the shared real data (../shared/data, see its README for sources) and, until the project's own
 * extractor is available here, ORB features computed by OpenCV's Java bindings (reference library, test scope).
 */
final class ReferenceData {

    private ReferenceData() {
    }

    /** The shared data folder, or a skipped test when it is absent. */
    static Path dataFolder() {
        Path cwd = Path.of(System.getProperty("user.dir"));
        for (Path p : List.of(cwd.resolve("../shared/data"), cwd.resolve("../../shared/data"),
                Path.of("/work/shared/data"))) {
            if (Files.isDirectory(p)) {
                return p.normalize();
            }
        }
        assumeTrue(false, "shared data folder ../shared/data not found: real-image checks skipped");
        return cwd;
    }

    static Path file(String relative) {
        Path p = dataFolder().resolve(relative);
        assumeTrue(Files.isRegularFile(p), p + " not found: check skipped");
        return p;
    }

    /** ORB features (OpenCV, 256-bit descriptors packed 4 longs per feature, byte k in bits 8k..8k+7). */
    static FrameFeatures orb(Path image, int maxFeatures) {
        OpenCV.loadLocally();
        Mat gray = Imgcodecs.imread(image.toString(), Imgcodecs.IMREAD_GRAYSCALE);
        MatOfKeyPoint kps = new MatOfKeyPoint();
        Mat desc = new Mat();
        ORB.create(maxFeatures).detectAndCompute(gray, new Mat(), kps, desc);
        KeyPoint[] k = kps.toArray();
        int n = k.length;
        float[] x = new float[n];
        float[] y = new float[n];
        long[] d = new long[n * 4];
        byte[] row = new byte[32];
        for (int i = 0; i < n; i++) {
            x[i] = (float) k[i].pt.x;
            y[i] = (float) k[i].pt.y;
            desc.get(i, 0, row);
            for (int b = 0; b < 32; b++) {
                d[i * 4 + b / 8] |= (row[b] & 0xFFL) << (8 * (b % 8));
            }
        }
        return new FrameFeatures(n, x, y, new float[n], new int[n], new float[n], new float[n], d);
    }

    /**
     * One camera of a Middlebury parameter file (Seitz et al., CVPR 2006): line
     * {@code name k11..k33 r11..r33 t1 t2 t3}, projection {@code x = K [R|t] X}.
     */
    record MiddleburyView(String name, double[] k, double[] r, double[] t) {

        CameraModel camera() {
            return new CameraModel(640, 480, k[0], k[4], k[1], k[2], k[5], 0, 0, 0, 0, 0);
        }

        /** Relative pose to {@code other}: X_other = R X_this + t. */
        double[][] poseTo(MiddleburyView other) {
            double[] rel = Mat3.mul(other.r, Mat3.transpose(r));
            double[] rt = Mat3.mulVec(rel, t);
            return new double[][]{rel, {other.t[0] - rt[0], other.t[1] - rt[1], other.t[2] - rt[2]}};
        }
    }

    static List<MiddleburyView> middlebury(String parFile) {
        try {
            List<String> lines = Files.readAllLines(file(parFile));
            return lines.stream().skip(1).filter(l -> !l.isBlank()).map(l -> {
                String[] f = l.trim().split("\\s+");
                double[] v = new double[21];
                for (int i = 0; i < 21; i++) {
                    v[i] = Double.parseDouble(f[i + 1]);
                }
                return new MiddleburyView(f[0], java.util.Arrays.copyOfRange(v, 0, 9),
                        java.util.Arrays.copyOfRange(v, 9, 18), java.util.Arrays.copyOfRange(v, 18, 21));
            }).toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
