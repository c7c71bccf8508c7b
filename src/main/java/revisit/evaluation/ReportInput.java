package revisit.evaluation;

import java.util.List;
import java.util.Optional;
import revisit.io.StampedPose;

/**
 * What goes into an evaluation report. Only the title, the result and the labels are required.
 *
 * @param title      heading of the report
 * @param result     the evaluation to show
 * @param labels     the labels it was measured against
 * @param similarity pooled similarity scores for the heat map, if the pipeline recorded them
 * @param poses      ground-truth poses in scan order (one per frame of the labels' timeline), for the top view
 * @param pairs      image pairs to show as thumbnails (may be empty)
 * @param tuning     the sweep that chose the setting, if the report follows a tuning run
 */
public record ReportInput(String title, EvaluationResult result, RevisitLabels labels,
                          Optional<SimilarityMatrix> similarity, Optional<List<StampedPose>> poses,
                          List<ImagePair> pairs, Optional<TuningResult> tuning) {

    public ReportInput {
        if (title == null || result == null || labels == null || similarity == null || poses == null
                || pairs == null || tuning == null) {
            throw new IllegalArgumentException("report input fields must not be null (use Optional.empty())");
        }
        pairs = List.copyOf(pairs);
        poses = poses.map(List::copyOf);
        if (poses.isPresent() && poses.get().size() != labels.timeline().size()) {
            throw new IllegalArgumentException("need one pose per frame: " + poses.get().size() + " poses for "
                    + labels.timeline().size() + " frames");
        }
        if (similarity.isPresent() && similarity.get().frames() != labels.timeline().size()) {
            throw new IllegalArgumentException("similarity matrix covers " + similarity.get().frames()
                    + " frames, the labels " + labels.timeline().size());
        }
    }

    /** A report of a result and its labels only. */
    public static ReportInput of(String title, EvaluationResult result, RevisitLabels labels) {
        return new ReportInput(title, result, labels, Optional.empty(), Optional.empty(), List.of(),
                Optional.empty());
    }

    /** Copy with a similarity matrix. */
    public ReportInput withSimilarity(SimilarityMatrix value) {
        return new ReportInput(title, result, labels, Optional.of(value), poses, pairs, tuning);
    }

    /** Copy with ground-truth poses. */
    public ReportInput withPoses(List<StampedPose> value) {
        return new ReportInput(title, result, labels, similarity, Optional.of(value), pairs, tuning);
    }

    /** Copy with thumbnail pairs. */
    public ReportInput withPairs(List<ImagePair> value) {
        return new ReportInput(title, result, labels, similarity, poses, value, tuning);
    }

    /** Copy with the tuning run. */
    public ReportInput withTuning(TuningResult value) {
        return new ReportInput(title, result, labels, similarity, poses, pairs, Optional.of(value));
    }
}
