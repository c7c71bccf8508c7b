package revisit.index;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Queries a {@link RevisitDatabase} with the frames of one stream, in order, and keeps what the queries of that
 * stream share: the previous query's vector (the normaliser) and the chain of chosen groups (temporal consistency).
 *
 * <p>Per query: rank frames by raw score {@code s(q, c)} outside the exclusion window (leaving out the query's stop
 * words, see {@link IndexConfig#maxWordFrameFraction()}); normalise by
 * {@code eta = s(q, c) / max(s(q, q_prev), floor)} where {@code q_prev} is the previous query of the same sequence
 * (Gálvez-López and Tardós, IEEE T-RO 2012), scored over the same words; group candidates with
 * {@code eta >= minNormalisedScore} that are neighbours in time ({@link MatchGrouping}); choose the best group;
 * check it against the groups chosen before ({@link TemporalConsistency}). To merge sessions, query one sequence's
 * frames against a database holding another (set {@link QueryScope#OTHER_SEQUENCES} when the database also holds
 * the query's own sequence).
 *
 * <p>The stream state is not saved with the database: after loading, the first {@code consistencyQueries} queries
 * cannot confirm a revisit. Not thread-safe.
 */
public final class RevisitSearch {

    private final RevisitDatabase database;
    private final IndexConfig config;
    private final TemporalConsistency consistency;
    private WordVector previous;
    private int previousSequence = -1;

    /** A search with the database's own settings. */
    public RevisitSearch(RevisitDatabase database) {
        this(database, database.config());
    }

    /**
     * @param database database to query (also the one {@link #addAndQuery} adds to)
     * @param config   query settings; its score normalisation must be the database's
     */
    public RevisitSearch(RevisitDatabase database, IndexConfig config) {
        if (config.scoreNorm() != database.config().scoreNorm()) {
            throw new IllegalArgumentException("search uses " + config.scoreNorm() + " scores but the database "
                    + "stores " + database.config().scoreNorm() + " vectors; use the database's score norm");
        }
        this.database = database;
        this.config = config;
        this.consistency = new TemporalConsistency(config.consistencyQueries(), config.consistencyGapSeconds());
    }

    /** Queries with a frame, building its vector. The frame is not added. */
    public QueryResult query(FrameWords frame) {
        return query(frame, database.vectorOf(frame.words()));
    }

    /**
     * Queries and then adds the frame, building its vector once.
     *
     * @param frame a frame not yet in the database
     */
    public QueryResult addAndQuery(FrameWords frame) {
        if (database.contains(frame.sequenceId(), frame.frameId())) {
            throw new IllegalArgumentException("frame " + frame.frameId() + " of sequence " + frame.sequenceId()
                    + " is already in the database; query it with query(..) instead");
        }
        WordVector vector = database.vectorOf(frame.words());
        QueryResult result = query(frame, vector);
        database.add(frame, vector);
        return result;
    }

    /**
     * Queries with an already built vector. The frame (its sequence, id and time place the exclusion window) is not
     * added.
     *
     * @param frame  the query frame
     * @param vector its vector, from {@link RevisitDatabase#vectorOf}
     */
    public QueryResult query(FrameWords frame, WordVector vector) {
        if (frame.sequenceId() != previousSequence) {
            previous = null;
            consistency.reset();
        }
        RankedFrames ranked = database.rank(vector, frame, config);
        OptionalDouble predecessor = previous == null ? OptionalDouble.empty()
                : OptionalDouble.of(vector.similarity(previous, ranked.stopWords()));
        double normaliser = Math.max(predecessor.orElse(0), config.minPredecessorScore());
        List<Candidate> candidates = new ArrayList<>(ranked.size());
        List<Candidate> strong = new ArrayList<>();
        for (int i = 0; i < ranked.size(); i++) {
            double raw = ranked.scores()[i];
            Candidate c = database.candidate(ranked.slots()[i], raw, raw / normaliser);
            candidates.add(c);
            if (c.normalisedScore() >= config.minNormalisedScore()) {
                strong.add(c);
            }
        }
        List<MatchGroup> groups = MatchGrouping.group(strong, config.groupGapSeconds());
        Consistency state = consistency.update(groups.isEmpty() ? Optional.empty() : Optional.of(groups.get(0)),
                weakness(predecessor), config.minNormalisedScore());
        previous = vector;
        previousSequence = frame.sequenceId();
        return new QueryResult(candidates, groups, predecessor, normaliser, ranked.skippedWeight(), state);
    }

    private Optional<String> weakness(OptionalDouble predecessor) {
        if (predecessor.isEmpty()) {
            return Optional.of("first query of the sequence: no predecessor to normalise by");
        }
        if (predecessor.getAsDouble() < config.minPredecessorScore()) {
            return Optional.of("score against the predecessor " + predecessor.getAsDouble()
                    + " is below the floor " + config.minPredecessorScore());
        }
        return Optional.empty();
    }
}
