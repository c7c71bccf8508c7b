package revisit.evaluation;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import revisit.index.ScoreNorm;
import revisit.index.WordVector;
import revisit.index.WordWeights;
import revisit.io.BadInputException;
import revisit.pipeline.FrameRecord;

/**
 * The similarity heat map of a finished scan, rebuilt from the words its checkpoint kept: the tf-idf score
 * (Nistér and Stewénius, CVPR 2006) of every frame against every earlier frame, pooled into a
 * {@link SimilarityMatrix}. Long scans are thinned to evenly spaced frames first so the cost stays bounded
 * (the pooled picture then shows the highest score among the frames kept in each cell).
 */
public final class ScanSimilarity {

    /** Most frames compared all-against-all (600 frames: 180k scores, well under a second). */
    public static final int DEFAULT_MAX_FRAMES = 600;

    private ScanSimilarity() {
    }

    /**
     * @param records       the scan's frame records (checkpoint order)
     * @param sequenceNames sequence names by id, as the scan's traces name them
     * @param timeline      the frames of the evaluation, giving each frame its global index
     * @param weights       the vocabulary weights the scan used
     * @param norm          score normalisation of the scan
     * @param maxFrames     most frames compared, >= 2
     * @param maxBins       cells per axis of the result
     * @throws BadInputException when a record holds a word the vocabulary does not have
     */
    public static SimilarityMatrix of(List<FrameRecord> records, List<String> sequenceNames, FrameTimeline timeline,
                                      WordWeights weights, ScoreNorm norm, int maxFrames, int maxBins) {
        if (maxFrames < 2) {
            throw new IllegalArgumentException("maxFrames must be at least 2, was " + maxFrames);
        }
        List<int[]> indexed = new ArrayList<>();
        for (int i = 0; i < records.size(); i++) {
            FrameRecord r = records.get(i);
            FrameKey key = new FrameKey(sequenceNames.get(r.sequence()), r.frame());
            if (timeline.contains(key)) {
                indexed.add(new int[]{timeline.globalIndex(key), i});
            }
        }
        indexed.sort(Comparator.comparingInt(a -> a[0]));
        int step = Math.max(1, (indexed.size() + maxFrames - 1) / maxFrames);
        List<int[]> kept = new ArrayList<>();
        List<WordVector> vectors = new ArrayList<>();
        for (int k = 0; k < indexed.size(); k += step) {
            FrameRecord r = records.get(indexed.get(k)[1]);
            checkWords(r, weights.wordCount());
            kept.add(indexed.get(k));
            vectors.add(WordVector.of(r.words(), weights, norm));
        }
        SimilarityMatrix m = new SimilarityMatrix(timeline.size(), maxBins);
        for (int i = 0; i < kept.size(); i++) {
            for (int j = 0; j < i; j++) {
                m.record(kept.get(i)[0], kept.get(j)[0], vectors.get(i).similarity(vectors.get(j)));
            }
        }
        return m;
    }

    private static void checkWords(FrameRecord r, int wordCount) {
        for (int w : r.words()) {
            if (w < 0 || w >= wordCount) {
                throw new BadInputException("frame " + r.name() + " of the scan's checkpoint holds word " + w
                        + " but the vocabulary has " + wordCount + "; pass the vocabulary the scan used");
            }
        }
    }
}
