package revisit.features;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayU8;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;

class FeatureExtractorTest {

    @Test
    void blankImageGivesNoFeatures() {
        GrayU8 blank = new GrayU8(640, 480);
        java.util.Arrays.fill(blank.data, (byte) 100);
        FrameFeatures f = new FeatureExtractor(FeatureConfig.defaults()).extract(blank);
        assertEquals(0, f.count());
    }

    @Test
    void imageSmallerThanTheBorderGivesNoFeatures() {
        FeatureExtractor extractor = new FeatureExtractor(FeatureConfig.defaults());
        assertEquals(0, extractor.extract(CornerDetectorTest.randomBlocks(300, 300, 3).subimage(0, 0, 30, 300)).count());
        assertEquals(0, extractor.extract(new GrayU8(1, 1)).count());
    }

    @Test
    void featuresAreInsideTheImageWithValidFields() {
        GrayU8 image = CornerDetectorTest.randomBlocks(400, 300, 11);
        FeatureConfig config = FeatureConfig.defaults().withMaxFeatures(300);
        FrameFeatures f = new FeatureExtractor(config).extract(image);
        assertTrue(f.count() > 100 && f.count() <= 300, "count " + f.count());
        for (int i = 0; i < f.count(); i++) {
            double margin = config.borderPx() * f.scale()[i] - 1;
            assertTrue(f.x()[i] >= margin && f.x()[i] <= image.width - 1 - margin, "x " + f.x()[i]);
            assertTrue(f.y()[i] >= margin && f.y()[i] <= image.height - 1 - margin, "y " + f.y()[i]);
            assertTrue(f.angleRad()[i] > -Math.PI - 1e-6 && f.angleRad()[i] <= Math.PI + 1e-6);
            assertEquals(Math.pow(config.scaleFactor(), f.level()[i]), f.scale()[i], 1e-5);
        }
    }

    @Test
    void levelQuotasShrinkGeometrically() {
        // quota of level l: N (1 - f) f^l / (1 - f^L), f = 1 / scaleFactor (Rublee et al., ICCV 2011, as in OpenCV)
        GrayU8 image = SharedData.gray("photos/pixabay/stairs01.jpg");
        FrameFeatures f = new FeatureExtractor(FeatureConfig.defaults()).extract(image);
        int[] perLevel = new int[8];
        for (int i = 0; i < f.count(); i++) {
            perLevel[f.level()[i]]++;
        }
        double first = 1000 * (1 - 1 / 1.2) / (1 - Math.pow(1 / 1.2, 8));
        for (int l = 0; l < 7; l++) {
            assertEquals(Math.round(first * Math.pow(1 / 1.2, l)), perLevel[l], "level " + l);
        }
        assertEquals(1000, f.count());
    }

    @Test
    void sameImageTwiceGivesIdenticalFeatures() {
        GrayU8 image = SharedData.gray("photos/chair/image000.jpg");
        FeatureExtractor extractor = new FeatureExtractor(FeatureConfig.defaults());
        FrameFeatures first = extractor.extract(image);
        extractor.extract(CornerDetectorTest.randomBlocks(300, 200, 5));
        assertSame(first, extractor.extract(image));
        assertSame(first, new FeatureExtractor(FeatureConfig.defaults()).extract(image));
    }

    @Test
    void parallelExtractionEqualsSequential() throws InterruptedException, ExecutionException {
        List<GrayU8> images = new ArrayList<>();
        for (String name : new String[]{"image001.jpg", "image005.jpg", "image009.jpg", "image013.jpg"}) {
            images.add(SharedData.gray("photos/chair/" + name)); // chair set, CC BY 4.0, P. Abeles, BoofCV-Data
        }
        FeatureExtractor sequential = new FeatureExtractor(FeatureConfig.defaults());
        List<FrameFeatures> expected = new ArrayList<>();
        for (GrayU8 image : images) {
            expected.add(sequential.extract(image));
        }
        ThreadLocal<FeatureExtractor> perThread =
                ThreadLocal.withInitial(() -> new FeatureExtractor(FeatureConfig.defaults()));
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            List<Future<FrameFeatures>> futures = new ArrayList<>();
            for (int round = 0; round < 2; round++) {
                for (GrayU8 image : images) {
                    futures.add(pool.submit(() -> perThread.get().extract(image)));
                }
            }
            for (int k = 0; k < futures.size(); k++) {
                assertSame(expected.get(k % images.size()), futures.get(k).get());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    static void assertSame(FrameFeatures a, FrameFeatures b) {
        assertEquals(a.count(), b.count());
        assertArrayEquals(a.x(), b.x());
        assertArrayEquals(a.y(), b.y());
        assertArrayEquals(a.angleRad(), b.angleRad());
        assertArrayEquals(a.level(), b.level());
        assertArrayEquals(a.scale(), b.scale());
        assertArrayEquals(a.response(), b.response());
        assertArrayEquals(a.descriptors(), b.descriptors());
    }
}
