package revisit.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import nu.pattern.OpenCV;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.opencv.calib3d.Calib3d;
import org.opencv.core.CvType;
import org.opencv.core.Mat;
import org.opencv.core.MatOfPoint2f;
import org.opencv.core.Point;
import revisit.camera.CameraModel;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.ImageFiles;
import revisit.verification.Correspondences;
import revisit.verification.DescriptorMatcher;
import revisit.verification.ModelKind;
import revisit.verification.PairVerifier;
import revisit.verification.RelativePose;
import revisit.verification.Verification;
import revisit.verification.VerificationConfig;

/**
 * The Middlebury table of docs/VERIFICATION.md: every neighbour pair of the first 16 views of templeSparseRing,
 * dinoSparseRing and dinoRing (Seitz et al., CVPR 2006; exact cameras {@code x = K [R|t] X}), our features (1000
 * per view), brute-force matching, default verification; beside it the rotation error of OpenCV's
 * {@code findEssentialMat} (RANSAC, 0.999, 1 px) + {@code recoverPose} on the same matches. Prints Markdown rows.
 * Run: {@code java -cp target/benchmarks.jar revisit.bench.MiddleburyPairTable}.
 */
public final class MiddleburyPairTable {

    private static final int VIEWS = 16;

    private MiddleburyPairTable() {
    }

    public static void main(String[] args) throws Exception {
        OpenCV.loadLocally();
        Path data = VerificationBenchmark.dataFolder().resolve("middlebury");
        VerificationConfig config = VerificationConfig.defaults();
        PairVerifier verifier = new PairVerifier(config);
        DescriptorMatcher matcher = new DescriptorMatcher(config);
        FeatureExtractor extractor = new FeatureExtractor(FeatureConfig.defaults().withMaxFeatures(1000));
        System.out.println("| pair | true angle (deg) | matches | verdict | inliers | rotation error (deg) "
                + "| direction error (deg) | rotation sigma (deg) | OpenCV rotation error (deg) |");
        System.out.println("|---|---|---|---|---|---|---|---|---|");
        for (String set : List.of("templeSparseRing/templeSR_par.txt", "dinoSparseRing/dinoSR_par.txt",
                "dinoRing/dino_par.txt")) {
            Path par = data.resolve(set);
            List<String> lines = Files.readAllLines(par).stream().skip(1).filter(l -> !l.isBlank()).toList();
            FrameFeatures previous = extractor.extract(ImageFiles.readGray(par.resolveSibling(name(lines.get(0)))));
            for (int i = 0; i + 1 < VIEWS; i++) {
                Path image = par.resolveSibling(name(lines.get(i + 1)));
                FrameFeatures next = extractor.extract(ImageFiles.readGray(image));
                System.out.println(row(lines.get(i), lines.get(i + 1), previous, next, matcher, verifier));
                previous = next;
            }
        }
    }

    private static String row(String lineA, String lineB, FrameFeatures a, FrameFeatures b,
                              DescriptorMatcher matcher, PairVerifier verifier) {
        double[] va = values(lineA);
        double[] vb = values(lineB);
        double[] trueR = BenchMath.mul(BenchMath.block(vb, 9), BenchMath.transpose(BenchMath.block(va, 9)));
        double[] rt = BenchMath.mulVec(trueR, BenchMath.block(va, 18));
        double[] trueT = {vb[18] - rt[0], vb[19] - rt[1], vb[20] - rt[2]};
        CameraModel camera = new CameraModel(640, 480, va[0], va[4], va[1], va[2], va[5], 0, 0, 0, 0, 0);
        Correspondences m = matcher.matchAll(a, b);
        Verification v = verifier.verify(a, b, m, Optional.of(camera));
        boolean other = v.accepted() && v.model() != ModelKind.ESSENTIAL;
        String verdict = v.outcome() + (other ? " (" + v.model() + ")" : "");
        String errors = "- | - | -";
        if (v.pose().isPresent()) {
            RelativePose pose = v.pose().get();
            double rotErr = BenchMath.angleDeg(BenchMath.mul(pose.rotation(), BenchMath.transpose(trueR)));
            String dirErr = pose.translationDirection().map(t -> String.format("%.2f",
                    Math.toDegrees(Math.acos(Math.min(1, BenchMath.dot(BenchMath.unit(trueT), t)))))).orElse("-");
            errors = String.format("%.2f | %s | %.2f", rotErr, dirErr, rotationSigmaDeg(pose.information()));
        }
        double[] openCvR = openCvRotation(a, b, m, camera);
        double openCv = BenchMath.angleDeg(BenchMath.mul(openCvR, BenchMath.transpose(trueR)));
        return String.format("| %s-%s | %.1f | %d | %s | %d | %s | %.2f |", stem(lineA), stem(lineB),
                BenchMath.angleDeg(trueR), m.count(), verdict, v.inlierCount(), errors, openCv);
    }

    /** Largest standard deviation of the rotation block of the pseudo-inverse of the information, degrees. */
    private static double rotationSigmaDeg(double[] information) {
        DMatrixRMaj info = new DMatrixRMaj(6, 6, true, information);
        DMatrixRMaj covariance = new DMatrixRMaj(6, 6);
        CommonOps_DDRM.pinv(info, covariance);
        double largest = 0;
        for (int i = 3; i < 6; i++) {
            largest = Math.max(largest, covariance.get(i, i));
        }
        return Math.toDegrees(Math.sqrt(largest));
    }

    /** R of {@code X_b = R X_a + t} from OpenCV's five-point RANSAC and cheirality test on the same matches. */
    private static double[] openCvRotation(FrameFeatures a, FrameFeatures b, Correspondences m, CameraModel c) {
        Point[] pa = new Point[m.count()];
        Point[] pb = new Point[m.count()];
        for (int k = 0; k < m.count(); k++) {
            pa[k] = new Point(a.x()[m.indexA()[k]], a.y()[m.indexA()[k]]);
            pb[k] = new Point(b.x()[m.indexB()[k]], b.y()[m.indexB()[k]]);
        }
        MatOfPoint2f ma = new MatOfPoint2f(pa);
        MatOfPoint2f mb = new MatOfPoint2f(pb);
        Mat k = new Mat(3, 3, CvType.CV_64F);
        k.put(0, 0, c.fx(), c.skew(), c.cx(), 0, c.fy(), c.cy(), 0, 0, 1);
        Mat mask = new Mat();
        Mat e = Calib3d.findEssentialMat(ma, mb, k, Calib3d.RANSAC, 0.999, 1.0, 1000, mask);
        Mat r = new Mat();
        Mat t = new Mat();
        Calib3d.recoverPose(e.rowRange(0, 3), ma, mb, k, r, t, mask);
        double[] out = new double[9];
        r.get(0, 0, out);
        return out;
    }

    private static String name(String line) {
        return line.trim().split("\\s+")[0];
    }

    private static String stem(String line) {
        return name(line).replace(".png", "");
    }

    /** k11..k33, r11..r33, t1..t3 of a parameter-file line. */
    private static double[] values(String line) {
        String[] f = line.trim().split("\\s+");
        double[] v = new double[21];
        for (int i = 0; i < 21; i++) {
            v[i] = Double.parseDouble(f[i + 1]);
        }
        return v;
    }
}
