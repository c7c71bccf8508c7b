package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import revisit.features.FrameFeatures;
import revisit.verification.Correspondences;
import revisit.verification.ModelKind;
import revisit.verification.ModelScores;
import revisit.verification.Outcome;
import revisit.verification.ResidualStats;
import revisit.verification.Verification;

class MatchPictureTest {

    private static FrameFeatures points(float[] x, float[] y) {
        int n = x.length;
        return new FrameFeatures(n, x, y, new float[n], new int[n], new float[n], new float[n], new long[n * 4]);
    }

    @Test
    void drawsInlierLinesAcrossBothFramesBelowTheCaption() {
        BufferedImage left = new BufferedImage(100, 80, BufferedImage.TYPE_BYTE_GRAY);
        BufferedImage right = new BufferedImage(120, 60, BufferedImage.TYPE_BYTE_GRAY);
        FrameFeatures a = points(new float[]{10, 50}, new float[]{40, 20});
        FrameFeatures b = points(new float[]{10, 90}, new float[]{40, 30});
        Correspondences m = new Correspondences(2, new int[]{0, 1}, new int[]{0, 1}, new int[2]);
        Verification v = new Verification(Outcome.ACCEPTED, ModelKind.HOMOGRAPHY, 2, new int[]{0}, new double[9],
                Optional.empty(), ResidualStats.none(), ModelScores.none(), 1);
        BufferedImage out = MatchPicture.draw(left, right, a, b, m, v);
        assertEquals(220, out.getWidth());
        assertEquals(80 + 24, out.getHeight());
        int mid = out.getRGB(60, 40 + 24);
        assertTrue(((mid >> 8) & 0xFF) > 150 && ((mid >> 16) & 0xFF) < 100, "green inlier line at y = 40");
        int dot = out.getRGB(100 + 90, 30 + 24);
        assertTrue(((dot >> 16) & 0xFF) > 150 && ((dot >> 8) & 0xFF) < 100, "red dot for the outlier");
        assertTrue(MatchPicture.caption(v).startsWith("ACCEPTED  model HOMOGRAPHY  inliers 1 of 2"));
    }
}
