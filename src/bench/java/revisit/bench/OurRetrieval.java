package revisit.bench;

import java.util.ArrayList;
import java.util.List;
import org.openjdk.jol.info.GraphLayout;
import revisit.features.FrameFeatures;
import revisit.index.Candidate;
import revisit.index.FrameWords;
import revisit.index.IndexConfig;
import revisit.index.RevisitDatabase;
import revisit.index.RevisitSearch;
import revisit.index.WordWeights;
import revisit.vocabulary.Vocabulary;

/**
 * Our side of the retrieval comparison: descriptors to words and level nodes through {@link Vocabulary#lookup},
 * then {@link RevisitDatabase#add} or {@link RevisitSearch#query}, whose candidates (ranked by raw L1 score, the
 * exclusion window applied) are the answer. Add and query costs include the vocabulary lookup, as BoofCV's include
 * its tree descent.
 */
final class OurRetrieval implements RetrievalSystem {

    private final Vocabulary vocabulary;
    private final RevisitDatabase database;
    private final RevisitSearch search;
    private final int nodeLevel;
    private float[] zeros = new float[0];
    private int[] levels = new int[0];

    /**
     * @param vocabulary trained vocabulary
     * @param config     index settings (exclusion window, candidates, stop list)
     * @param nodeLevel  tree level whose nodes go to the direct index (the scan's matching level)
     */
    OurRetrieval(Vocabulary vocabulary, IndexConfig config, int nodeLevel) {
        this.vocabulary = vocabulary;
        this.database = new RevisitDatabase(new WordWeights(vocabulary.wordCount(), vocabulary.weights()), config);
        this.search = new RevisitSearch(database);
        this.nodeLevel = nodeLevel;
    }

    @Override
    public String name() {
        return "ours";
    }

    @Override
    public void add(DescriptorFrame frame) {
        database.add(words(frame));
    }

    @Override
    public List<Hit> query(DescriptorFrame frame, int limit) {
        FrameWords words = words(frame);
        List<Candidate> candidates = search.query(words, database.vectorOf(words.words())).candidates();
        List<Hit> hits = new ArrayList<>(Math.min(limit, candidates.size()));
        for (int i = 0; i < candidates.size() && i < limit; i++) {
            hits.add(new Hit(candidates.get(i).sequenceId(), candidates.get(i).frameId()));
        }
        return hits;
    }

    /** JOL's walk of the database's object graph minus the idf table, which belongs to the vocabulary. */
    @Override
    public long retainedBytes() {
        return GraphLayout.parseInstance(database).totalSize()
                - GraphLayout.parseInstance(database.weights()).totalSize();
    }

    private FrameWords words(DescriptorFrame frame) {
        int n = frame.count();
        if (zeros.length < n) {
            zeros = new float[n];
            levels = new int[n];
        }
        FrameFeatures features = new FrameFeatures(n, zeros, zeros, zeros, levels, zeros, zeros,
                frame.descriptors());
        int[] words = new int[n];
        int[] nodes = new int[n];
        vocabulary.lookup(features, nodeLevel, words, nodes);
        return new FrameWords(frame.sequence(), frame.frame(), frame.timeSeconds(), words, nodes);
    }
}
