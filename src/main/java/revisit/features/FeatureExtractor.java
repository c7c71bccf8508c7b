package revisit.features;

import boofcv.struct.image.GrayU8;
import java.util.Objects;

/**
 * ORB-style features of one grey image (Rublee, Rabaud, Konolige and Bradski, "ORB: an efficient alternative to
 * SIFT or SURF", ICCV 2011): FAST corners on every level of a scale pyramid, ranked by the Harris measure, a
 * quota per level that shrinks geometrically with scale, spread over a grid, oriented by the intensity centroid and
 * described by steered 256-bit BRIEF.
 *
 * <p>Level {@code l} receives {@code N (1 - f) f^l / (1 - f^L)} of the {@code N = maxFeatures} features, with
 * {@code f = 1 / scaleFactor} and {@code L} the levels large enough to hold a feature; what a level cannot fill goes
 * to the other levels, finest first. Coordinates are reported in level-0 pixels.
 *
 * <p>An instance keeps scratch buffers (pyramid, candidate lists, pattern table) and reuses them from frame to
 * frame, so it must not be shared between threads: use one per thread. Results are deterministic: the same image
 * gives the same features on every call, on every instance with the same configuration.
 */
public final class FeatureExtractor {

    private final FeatureConfig config;
    private final ScalePyramid pyramid;
    private final CornerDetector detector;
    private final SpreadSelector selector;
    private final SteeredBrief brief;
    /**
     * FAST-ranked candidates per feature that get a Harris score; OpenCV's ORB keeps twice its target count
     * before Harris ranking (from memory).
     */
    private static final int RANKED_PER_FEATURE = 2;

    private final LevelCorners[] corners;
    private final LevelCorners ranked = new LevelCorners();
    private final int[] quota;
    private int[] chosen = new int[0];
    /** Per chosen keypoint of the current level: pixel index in the smoothed level and orientation bin. */
    private int[] centre = new int[0];
    private int[] bin = new int[0];

    /** @param config settings, see {@link FeatureConfig} */
    public FeatureExtractor(FeatureConfig config) {
        this.config = Objects.requireNonNull(config, "config");
        this.pyramid = new ScalePyramid(config.levels(), config.scaleFactor(), 2 * config.borderPx() + 1,
                config.blurSigma());
        this.detector = new CornerDetector(config);
        this.selector = new SpreadSelector(config.gridCellPx(), config.cellCap());
        this.brief = new SteeredBrief(config.patternSeed(), config.angleBins());
        this.corners = new LevelCorners[config.levels()];
        for (int l = 0; l < corners.length; l++) {
            corners[l] = new LevelCorners();
        }
        this.quota = new int[config.levels()];
    }

    /** The settings this extractor was built with. */
    public FeatureConfig config() {
        return config;
    }

    /**
     * Detects and describes the features of {@code image}.
     *
     * @param image grey image, any size; not modified
     * @return the features, at most {@code maxFeatures}; count 0 for a blank, featureless or tiny image
     */
    public FrameFeatures extract(GrayU8 image) {
        Objects.requireNonNull(image, "image");
        pyramid.process(image);
        int levels = pyramid.usableLevels();
        for (int l = 0; l < levels; l++) {
            detector.detect(pyramid.raw(l), pyramid.rows(l), config.borderPx(), corners[l]);
        }
        int total = assignQuotas(levels);
        if (total == 0) {
            return FrameFeatures.empty();
        }
        return describe(levels, total);
    }

    /** Fills {@link #quota} for the first {@code levels} levels; returns their sum. */
    private int assignQuotas(int levels) {
        double f = 1.0 / config.scaleFactor();
        double first = config.maxFeatures() * (1 - f) / (1 - Math.pow(f, levels));
        int assigned = 0;
        for (int l = 0; l < levels; l++) {
            int wanted = l == levels - 1 ? config.maxFeatures() - assigned
                    : (int) Math.round(first * Math.pow(f, l));
            wanted = Math.max(0, Math.min(wanted, config.maxFeatures() - assigned));
            quota[l] = Math.min(wanted, corners[l].count());
            assigned += wanted;
        }
        int total = 0;
        for (int l = 0; l < levels; l++) {
            total += quota[l];
        }
        for (int l = 0; l < levels && total < config.maxFeatures(); l++) {
            int extra = Math.min(corners[l].count() - quota[l], config.maxFeatures() - total);
            quota[l] += extra;
            total += extra;
        }
        return total;
    }

    /**
     * Candidates of level {@code l} to pick the quota from: with Harris ranking, the best
     * {@value #RANKED_PER_FEATURE} x quota by FAST score (spread over the grid) re-scored by the Harris measure.
     */
    private LevelCorners rank(int l, GrayU8 raw) {
        LevelCorners c = corners[l];
        if (config.cornerScore() != FeatureConfig.CornerScore.HARRIS) {
            return c;
        }
        int n = selector.select(c, RANKED_PER_FEATURE * quota[l], raw.width, raw.height, chosen);
        ranked.clear();
        for (int k = 0; k < n; k++) {
            int i = chosen[k];
            ranked.add(c.x(i), c.y(i), (float) detector.harrisScore(raw, c.x(i), c.y(i)));
        }
        return ranked;
    }

    private FrameFeatures describe(int levels, int total) {
        FrameFeatures out = new FrameFeatures(total, new float[total], new float[total], new float[total],
                new int[total], new float[total], new float[total], new long[total * FrameFeatures.STRIDE]);
        if (chosen.length < RANKED_PER_FEATURE * config.maxFeatures()) {
            chosen = new int[RANKED_PER_FEATURE * config.maxFeatures()];
            centre = new int[config.maxFeatures()];
            bin = new int[config.maxFeatures()];
        }
        brief.prepare(pyramid.smoothStride());
        int n = 0;
        for (int l = 0; l < levels; l++) {
            n = describeLevel(l, out, n);
        }
        return n == total ? out : new FrameFeatures(n, out.x(), out.y(), out.angleRad(), out.level(), out.scale(),
                out.response(), out.descriptors());
    }

    /**
     * Picks the features of level {@code l} and writes them into {@code out} from index {@code n}: position,
     * orientation and score first, then the smoothed level around them ({@link ScalePyramid#smoothPatches}) and the
     * descriptors. Returns the index after the last feature written.
     */
    private int describeLevel(int l, FrameFeatures out, int n) {
        GrayU8 raw = pyramid.raw(l);
        LevelCorners c = rank(l, raw);
        int picked = selector.select(c, quota[l], raw.width, raw.height, chosen);
        double sx = pyramid.toLevel0X(l);
        double sy = pyramid.toLevel0Y(l);
        float levelScale = (float) Math.pow(config.scaleFactor(), l);
        int stride = pyramid.smoothStride();
        pyramid.clearPatches();
        for (int k = 0; k < picked; k++) {
            int i = chosen[k];
            int px = c.x(i);
            int py = c.y(i);
            double theta = IntensityCentroid.orientation(raw, px, py);
            out.x()[n + k] = (float) ((px + 0.5) * sx - 0.5);
            out.y()[n + k] = (float) ((py + 0.5) * sy - 0.5);
            out.angleRad()[n + k] = (float) theta;
            out.level()[n + k] = l;
            out.scale()[n + k] = levelScale;
            out.response()[n + k] = c.score(i);
            centre[k] = py * stride + px;
            bin[k] = brief.bin(theta);
            pyramid.markPatch(l, px, py);
        }
        byte[] smoothed = pyramid.smoothPatches(l);
        for (int k = 0; k < picked; k++) {
            brief.describe(smoothed, centre[k], bin[k], out.descriptors(), (n + k) * FrameFeatures.STRIDE);
        }
        return n + picked;
    }
}
