package revisit.pipeline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.EulerType;
import georegression.struct.se.Se3_F64;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Random;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.io.BadInputException;
import revisit.verification.DepthImage;
import revisit.verification.MetricMethod;
import revisit.verification.MetricPose;
import revisit.verification.RelativePose;

/** Depth input of the scan and the conversion of depth poses into the exported convention. */
class DepthInputTest {

    @TempDir
    Path dir;

    @Test
    void depthImagesPairWithFramesByIndexAndKeepTheirValues() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("depth"));
        for (int i = 0; i < 3; i++) {
            BufferedImage img = new BufferedImage(4, 2, BufferedImage.TYPE_USHORT_GRAY);
            img.getRaster().setSample(1, 1, 0, 1000 * (i + 1) + 7);
            ImageIO.write(img, "png", folder.resolve("depth_" + i + ".png").toFile());
        }
        DepthFrames frames = new DepthFrames(Map.of(0, folder), 0.001);
        DepthImage second = frames.depthOf(0, 1).orElseThrow();
        assertEquals(2007, second.image().get(1, 1));
        assertEquals(0.001, second.metresPerUnit());
        assertTrue(frames.depthOf(0, 3).isEmpty());
        assertTrue(frames.depthOf(1, 0).isEmpty());
    }

    @Test
    void aMissingDepthFolderOrAnEightBitImageIsOneClearError() throws IOException {
        BadInputException missing = assertThrows(BadInputException.class,
                () -> new DepthFrames(Map.of(0, dir.resolve("nope")), 0.001));
        assertTrue(missing.getMessage().contains("depth folder not found"), missing.getMessage());
        Path folder = Files.createDirectory(dir.resolve("grey8"));
        ImageIO.write(new BufferedImage(4, 2, BufferedImage.TYPE_BYTE_GRAY), "png",
                folder.resolve("d0.png").toFile());
        DepthFrames frames = new DepthFrames(Map.of(0, folder), 0.001);
        BadInputException eight = assertThrows(BadInputException.class, () -> frames.depthOf(0, 0));
        assertTrue(eight.getMessage().contains("16-bit"), eight.getMessage());
    }

    /**
     * Converting a depth pose (right perturbation, order rotation-translation) into {@link RelativePose} and then
     * into the export convention (right perturbation, order translation-rotation) must give back the depth pose's
     * information with its blocks swapped: both ends describe the same perturbation of the same transform.
     */
    @Test
    void depthPoseInformationSurvivesTheRoundTripIntoTheExportConvention() {
        Random random = new Random(11);
        Se3_F64 pose = new Se3_F64();
        ConvertRotation3D_F64.eulerToMatrix(EulerType.XYZ, 0.3, -0.2, 0.9, pose.R);
        pose.T.setTo(0.4, -1.2, 2.5);
        double[] a = new double[36];
        for (int i = 0; i < 36; i++) {
            a[i] = random.nextGaussian();
        }
        double[] info = new double[36];
        for (int i = 0; i < 6; i++) {
            for (int k = 0; k < 6; k++) {
                for (int m = 0; m < 6; m++) {
                    info[i * 6 + k] += a[m * 6 + i] * a[m * 6 + k];
                }
            }
        }
        MetricPose metric = new MetricPose(pose, info, MetricMethod.DEPTH_IN_BOTH, 30, 40, new boolean[40], 1.0);
        RelativePose relative = MetricUpgrade.toRelativePose(metric);
        assertArrayEquals(new double[]{0.4, -1.2, 2.5}, relative.metricTranslation().orElseThrow(), 1e-12);
        double[] exported = ClosureFactory.toLocalPerturbation(relative.information(), relative.rotation());
        for (int i = 0; i < 6; i++) {
            for (int k = 0; k < 6; k++) {
                assertEquals(info[((i + 3) % 6) * 6 + (k + 3) % 6], exported[i * 6 + k], 1e-9, i + "," + k);
            }
        }
    }
}
