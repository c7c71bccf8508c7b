package revisit.verification;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import revisit.camera.CameraModel;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.ImageFiles;

/**
 * Access to the shared real data (../shared/data, see its README for sources) and features of its images from
 * the project's extractor.
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

    /** Features of an image from the project's extractor, default settings but for the feature budget. */
    static FrameFeatures features(Path image, int maxFeatures) {
        return new FeatureExtractor(FeatureConfig.defaults().withMaxFeatures(maxFeatures))
                .extract(ImageFiles.readGray(image));
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
