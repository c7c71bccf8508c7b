package revisit.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.stream.Stream;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.io.ImageFiles;
import revisit.vocabulary.TrainingOrigin;
import revisit.vocabulary.TrainingSet;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyTrainer;

/** A small vocabulary (k=10, L=4) trained once per test run on the CC0 pixabay photos of ../shared/data. */
final class TestVocabulary {

    private static Vocabulary cached;

    private TestVocabulary() {
    }

    static synchronized Vocabulary small() throws IOException {
        if (cached == null) {
            Path photos = SharedData.require("photos/pixabay");
            FeatureExtractor fx = new FeatureExtractor(FeatureConfig.defaults());
            TrainingSet.Builder b = new TrainingSet.Builder();
            List<Path> files;
            try (Stream<Path> s = Files.list(photos)) {
                files = s.filter(p -> p.toString().endsWith(".jpg")).sorted().limit(24).toList();
            }
            for (Path p : files) {
                b.add(fx.extract(ImageFiles.readGray(p)));
            }
            cached = new VocabularyTrainer(VocabularyConfig.defaults().withBranching(10).withDepth(4).withSeed(5))
                    .train(b.build(), new TrainingOrigin("steered-brief-256", List.of(photos.toString()), "test",
                            Instant.EPOCH), (done, total) -> { });
        }
        return cached;
    }
}
