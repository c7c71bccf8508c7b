package revisit.features;

import boofcv.alg.feature.detect.intensity.impl.FastCornerInterface;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner10_U8;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner11_U8;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner12_U8;
import boofcv.alg.feature.detect.intensity.impl.ImplFastCorner9_U8;
import boofcv.misc.DiscretizedCircle;
import boofcv.struct.image.GrayU8;
import java.util.Arrays;

/**
 * FAST corners of one level (Rosten, Porter and Drummond, IEEE TPAMI 2010) with 3x3 non-maximum suppression on the
 * FAST score over dark and bright corners together, and the Harris measure (Harris and Stephens, 1988) that ORB
 * ranks its corners by.
 *
 * <p>The segment test and the score are BoofCV's ({@link ImplFastCorner9_U8} and its siblings, the code behind
 * {@code FactoryDetectPoint.createFast}). In front of it sits the high-speed pre-test of Rosten and Drummond (ECCV
 * 2006): an arc of 9 or more of the 16 circle pixels always contains two neighbouring compass points (top, right,
 * bottom, left), so a pixel with neither top nor bottom, or neither left nor right, beyond the threshold on the same
 * side cannot be a corner and is skipped after 2 to 4 reads. The corner set is exactly BoofCV's (checked in
 * CornerDetectorTest); BoofCV's own full scan calls its decision tree on every pixel and took 5.5 ms on a
 * 640x480 photo against about 1 ms with the pre-test (FeatureExtractionBench machine, see docs/FEATURES.md).
 * BoofCV's detector is not built through the factory because that picks a multi-threaded variant from the global
 * {@code BoofConcurrency} flag and splits its feature limit between dark and bright corners; the project
 * parallelises per frame and selects features itself. Not thread-safe: one instance per extractor.
 */
final class CornerDetector {

    /** Radius of the FAST circle, pixels. */
    private static final int FAST_RADIUS = 3;
    /** Half side of the Harris window (7x7, as in OpenCV's ORB, from memory). */
    private static final int HARRIS_RADIUS = 3;

    private final FastCornerInterface<GrayU8> segmentTest;
    private final int threshold;
    private final double harrisK;
    private int stride = -1;
    private int[] circle = new int[0];
    /** FAST score per level pixel (row stride = level width); zero except at the current candidates. */
    private float[] scores = new float[0];
    private int[] candidates = new int[1024];

    CornerDetector(FeatureConfig config) {
        this.segmentTest = fastHelper(config.fastArc(), config.fastThreshold());
        this.threshold = config.fastThreshold();
        this.harrisK = config.harrisK();
    }

    private static FastCornerInterface<GrayU8> fastHelper(int arc, int threshold) {
        return switch (arc) {
            case 9 -> new ImplFastCorner9_U8(threshold);
            case 10 -> new ImplFastCorner10_U8(threshold);
            case 11 -> new ImplFastCorner11_U8(threshold);
            case 12 -> new ImplFastCorner12_U8(threshold);
            default -> throw new IllegalArgumentException("FAST arc " + arc + " not supported; use 9..12");
        };
    }

    /**
     * Finds the FAST corners of {@code level} at least {@code border} pixels from every edge that survive 3x3
     * non-maximum suppression; their score is the FAST score.
     *
     * @param level  raw level image, not modified
     * @param border margin, level pixels (at least {@value #FAST_RADIUS} + 1)
     * @param out    cleared and filled with the corners in raster order, level pixels
     */
    void detect(GrayU8 level, int border, LevelCorners out) {
        out.clear();
        int w = level.width;
        if (w - 2 * border < 1 || level.height - 2 * border < 1) {
            return;
        }
        if (level.stride != stride) {
            stride = level.stride;
            circle = DiscretizedCircle.imageOffsets(FAST_RADIUS, stride);
        }
        if (scores.length < w * level.height) {
            scores = new float[w * level.height];
        }
        segmentTest.setImage(level, circle);
        int found = 0;
        for (int y = border; y < level.height - border; y++) {
            found = scanRow(level, y, border, found);
        }
        for (int k = 0; k < found; k++) {
            int p = candidates[k];
            if (isPeak(p, w)) {
                out.add(p % w, p / w, scores[p]);
            }
        }
        for (int k = 0; k < found; k++) {
            scores[candidates[k]] = 0;
        }
    }

    /** Runs the pre-test and the segment test along row {@code y}; returns the new candidate count. */
    private int scanRow(GrayU8 level, int y, int border, int found) {
        byte[] d = level.data;
        int s3 = 3 * level.stride;
        int t = threshold;
        int i = level.startIndex + y * level.stride + border;
        int p = y * level.width + border;
        for (int x = border; x < level.width - border; x++, i++, p++) {
            int c = d[i] & 0xFF;
            int up = d[i - s3] & 0xFF;
            int down = d[i + s3] & 0xFF;
            boolean bright = up > c + t || down > c + t;
            boolean dark = up < c - t || down < c - t;
            if (!(bright || dark)) {
                continue;
            }
            int left = d[i - 3] & 0xFF;
            int right = d[i + 3] & 0xFF;
            bright &= left > c + t || right > c + t;
            dark &= left < c - t || right < c - t;
            if (!(bright || dark)) {
                continue;
            }
            int result = segmentTest.checkPixel(i);
            if (result != 0) {
                scores[p] = result > 0 ? segmentTest.scoreUpper(i) : -segmentTest.scoreLower(i);
                if (found == candidates.length) {
                    candidates = Arrays.copyOf(candidates, 2 * found);
                }
                candidates[found++] = p;
            }
        }
        return found;
    }

    /** Strict 3x3 maximum of the score; of equal neighbours the first in raster order wins. */
    private boolean isPeak(int p, int w) {
        float s = scores[p];
        return s > scores[p - w - 1] && s > scores[p - w] && s > scores[p - w + 1] && s > scores[p - 1]
                && s >= scores[p + 1] && s >= scores[p + w - 1] && s >= scores[p + w] && s >= scores[p + w + 1];
    }

    /**
     * Harris measure det(M) - k trace(M)^2 of the 7x7 window of Sobel gradients around (x, y), gradients in grey
     * levels per pixel and M averaged over the window.
     */
    double harrisScore(GrayU8 img, int x, int y) {
        byte[] d = img.data;
        int s = img.stride;
        long sxx = 0;
        long syy = 0;
        long sxy = 0;
        for (int dy = -HARRIS_RADIUS; dy <= HARRIS_RADIUS; dy++) {
            int row = img.startIndex + (y + dy) * s + x;
            for (int dx = -HARRIS_RADIUS; dx <= HARRIS_RADIUS; dx++) {
                int i = row + dx;
                int gx = (d[i - s + 1] & 0xFF) + 2 * (d[i + 1] & 0xFF) + (d[i + s + 1] & 0xFF)
                        - (d[i - s - 1] & 0xFF) - 2 * (d[i - 1] & 0xFF) - (d[i + s - 1] & 0xFF);
                int gy = (d[i + s - 1] & 0xFF) + 2 * (d[i + s] & 0xFF) + (d[i + s + 1] & 0xFF)
                        - (d[i - s - 1] & 0xFF) - 2 * (d[i - s] & 0xFF) - (d[i - s + 1] & 0xFF);
                sxx += gx * gx;
                syy += gy * gy;
                sxy += gx * gy;
            }
        }
        int n = (2 * HARRIS_RADIUS + 1) * (2 * HARRIS_RADIUS + 1);
        double norm = 1.0 / (64.0 * n);
        double a = sxx * norm;
        double b = syy * norm;
        double c = sxy * norm;
        return a * b - c * c - harrisK * (a + b) * (a + b);
    }
}
