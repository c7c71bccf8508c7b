package revisit.pipeline;

import boofcv.struct.image.GrayU8;
import revisit.features.FeatureConfig;
import revisit.features.FrameFeatures;
import revisit.features.FeatureExtractor;
import revisit.vocabulary.Vocabulary;

/**
 * Turns one decoded frame into a {@link FrameRecord}: features, then words and matching nodes. One instance per
 * thread (the extractor keeps scratch buffers); the vocabulary lookup is thread-safe.
 */
final class FrameProcessor {

    private final FeatureExtractor extractor;
    private final Vocabulary vocabulary;
    private final int nodeLevel;
    private final StageTimes times;

    FrameProcessor(FeatureConfig features, Vocabulary vocabulary, int nodeLevel, StageTimes times) {
        this.extractor = new FeatureExtractor(features);
        this.vocabulary = vocabulary;
        this.nodeLevel = nodeLevel;
        this.times = times;
    }

    FrameRecord process(int sequence, int frame, double time, String name, GrayU8 image) {
        long t0 = System.nanoTime();
        FrameFeatures f = extractor.extract(image);
        long t1 = System.nanoTime();
        int[] words = new int[f.count()];
        int[] nodes = new int[f.count()];
        vocabulary.lookup(f, nodeLevel, words, nodes);
        long t2 = System.nanoTime();
        times.add(StageTimes.Stage.FEATURES, t1 - t0);
        times.add(StageTimes.Stage.WORDS, t2 - t1);
        return new FrameRecord(sequence, frame, time, name, f, words, nodes);
    }
}
