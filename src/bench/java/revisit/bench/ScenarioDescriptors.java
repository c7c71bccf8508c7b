package revisit.bench;

import boofcv.struct.image.GrayU8;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import revisit.features.FeatureConfig;
import revisit.features.FeatureExtractor;
import revisit.features.FrameFeatures;
import revisit.io.StampedPose;
import revisit.scenario.FrameMaker;
import revisit.scenario.RenderedFrame;
import revisit.scenario.Scenario;
import revisit.scenario.Session;
import revisit.vocabulary.TrainingSet;

/**
 * Every frame of a generated scenario rendered in memory and described by our feature extractor (default
 * settings), in scan order: session 1, then session 2. Frames are rendered and described in parallel; each frame
 * depends only on the scenario seed and its index, so the result does not depend on the threads.
 */
final class ScenarioDescriptors {

    /** One described frame with its ground-truth pose. */
    record SceneFrame(String sessionName, DescriptorFrame frame, StampedPose pose) {
    }

    private ScenarioDescriptors() {
    }

    static List<SceneFrame> describe(Scenario scenario) {
        List<int[]> order = new ArrayList<>();
        for (int s = 0; s < scenario.sessions().size(); s++) {
            for (int f = 0; f < scenario.sessions().get(s).frameCount(); f++) {
                order.add(new int[]{s, f});
            }
        }
        ThreadLocal<FrameMaker> makers = ThreadLocal.withInitial(() -> new FrameMaker(scenario));
        ThreadLocal<FeatureExtractor> extractors = ThreadLocal.withInitial(
                () -> new FeatureExtractor(FeatureConfig.defaults()));
        return IntStream.range(0, order.size()).parallel().mapToObj(i -> {
            int s = order.get(i)[0];
            int f = order.get(i)[1];
            RenderedFrame r = makers.get().make(s, f);
            GrayU8 image = new GrayU8(r.width(), r.height());
            System.arraycopy(r.grey(), 0, image.data, 0, r.width() * r.height());
            FrameFeatures features = extractors.get().extract(image);
            Session session = scenario.sessions().get(s);
            return new SceneFrame(session.name(), new DescriptorFrame(s, f, session.time(f),
                    features.descriptors(), features.count()), r.pose());
        }).toList();
    }

    /** The frames' descriptors as a training set, one image per frame. */
    static TrainingSet trainingSet(List<SceneFrame> frames) {
        TrainingSet.Builder builder = new TrainingSet.Builder();
        for (SceneFrame f : frames) {
            builder.add(f.frame().descriptors(), f.frame().count());
        }
        return builder.build();
    }
}
