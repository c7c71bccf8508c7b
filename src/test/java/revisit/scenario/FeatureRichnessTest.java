package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.abst.feature.detect.interest.ConfigPointDetector;
import boofcv.abst.feature.detect.interest.PointDetectorTypes;
import boofcv.alg.feature.detect.interest.GeneralFeatureDetector;
import boofcv.factory.feature.detect.interest.FactoryDetectPoint;
import boofcv.struct.image.GrayS16;
import boofcv.struct.image.GrayU8;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** Rendered frames carry plenty of corners for an ORB-style front end, nuisances included. */
class FeatureRichnessTest {

    /**
     * FAST-9 corners with intensity threshold 20 (Rosten and Drummond, ECCV 2006; 20 is the threshold ORB
     * implementations commonly default to, from memory), counted with BoofCV's detector, non-maximum radius 2.
     */
    private static int fastCorners(RenderedFrame f) {
        ConfigPointDetector config = new ConfigPointDetector();
        config.type = PointDetectorTypes.FAST;
        config.fast.pixelTol = 20;
        config.fast.minContinuous = 9;
        config.general.maxFeatures = -1;
        config.general.radius = 2;
        config.general.threshold = 20;
        GeneralFeatureDetector<GrayU8, GrayS16> detector = FactoryDetectPoint.create(config, GrayU8.class,
                GrayS16.class);
        GrayU8 image = new GrayU8(f.width(), f.height());
        System.arraycopy(f.grey(), 0, image.data, 0, f.grey().length);
        detector.process(image, null, null, null, null, null);
        return detector.getMaximums().size + detector.getMinimums().size;
    }

    @Test
    void smallPresetFramesHaveHundredsOfCorners() {
        Scenario s = Scenario.build(ScenarioConfig.small());
        FrameMaker maker = new FrameMaker(s);
        int[] counts = new int[36];
        for (int k = 0; k < counts.length; k++) {
            int session = k < 24 ? 0 : 1;
            int frame = session == 0 ? k * 10 : (k - 24) * 10;
            counts[k] = fastCorners(maker.make(session, frame));
        }
        int[] sorted = counts.clone();
        Arrays.sort(sorted);
        assertTrue(sorted[sorted.length / 2] >= 250, "median corners per 320x240 frame: " + Arrays.toString(sorted));
        assertTrue(sorted[sorted.length / 5] >= 100, "4 frames in 5 have at least 100: " + Arrays.toString(sorted));
    }
}
