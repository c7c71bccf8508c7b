package revisit.cli;

import boofcv.struct.image.GrayU8;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import javax.imageio.ImageIO;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.AtomicFiles;
import revisit.io.ImageFiles;

/** {@code revisit features}: detects the features of one image and draws them into a PNG to look at. */
@Command(name = "features", mixinStandardHelpOptions = true,
        description = "Detects ORB-style features (oriented FAST + steered BRIEF) in one image and draws them into a "
                + "PNG: circle size shows the pyramid level's scale, the line the orientation, colour the level.")
public final class FeaturesCommand implements Callable<Integer> {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "IMAGE", description = "Image to analyse (PNG, JPEG, BMP or GIF).")
    private Path image;

    @Option(names = {"-o", "--output"}, paramLabel = "PNG",
            description = "Picture to write (default: <image name>-features.png in the current folder).")
    private Path output;

    @Option(names = "--max-features", paramLabel = "N", description = "Most features kept (default: ${DEFAULT-VALUE}).")
    private int maxFeatures = FeatureConfig.defaults().maxFeatures();

    @Option(names = "--levels", paramLabel = "N", description = "Pyramid levels (default: ${DEFAULT-VALUE}).")
    private int levels = FeatureConfig.defaults().levels();

    @Option(names = "--scale-factor", paramLabel = "F",
            description = "Size ratio between pyramid levels (default: ${DEFAULT-VALUE}).")
    private double scaleFactor = FeatureConfig.defaults().scaleFactor();

    @Option(names = "--fast-threshold", paramLabel = "GREY",
            description = "FAST intensity difference in grey levels (default: ${DEFAULT-VALUE}).")
    private int fastThreshold = FeatureConfig.defaults().fastThreshold();

    @Option(names = "--grid-cell", paramLabel = "PX",
            description = "Cell side in level pixels for spreading features (default: ${DEFAULT-VALUE}).")
    private int gridCellPx = FeatureConfig.defaults().gridCellPx();

    @Option(names = "--verbose", description = "Show the stack trace of an error.")
    private boolean verbose;

    @Override
    public Integer call() {
        FeatureConfig config = config();
        GrayU8 gray = ImageFiles.readGray(image);
        FrameFeatures features = new FeatureExtractor(config).extract(gray);
        BufferedImage picture = FeatureSketch.draw(gray, features);
        Path target = output != null ? output : Path.of(stem(image) + "-features.png");
        AtomicFiles.write(target, out -> {
            if (!ImageIO.write(picture, "png", out)) {
                throw new IOException("no PNG writer available in this Java runtime");
            }
        });
        spec.commandLine().getOut().println(image + ": " + features.count() + " features (" + perLevel(features)
                + ") drawn to " + target);
        return 0;
    }

    private FeatureConfig config() {
        try {
            return FeatureConfig.defaults().withMaxFeatures(maxFeatures).withLevels(levels)
                    .withScaleFactor(scaleFactor).withFastThreshold(fastThreshold).withGridCellPx(gridCellPx);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage(), e);
        }
    }

    private static String stem(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    private static String perLevel(FrameFeatures f) {
        int top = 0;
        for (int i = 0; i < f.count(); i++) {
            top = Math.max(top, f.level()[i]);
        }
        int[] counts = new int[top + 1];
        for (int i = 0; i < f.count(); i++) {
            counts[f.level()[i]]++;
        }
        StringBuilder sb = new StringBuilder("per level");
        for (int c : counts) {
            sb.append(' ').append(c);
        }
        return sb.toString();
    }
}
