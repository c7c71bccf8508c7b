package revisit.index;

/**
 * Settings of the revisit database and its queries.
 *
 * @param scoreNorm             vector normalisation and score; default {@link ScoreNorm#L1}, which scored best in
 *                              Nistér and Stewénius, CVPR 2006
 * @param scope                 which sequences a query may match; default {@link QueryScope#ALL_SEQUENCES}
 * @param exclusionSeconds      frames of the query's own sequence closer in time than this are never returned,
 *                              seconds, typically 5-60; default 20 s, common practice for hand-held and vehicle
 *                              logs (the camera sees the same scene for that long without revisiting it)
 * @param exclusionFrames       frames of the query's own sequence closer in frame id than this are never
 *                              returned, frames, 0 (off) to a few thousand; default 0 (the time window applies)
 * @param minPredecessorScore   floor on the normaliser {@code s(q, q_prev)}, score units in (0, 1], typically
 *                              0.005-0.05; below it the query is reported but cannot confirm a revisit. Default 0.01,
 *                              set here (no published value): about a tenth of typical neighbour scores; tune it
 *                              on labelled data
 * @param minNormalisedScore    candidates below this normalised score join no group, typically 0.2-0.5; default
 *                              0.3, the threshold Gálvez-López and Tardós, IEEE T-RO 2012 report (from memory)
 * @param groupGapSeconds       candidates of one sequence closer in time than this (chained) form one group,
 *                              seconds, typically 0.5-5; default 2 s, common practice (a few frames at 1-10 Hz)
 * @param consistencyQueries    a revisit is confirmed when the groups chosen for this many previous queries and the
 *                              current one lie near each other in a chain, queries, 0-10; default 3, as published by
 *                              Gálvez-López and Tardós, IEEE T-RO 2012
 * @param consistencyGapSeconds two chosen groups "lie near" when their time spans overlap or are at most this far
 *                              apart, seconds, typically 1-10; default 2 s, common practice
 * @param maxCandidates         candidates returned per query, best first, 1-1000; default 50, common practice
 * @param maxWordFrameFraction  stop list (Sivic and Zisserman, "Video Google", ICCV 2003): a query word whose
 *                              posting list holds more than this fraction of the database's frames (and more than
 *                              {@code stopListMinFrames}) is a stop word for that query, left out of its raw scores
 *                              and of its normaliser alike. In (0, 1]; 1 = no stop list, exact scores. Default 0.05,
 *                              measured here (docs/INDEX.md): at 100k synthetic frames walking every list cost 10.6 ms
 *                              CPU per query (p50), 0.05 cost under 2 ms at p99 and left about 10% of the query weight
 *                              out without changing which frame ranked first
 * @param stopListMinFrames     posting lists this long or shorter are always walked, frames, 0 to 10^6; default
 *                              2000 (walking 2000 postings costs a few microseconds), so small databases are scored
 *                              exactly
 */
public record IndexConfig(ScoreNorm scoreNorm, QueryScope scope, double exclusionSeconds, int exclusionFrames,
                          double minPredecessorScore, double minNormalisedScore, double groupGapSeconds,
                          int consistencyQueries, double consistencyGapSeconds, int maxCandidates,
                          double maxWordFrameFraction, int stopListMinFrames) {

    public IndexConfig {
        if (scoreNorm == null || scope == null) {
            throw new IllegalArgumentException("scoreNorm and scope must be given");
        }
        requireRange("exclusionSeconds", exclusionSeconds, 0, 1e9);
        requireRange("exclusionFrames", exclusionFrames, 0, Integer.MAX_VALUE);
        if (!(minPredecessorScore > 0 && minPredecessorScore <= 1)) {
            throw new IllegalArgumentException("minPredecessorScore must be in (0, 1], was " + minPredecessorScore
                    + "; typical 0.01");
        }
        requireRange("minNormalisedScore", minNormalisedScore, 0, 1e6);
        requireRange("groupGapSeconds", groupGapSeconds, 0, 1e9);
        requireRange("consistencyQueries", consistencyQueries, 0, 1000);
        requireRange("consistencyGapSeconds", consistencyGapSeconds, 0, 1e9);
        requireRange("maxCandidates", maxCandidates, 1, 1_000_000);
        if (!(maxWordFrameFraction > 0 && maxWordFrameFraction <= 1)) {
            throw new IllegalArgumentException("maxWordFrameFraction must be in (0, 1], was " + maxWordFrameFraction
                    + "; use 1 to walk every posting list");
        }
        requireRange("stopListMinFrames", stopListMinFrames, 0, 1_000_000);
    }

    private static void requireRange(String name, double value, double min, double max) {
        if (!(value >= min && value <= max)) {
            throw new IllegalArgumentException(name + " must be in [" + min + ", " + max + "], was " + value);
        }
    }

    /** The defaults documented on each field. */
    public static IndexConfig defaults() {
        return new IndexConfig(ScoreNorm.L1, QueryScope.ALL_SEQUENCES, 20.0, 0, 0.01, 0.3, 2.0, 3, 2.0, 50, 0.05,
                2000);
    }

    public IndexConfig withScoreNorm(ScoreNorm value) {
        return new IndexConfig(value, scope, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates,
                maxWordFrameFraction, stopListMinFrames);
    }

    public IndexConfig withScope(QueryScope value) {
        return new IndexConfig(scoreNorm, value, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates,
                maxWordFrameFraction, stopListMinFrames);
    }

    public IndexConfig withExclusionSeconds(double value) {
        return new IndexConfig(scoreNorm, scope, value, exclusionFrames, minPredecessorScore, minNormalisedScore,
                groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates, maxWordFrameFraction,
                stopListMinFrames);
    }

    public IndexConfig withExclusionFrames(int value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, value, minPredecessorScore, minNormalisedScore,
                groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates, maxWordFrameFraction,
                stopListMinFrames);
    }

    public IndexConfig withMinPredecessorScore(double value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, value, minNormalisedScore,
                groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates, maxWordFrameFraction,
                stopListMinFrames);
    }

    public IndexConfig withMinNormalisedScore(double value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, minPredecessorScore, value,
                groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates, maxWordFrameFraction,
                stopListMinFrames);
    }

    public IndexConfig withGroupGapSeconds(double value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, value, consistencyQueries, consistencyGapSeconds, maxCandidates,
                maxWordFrameFraction, stopListMinFrames);
    }

    public IndexConfig withConsistencyQueries(int value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, groupGapSeconds, value, consistencyGapSeconds, maxCandidates,
                maxWordFrameFraction, stopListMinFrames);
    }

    public IndexConfig withConsistencyGapSeconds(double value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, groupGapSeconds, consistencyQueries, value, maxCandidates, maxWordFrameFraction,
                stopListMinFrames);
    }

    public IndexConfig withMaxCandidates(int value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, groupGapSeconds, consistencyQueries, consistencyGapSeconds, value,
                maxWordFrameFraction, stopListMinFrames);
    }

    public IndexConfig withMaxWordFrameFraction(double value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates, value,
                stopListMinFrames);
    }

    public IndexConfig withStopListMinFrames(int value) {
        return new IndexConfig(scoreNorm, scope, exclusionSeconds, exclusionFrames, minPredecessorScore,
                minNormalisedScore, groupGapSeconds, consistencyQueries, consistencyGapSeconds, maxCandidates,
                maxWordFrameFraction, value);
    }
}
