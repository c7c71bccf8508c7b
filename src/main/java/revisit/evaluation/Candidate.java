package revisit.evaluation;

/**
 * The best match the detector found for a query and the score it will be accepted or refused on.
 *
 * @param match the matched earlier frame
 * @param score acceptance score, higher = more confident (the pipeline's unit: normalised similarity or a
 *              verification confidence); finite
 */
public record Candidate(FrameKey match, double score) {

    public Candidate {
        if (match == null) {
            throw new IllegalArgumentException("match must not be null");
        }
        if (!Double.isFinite(score)) {
            throw new IllegalArgumentException("score must be finite, was " + score);
        }
    }
}
