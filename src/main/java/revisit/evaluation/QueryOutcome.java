package revisit.evaluation;

import java.util.Optional;

/**
 * What the detector did with one query frame; the pipeline fills one per query.
 *
 * <p>A query is <em>reported</em> as a revisit at acceptance threshold {@code t} when it reached
 * {@link StageReached#VERIFIED} and its candidate's score is {@code >= t}. "Accepted by verification" is
 * {@code stage == VERIFIED}.
 *
 * @param query     the query frame
 * @param candidate the best candidate, empty exactly when the stage is {@link StageReached#LOOKED_UP}
 * @param stage     the furthest stage the query reached
 */
public record QueryOutcome(FrameKey query, Optional<Candidate> candidate, StageReached stage) {

    public QueryOutcome {
        if (query == null || candidate == null || stage == null) {
            throw new IllegalArgumentException("query, candidate and stage must not be null");
        }
        if (candidate.isEmpty() != (stage == StageReached.LOOKED_UP)) {
            throw new IllegalArgumentException("query " + query + ": a candidate must be present exactly when the"
                    + " stage is past LOOKED_UP (stage " + stage + ")");
        }
    }

    /** A query for which the index proposed nothing. */
    public static QueryOutcome noCandidate(FrameKey query) {
        return new QueryOutcome(query, Optional.empty(), StageReached.LOOKED_UP);
    }

    /** A query whose best candidate reached {@code stage} (not LOOKED_UP). */
    public static QueryOutcome of(FrameKey query, FrameKey match, double score, StageReached stage) {
        return new QueryOutcome(query, Optional.of(new Candidate(match, score)), stage);
    }

    /** Whether the candidate passed geometric verification. */
    public boolean verified() {
        return stage == StageReached.VERIFIED;
    }

    /** Whether the query is reported as a revisit at acceptance threshold {@code threshold}. */
    public boolean reportedAt(double threshold) {
        return verified() && candidate.orElseThrow().score() >= threshold;
    }
}
