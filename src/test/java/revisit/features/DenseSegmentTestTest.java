package revisit.features;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayU8;
import java.util.Random;
import org.junit.jupiter.api.Test;

class DenseSegmentTestTest {

    private static final int BORDER = 4;

    @Test
    void wholeRowTestFindsTheSameCornersScoresAndOrderAsThePreTestedOne() {
        GrayU8 noise = new GrayU8(157, 61);
        Random random = new Random(11);
        for (int k = 0; k < noise.data.length; k++) {
            noise.data[k] = (byte) random.nextInt(256);
        }
        int total = 0;
        for (int threshold : new int[]{5, 20, 60}) {
            total += compareAllRows(noise, threshold);
            total += compareAllRows(CornerDetectorTest.randomBlocks(203, 77, 5), threshold);
        }
        assertTrue(total > 1000, "test images have too few corners to be a useful check: " + total);
    }

    @Test
    void worksOnSubImagesWithLargerStride() {
        GrayU8 big = CornerDetectorTest.randomBlocks(300, 200, 7);
        assertTrue(compareAllRows(big.subimage(13, 9, 13 + 171, 9 + 133), 15) > 50);
    }

    /** Compares both tests on every row; returns the number of corners seen. */
    private static int compareAllRows(GrayU8 image, int threshold) {
        int[][] rows = new int[image.height][image.width];
        for (int y = 0; y < image.height; y++) {
            for (int x = 0; x < image.width; x++) {
                rows[y][x] = image.get(x, y);
            }
        }
        FastSegmentTest sparse = new FastSegmentTest(threshold, 9);
        DenseSegmentTest dense = new DenseSegmentTest(threshold);
        dense.startLevel();
        int total = 0;
        for (int y = BORDER; y < image.height - BORDER; y++) {
            int rowStart = image.startIndex + y * image.stride;
            sparse.startLevel();
            sparse.scanRow(image.data, rowStart, image.stride, rows, y, BORDER, image.width - BORDER);
            int n = sparse.flush(image.data);
            assertEquals(n, dense.scanRow(image.data, rowStart, image.stride, rows, y, BORDER,
                    image.width - BORDER), "corners in row " + y);
            for (int k = 0; k < n; k++) {
                assertEquals(sparse.x(k), dense.x(k), "column of corner " + k + " in row " + y);
                assertEquals(sparse.score(k), dense.score(k), "score of corner " + k + " in row " + y);
            }
            total += n;
        }
        return total;
    }
}
