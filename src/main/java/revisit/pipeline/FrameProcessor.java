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
        StageTimes.Mark t0 = StageTimes.mark();
        FrameFeatures f = extractor.extract(image);
        StageTimes.Mark t1 = times.stop(StageTimes.Stage.FEATURES, t0);
        int[] words = new int[f.count()];
        int[] nodes = new int[f.count()];
        vocabulary.lookup(f, nodeLevel, words, nodes);
        times.stop(StageTimes.Stage.WORDS, t1);
        return new FrameRecord(sequence, frame, time, name, f, words, nodes);
    }
}
