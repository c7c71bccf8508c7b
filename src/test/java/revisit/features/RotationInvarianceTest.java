package revisit.features;

import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayU8;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Steered BRIEF on a real photo turned about its centre: features of the original and of the turned copy are
 * matched by exhaustive Hamming search with ratio test, and a match is correct when the turned position of the
 * first feature lies within {@value #CORRECT_PX} pixels of the second. Photo: pixabay (CC0), in
 * ../shared/data/photos/pixabay (see its readme.md).
 */
class RotationInvarianceTest {

    /** Source photo, CC0 from pixabay, shared data folder. */
    static final String PHOTO = "photos/pixabay/car01.jpg";
    /** Localisation tolerance for a correct match, level-0 pixels (as in the brief for this stage). */
    static final double CORRECT_PX = 3.0;
    /** Ratio test threshold, Lowe (IJCV 2004) uses 0.8. */
    static final double RATIO = 0.8;

    /** Matches found and how many of them were correct. */
    record Outcome(int matches, int correct) {
        double share() {
            return matches == 0 ? 0 : (double) correct / matches;
        }
    }

    /**
     * Measured on this photo (docs/FEATURES.md): 232/274 = 0.847 at 30 degrees, 250/289 = 0.865 at 45, 834/836 at 90;
     * OpenCV's ORB on the same pairs 0.94, 0.93, 1.00. The bar of 0.80 sits two binomial standard errors (about
     * 0.02 each with 280 matches) below the lowest measured share, and far above what BRIEF without steering keeps
     * at these angles (it fails beyond about 15 degrees; Rublee et al., ICCV 2011, from memory). This photo was the
     * hardest of five tried (the others scored 0.90 to 0.96 at 30 and 45 degrees).
     */
    @ParameterizedTest
    @ValueSource(doubles = {30, 45, 90})
    void keepsMostMatchesCorrectUnderRotation(double degrees) {
        GrayU8 photo = SharedData.gray(PHOTO);
        Outcome outcome = rotateAndMatch(photo, degrees, FeatureConfig.defaults());
        assertTrue(outcome.matches() >= 200, "too few matches at " + degrees + " degrees: " + outcome);
        assertTrue(outcome.share() >= 0.80, "correct share at " + degrees + " degrees: " + outcome);
    }

    /** The centre square of the photo and its turned copy, both cut to the square inside the turned disc. */
    static GrayU8[] turnedPair(GrayU8 photo, double degrees) {
        int side = Math.min(photo.width, photo.height);
        int x0 = (photo.width - side) / 2;
        int y0 = (photo.height - side) / 2;
        GrayU8 square = photo.subimage(x0, y0, x0 + side, y0 + side).clone();
        GrayU8 turned = rotate(square, Math.toRadians(degrees));
        int kept = (int) Math.floor(side / Math.sqrt(2)) - 4;
        int o = (side - kept) / 2;
        return new GrayU8[]{square.subimage(o, o, o + kept, o + kept).clone(),
            turned.subimage(o, o, o + kept, o + kept).clone()};
    }

    static Outcome rotateAndMatch(GrayU8 photo, double degrees, FeatureConfig config) {
        GrayU8[] pair = turnedPair(photo, degrees);
        FeatureExtractor extractor = new FeatureExtractor(config);
        FrameFeatures fa = extractor.extract(pair[0]);
        FrameFeatures fb = extractor.extract(pair[1]);
        List<BruteForceMatcher.Match> matches = BruteForceMatcher.match(fa, fb, RATIO);
        return count(matches, fa.x(), fa.y(), fb.x(), fb.y(), degrees, pair[0].width);
    }

    /** Counts matches whose first point, turned about the image centre, lands within tolerance of the second. */
    static Outcome count(List<BruteForceMatcher.Match> matches, float[] ax, float[] ay, float[] bx, float[] by,
                         double degrees, int side) {
        double c = (side - 1) / 2.0;
        double cos = Math.cos(Math.toRadians(degrees));
        double sin = Math.sin(Math.toRadians(degrees));
        int correct = 0;
        for (BruteForceMatcher.Match m : matches) {
            double dx = ax[m.first()] - c;
            double dy = ay[m.first()] - c;
            double ex = c + cos * dx - sin * dy - bx[m.second()];
            double ey = c + sin * dx + cos * dy - by[m.second()];
            if (Math.hypot(ex, ey) <= CORRECT_PX) {
                correct++;
            }
        }
        return new Outcome(matches.size(), correct);
    }

    /**
     * The image turned by {@code angle} (image axes, y down) about its centre, bilinear; pixels whose source falls
     * outside are 0 (they lie outside the part the test keeps).
     */
    static GrayU8 rotate(GrayU8 src, double angle) {
        GrayU8 dst = new GrayU8(src.width, src.height);
        double cx = (src.width - 1) / 2.0;
        double cy = (src.height - 1) / 2.0;
        double cos = Math.cos(angle);
        double sin = Math.sin(angle);
        for (int y = 0; y < dst.height; y++) {
            for (int x = 0; x < dst.width; x++) {
                double sx = cx + cos * (x - cx) + sin * (y - cy);
                double sy = cy - sin * (x - cx) + cos * (y - cy);
                dst.set(x, y, (int) Math.round(bilinear(src, sx, sy)));
            }
        }
        return dst;
    }

    private static double bilinear(GrayU8 img, double x, double y) {
        int x0 = (int) Math.floor(x);
        int y0 = (int) Math.floor(y);
        if (x0 < 0 || y0 < 0 || x0 >= img.width - 1 || y0 >= img.height - 1) {
            return 0;
        }
        double fx = x - x0;
        double fy = y - y0;
        double top = img.get(x0, y0) * (1 - fx) + img.get(x0 + 1, y0) * fx;
        double bottom = img.get(x0, y0 + 1) * (1 - fx) + img.get(x0 + 1, y0 + 1) * fx;
        return top * (1 - fy) + bottom * fy;
    }
}
