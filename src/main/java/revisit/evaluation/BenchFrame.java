package revisit.evaluation;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.Frame;
import revisit.io.FrameSource;
import revisit.io.FrameSourceOptions;
import revisit.io.FrameSources;
import revisit.vocabulary.Vocabulary;

/**
 * One frame prepared for pairwise benchmarks: its features and the vocabulary node of each feature at the
 * matching level (what the scan's node-restricted matching uses).
 *
 * @param key      sequence name and frame number (the frame's index in its full sequence)
 * @param time     timestamp, seconds
 * @param features features of the frame
 * @param nodes    vocabulary node per feature at the matching level
 */
public record BenchFrame(FrameKey key, double time, FrameFeatures features, int[] nodes) {

    /**
     * Reads every {@code stride}-th frame of a sequence and extracts features and nodes, on the calling thread.
     *
     * @param input     image folder, frame list or video
     * @param name      sequence name for the frame keys
     * @param options   stride, frame cap and frame rate, as the scan applies them
     * @param features  feature settings of the scan
     * @param vocabulary vocabulary of the scan
     * @param nodeLevel matching node level of the scan
     */
    public static List<BenchFrame> read(Path input, String name, FrameSourceOptions options, FeatureConfig features,
                                        Vocabulary vocabulary, int nodeLevel) {
        FeatureExtractor extractor = new FeatureExtractor(features);
        List<BenchFrame> out = new ArrayList<>();
        try (FrameSource source = FrameSources.open(input, options)) {
            for (Optional<Frame> f = source.next(); f.isPresent(); f = source.next()) {
                FrameFeatures ff = extractor.extract(f.get().image());
                int[] words = new int[ff.count()];
                int[] nodes = new int[ff.count()];
                vocabulary.lookup(ff, nodeLevel, words, nodes);
                out.add(new BenchFrame(new FrameKey(name, f.get().index()), f.get().timeSeconds(), ff, nodes));
            }
        }
        return out;
    }
}
