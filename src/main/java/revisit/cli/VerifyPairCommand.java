package revisit.cli;

import boofcv.io.image.ConvertBufferedImage;
import boofcv.struct.image.GrayU8;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import javax.imageio.ImageIO;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import revisit.camera.CameraFile;
import revisit.camera.CameraModel;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.AtomicFiles;
import revisit.io.BadInputException;
import revisit.io.ImageFiles;
import revisit.verification.Correspondences;
import revisit.verification.DescriptorMatcher;
import revisit.verification.PairVerifier;
import revisit.verification.RelativePose;
import revisit.verification.Verification;
import revisit.verification.VerificationConfig;

/**
 * {@code revisit verify-pair}: matches two images, verifies them geometrically, prints the verdict and relative
 * pose and draws the inlier matches side by side. Exit code 0 when the pair is accepted, 3 when it is rejected.
 */
@Command(name = "verify-pair", mixinStandardHelpOptions = true,
        description = "Checks whether two images show the same place: matches their features, fits the two-view "
                + "geometry robustly, prints the verdict and the relative pose (with a camera file) and draws the "
                + "inlier matches into a PNG. Exit code 0 = accepted, 3 = rejected.")
public final class VerifyPairCommand implements Callable<Integer> {

    /** Exit code of a rejected pair. */
    static final int REJECTED = 3;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FIRST", description = "First image (frame a).")
    private Path first;

    @Parameters(index = "1", paramLabel = "SECOND", description = "Second image (frame b).")
    private Path second;

    @Option(names = "--camera", paramLabel = "JSON",
            description = "Camera file of both images; without it no pose is estimated (uncalibrated models only).")
    private Path cameraFile;

    @Option(names = {"-o", "--picture"}, paramLabel = "PNG",
            description = "Picture of the inlier matches (default: <first>-<second>-matches.png here).")
    private Path picture;

    @Option(names = "--max-features", paramLabel = "N", description = "Features per image (default: ${DEFAULT-VALUE}).")
    private int maxFeatures = FeatureConfig.defaults().maxFeatures();

    @Option(names = "--ratio", paramLabel = "R", description = "Match ratio test (default: ${DEFAULT-VALUE}).")
    private double ratio = VerificationConfig.defaults().ratio();

    @Option(names = "--min-inliers", paramLabel = "N", description = "Inliers to accept (default: ${DEFAULT-VALUE}).")
    private int minInliers = VerificationConfig.defaults().minInliers();

    @Option(names = "--threshold", paramLabel = "PX",
            description = "Epipolar inlier threshold in pixels (default: ${DEFAULT-VALUE}).")
    private double thresholdPx = VerificationConfig.defaults().inlierThresholdPx();

    @Option(names = "--seed", paramLabel = "N", description = "RANSAC seed (default: ${DEFAULT-VALUE}).")
    private long seed = VerificationConfig.defaults().seed();

    @Option(names = "--verbose", description = "Show the stack trace of an error.")
    private boolean verbose;

    @Override
    public Integer call() {
        VerificationConfig config = config();
        FeatureConfig features = featureConfig();
        Optional<CameraModel> camera = Optional.ofNullable(cameraFile).map(CameraFile::read);
        GrayU8 imageA = ImageFiles.readGray(first);
        GrayU8 imageB = ImageFiles.readGray(second);
        camera.ifPresent(c -> checkSize(c, first, imageA));
        camera.ifPresent(c -> checkSize(c, second, imageB));
        FeatureExtractor extractor = new FeatureExtractor(features);
        FrameFeatures a = extractor.extract(imageA);
        FrameFeatures b = extractor.extract(imageB);
        Correspondences matches = new DescriptorMatcher(config).matchAll(a, b);
        Verification result = new PairVerifier(config).verify(a, b, matches, camera);
        Path target = picture != null ? picture : Path.of(stem(first) + "-" + stem(second) + "-matches.png");
        BufferedImage drawn = MatchPicture.draw(ConvertBufferedImage.convertTo(imageA, null),
                ConvertBufferedImage.convertTo(imageB, null), a, b, matches, result);
        AtomicFiles.write(target, out -> {
            if (!ImageIO.write(drawn, "png", out)) {
                throw new IOException("no PNG writer available in this Java runtime");
            }
        });
        print(spec.commandLine().getOut(), a, b, result, camera.isPresent());
        spec.commandLine().getOut().println("picture:     " + target);
        return result.accepted() ? 0 : REJECTED;
    }

    private FeatureConfig featureConfig() {
        try {
            return FeatureConfig.defaults().withMaxFeatures(maxFeatures);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage(), e);
        }
    }

    private VerificationConfig config() {
        try {
            return VerificationConfig.defaults().withRatio(ratio).withMinInliers(minInliers)
                    .withInlierThresholdPx(thresholdPx).withSeed(seed);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage(), e);
        }
    }

    private void checkSize(CameraModel c, Path image, GrayU8 gray) {
        if (c.width() != gray.width || c.height() != gray.height) {
            throw new BadInputException(cameraFile + ": camera is " + c.width() + "x" + c.height() + " but " + image
                    + " is " + gray.width + "x" + gray.height + "; give the camera file of these images");
        }
    }

    static void print(PrintWriter out, FrameFeatures a, FrameFeatures b, Verification v, boolean calibrated) {
        out.printf(Locale.ROOT, "verdict:     %s (model %s)%n", v.outcome(), v.model());
        out.printf(Locale.ROOT, "features:    %d / %d, matches %d, inliers %d (%.1f%%)%n", a.count(), b.count(),
                v.matchCount(), v.inlierCount(), 100 * v.inlierRatio());
        if (v.errors().count() > 0) {
            out.printf(Locale.ROOT, "error:       median %.3f px, rms %.3f px%n", v.errors().medianPx(),
                    v.errors().rmsPx());
        }
        if (v.pose().isEmpty()) {
            out.println("pose:        " + (calibrated ? "none (pair not accepted)" : "none (no camera file given)"));
            return;
        }
        RelativePose pose = v.pose().get();
        double[] q = pose.quaternion();
        out.printf(Locale.ROOT, "rotation:    %.3f deg, quaternion w x y z = %.6f %.6f %.6f %.6f%n",
                pose.rotationAngleDeg(), q[0], q[1], q[2], q[3]);
        out.println("translation: " + pose.translationDirection().map(t -> String.format(Locale.ROOT,
                "direction %.6f %.6f %.6f (unit; scale unknown)", t[0], t[1], t[2]))
                .orElse("not observable (pure rotation)"));
        if (pose.ambiguous()) {
            out.println("note:        a second plane pose explains the matches as well; this one has more points in front");
        }
    }

    private static String stem(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }
}
