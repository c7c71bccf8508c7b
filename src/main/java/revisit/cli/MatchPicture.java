package revisit.cli;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import revisit.features.FrameFeatures;
import revisit.verification.Correspondences;
import revisit.verification.Verification;

/**
 * Draws two frames side by side with the verified inlier matches as green lines and the rejected putative matches
 * as red dots, with a one-line caption, for a person to check a verification by eye.
 */
final class MatchPicture {

    private static final int CAPTION_PX = 24;

    private MatchPicture() {
    }

    /**
     * @param left    frame a (any image type; drawn in grey)
     * @param right   frame b
     * @param matches the putative matches the verification was given
     * @param result  the verification of those matches
     * @return a new RGB image, width left + right, height of the taller plus a caption band
     */
    static BufferedImage draw(BufferedImage left, BufferedImage right, FrameFeatures a, FrameFeatures b,
                              Correspondences matches, Verification result) {
        int width = left.getWidth() + right.getWidth();
        int height = Math.max(left.getHeight(), right.getHeight()) + CAPTION_PX;
        BufferedImage out = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = out.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setColor(Color.BLACK);
            g.fillRect(0, 0, width, height);
            g.drawImage(left, 0, CAPTION_PX, null);
            g.drawImage(right, left.getWidth(), CAPTION_PX, null);
            boolean[] inlier = new boolean[matches.count()];
            for (int k : result.inlierMatches()) {
                inlier[k] = true;
            }
            g.setColor(new Color(230, 40, 40));
            for (int k = 0; k < matches.count(); k++) {
                if (!inlier[k]) {
                    int j = matches.indexB()[k];
                    g.fillOval(Math.round(b.x()[j]) + left.getWidth() - 2, Math.round(b.y()[j]) + CAPTION_PX - 2,
                            4, 4);
                }
            }
            g.setStroke(new BasicStroke(1.2f));
            g.setColor(new Color(40, 220, 80));
            for (int k : result.inlierMatches()) {
                int i = matches.indexA()[k];
                int j = matches.indexB()[k];
                g.drawLine(Math.round(a.x()[i]), Math.round(a.y()[i]) + CAPTION_PX,
                        Math.round(b.x()[j]) + left.getWidth(), Math.round(b.y()[j]) + CAPTION_PX);
            }
            g.setColor(Color.WHITE);
            g.drawString(caption(result), 6, CAPTION_PX - 7);
        } finally {
            g.dispose();
        }
        return out;
    }

    static String caption(Verification v) {
        return String.format("%s  model %s  inliers %d of %d matches", v.outcome(), v.model(), v.inlierCount(),
                v.matchCount());
    }
}
