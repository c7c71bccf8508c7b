package revisit.pipeline;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import revisit.camera.CameraModel;
import revisit.index.RevisitDatabase;
import revisit.index.RevisitSearch;
import revisit.index.WordWeights;
import revisit.verification.PairVerifier;
import revisit.verification.Verification;
import revisit.vocabulary.Vocabulary;

/**
 * Re-runs the ordered part of a scan (database, consistency, verification, acceptance) over frames whose features
 * and words were already computed, for many settings in a row. Geometric verifications are cached per frame pair
 * and inlier threshold, computed once with a low inlier minimum and no inlier-ratio bar; each setting's minimum,
 * ratio and score rules are then applied to the cached result, so a sweep over those costs no new RANSAC runs.
 */
public final class Replay {

    private final List<FrameRecord> records;
    private final WordWeights weights;
    private final Optional<CameraModel> camera;
    private final int minInliersFloor;
    private final Map<String, Verification> cache = new HashMap<>();
    private final Map<Double, PairVerifier> verifiers = new HashMap<>();

    /**
     * @param records         frames in scan order (e.g. from a scan's checkpoint)
     * @param vocabulary      the vocabulary the words came from (for its weights)
     * @param camera          camera of the frames, if calibrated
     * @param minInliersFloor lowest inlier minimum any replayed setting will ask for, >= 5
     */
    public Replay(List<FrameRecord> records, Vocabulary vocabulary, Optional<CameraModel> camera,
                  int minInliersFloor) {
        if (minInliersFloor < 5) {
            throw new IllegalArgumentException("minInliersFloor must be >= 5 (the minimal sample), was "
                    + minInliersFloor);
        }
        this.records = List.copyOf(records);
        this.weights = new WordWeights(vocabulary.wordCount(), vocabulary.weights());
        this.camera = camera;
        this.minInliersFloor = minInliersFloor;
    }

    /** Frames replayed. */
    public int size() {
        return records.size();
    }

    /** Verifications computed so far (the cache size). */
    public int verificationsComputed() {
        return cache.size();
    }

    /** Runs the ordered steps with one configuration; traces and closures as a scan would give them. */
    public ScanResult run(ScanConfig config) {
        if (config.verification().minInliers() < minInliersFloor) {
            throw new IllegalArgumentException("minInliers " + config.verification().minInliers()
                    + " is below the replay's floor " + minInliersFloor);
        }
        StageTimes times = new StageTimes();
        RevisitSearch search = new RevisitSearch(new RevisitDatabase(weights, config.index()));
        double threshold = config.verification().inlierThresholdPx();
        PairVerifier verifier = verifiers.computeIfAbsent(threshold,
                t -> new PairVerifier(config.verification().withMinInliers(minInliersFloor).withMinInlierRatio(0)));
        QueryStep step = new QueryStep(config, search, false, times, (q, m) -> CheckedPair.of(cache.computeIfAbsent(
                q.sequence() + ":" + q.frame() + ">" + m.sequence() + ":" + m.frame() + "@" + threshold,
                k -> verifier.verify(q.features(), q.nodes(), m.features(), m.nodes(), camera))));
        for (FrameRecord r : records) {
            step.handle(r);
        }
        return new ScanResult(step.closures(), step.traces(), List.of(), List.of(), times, 0, "");
    }
}
