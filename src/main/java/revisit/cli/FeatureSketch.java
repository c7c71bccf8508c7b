package revisit.cli;

import boofcv.struct.image.GrayU8;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.image.BufferedImage;
import revisit.features.FrameFeatures;

/**
 * Draws features over their image for a person to inspect: the image in dimmed grey, one circle per feature whose
 * radius is the orientation patch (15 level pixels) in image pixels, so it grows with the pyramid level, and a
 * line from the centre along the orientation. Colour tells the level.
 */
final class FeatureSketch {

    /** Radius of the orientation patch in level pixels (IntensityCentroid.RADIUS). */
    private static final double PATCH_RADIUS = 15;
    private static final Color[] LEVEL_COLOURS = {
        new Color(255, 60, 60), new Color(255, 160, 40), new Color(240, 230, 50), new Color(80, 220, 80),
        new Color(60, 220, 220), new Color(70, 130, 255), new Color(170, 90, 255), new Color(255, 80, 200)};

    private FeatureSketch() {
    }

    /** A new RGB picture of {@code image} with {@code features} drawn on it. */
    static BufferedImage draw(GrayU8 image, FrameFeatures features) {
        BufferedImage out = new BufferedImage(image.width, image.height, BufferedImage.TYPE_INT_RGB);
        for (int y = 0; y < image.height; y++) {
            for (int x = 0; x < image.width; x++) {
                int v = 40 + (image.get(x, y) * 160) / 255;
                out.setRGB(x, y, (v << 16) | (v << 8) | v);
            }
        }
        Graphics2D g = out.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setStroke(new BasicStroke(1.2f));
            for (int i = 0; i < features.count(); i++) {
                drawOne(g, features, i);
            }
        } finally {
            g.dispose();
        }
        return out;
    }

    private static void drawOne(Graphics2D g, FrameFeatures f, int i) {
        double cx = f.x()[i];
        double cy = f.y()[i];
        double r = PATCH_RADIUS * f.scale()[i];
        double a = f.angleRad()[i];
        g.setColor(LEVEL_COLOURS[f.level()[i] % LEVEL_COLOURS.length]);
        g.draw(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
        g.draw(new Line2D.Double(cx, cy, cx + r * Math.cos(a), cy + r * Math.sin(a)));
    }
}
