package revisit.index;

/**
 * Scores every frame sharing a word with the query in one pass over the query words' posting lists, and keeps the
 * best. Words whose lists are longer than {@link #stopListLimit} are stop words for the query and are left out of
 * every score (Sivic and Zisserman, ICCV 2003); their ids are returned so the caller can leave them out of the
 * normaliser too. Scratch buffers (a float per slot and a list of touched slots) are reused between queries, so
 * one scorer serves one thread.
 *
 * <p>Per shared word the score gains {@link ScoreNorm#term}: {@code min(q_w, d_w)} for L1, {@code q_w d_w} for L2
 * (where {@code 1/Z_d} is applied once per frame at the end). A slot enters the touched list the first time its
 * accumulator leaves 0; every term is strictly positive ({@link WordWeights#MIN_WEIGHT}), so no slot enters twice.
 */
final class FrameScorer {

    private float[] accumulated = new float[0];
    private int[] touched = new int[0];
    private int[] skippedWords = new int[0];
    private final TopFrames top = new TopFrames();

    RankedFrames rank(WordVector query, FrameWords queryFrame, InvertedIndex index, FrameTable frames,
                      WordWeights weights, IndexConfig config) {
        reserve(frames.slotCount(), query.size());
        long limit = stopListLimit(config, frames.liveCount());
        int touchedCount = 0;
        int skipped = 0;
        double skippedWeight = 0;
        int[] words = query.words();
        float[] qWeights = query.weights();
        float[] idf = weights.table();
        for (int i = 0; i < words.length; i++) {
            int w = words[i];
            int length = index.length(w);
            if (length == 0) {
                continue;
            }
            if (length > limit) {
                skippedWords[skipped++] = i;
                skippedWeight += qWeights[i];
            } else if (query.norm() == ScoreNorm.L1) {
                touchedCount = walkL1(index, w, qWeights[i], idf[w], frames.inverseNorms(), touchedCount);
            } else {
                touchedCount = walkL2(index, w, qWeights[i] * idf[w], touchedCount);
            }
        }
        harvest(touchedCount, query.norm(), queryFrame, frames, config);
        return finish(skipped, skippedWeight, query);
    }

    /** Longest posting list walked: lists above it belong to stop words for this query. */
    static long stopListLimit(IndexConfig config, int liveFrames) {
        if (config.maxWordFrameFraction() >= 1) {
            return Long.MAX_VALUE;
        }
        return Math.max(config.stopListMinFrames(), (long) Math.floor(config.maxWordFrameFraction() * liveFrames));
    }

    private int walkL1(InvertedIndex index, int w, float qw, float idfW, float[] inverseNorms, int touchedCount) {
        int[] list = index.list(w);
        float[] acc = accumulated;
        int[] hit = touched;
        int n = touchedCount;
        for (int k = 1, end = list[0]; k <= end; k++) {
            int entry = list[k];
            int slot = entry >>> 8;
            int count = entry & 0xFF;
            if (count == 0xFF) {
                count = index.count(w, entry);
            }
            float stored = WordVector.weight(count, idfW, inverseNorms[slot]);
            float before = acc[slot];
            if (before == 0f) {
                hit[n++] = slot;
            }
            acc[slot] = before + Math.min(qw, stored);
        }
        return n;
    }

    private int walkL2(InvertedIndex index, int w, float qwIdf, int touchedCount) {
        int[] list = index.list(w);
        float[] acc = accumulated;
        int[] hit = touched;
        int n = touchedCount;
        for (int k = 1, end = list[0]; k <= end; k++) {
            int entry = list[k];
            int slot = entry >>> 8;
            int count = entry & 0xFF;
            if (count == 0xFF) {
                count = index.count(w, entry);
            }
            float before = acc[slot];
            if (before == 0f) {
                hit[n++] = slot;
            }
            acc[slot] = before + count * qwIdf;
        }
        return n;
    }

    /** Moves touched slots into the top list (zeroing the accumulators for the next query). */
    private void harvest(int touchedCount, ScoreNorm norm, FrameWords queryFrame, FrameTable frames,
                         IndexConfig config) {
        top.reset(config.maxCandidates());
        for (int t = 0; t < touchedCount; t++) {
            int slot = touched[t];
            double score = accumulated[slot];
            accumulated[slot] = 0f;
            if (norm == ScoreNorm.L2) {
                score *= frames.inverseNorm(slot);
            }
            if (top.mayEnter(score) && frames.eligible(slot, queryFrame, config)) {
                top.offer(slot, score);
            }
        }
    }

    private RankedFrames finish(int skipped, double skippedWeight, WordVector query) {
        int n = top.size();
        int[] slots = new int[n];
        double[] scores = new double[n];
        top.drainBestFirst(slots, scores);
        int[] stopWords = new int[skipped];
        for (int k = 0; k < skipped; k++) {
            stopWords[k] = query.words()[skippedWords[k]];
        }
        return new RankedFrames(slots, scores, stopWords, skippedWeight);
    }

    private void reserve(int slotCount, int queryWords) {
        if (accumulated.length < slotCount) {
            int capacity = Math.max(slotCount, accumulated.length + (accumulated.length >> 1));
            accumulated = new float[capacity];
            touched = new int[capacity];
        }
        if (skippedWords.length < queryWords) {
            skippedWords = new int[queryWords];
        }
    }
}
