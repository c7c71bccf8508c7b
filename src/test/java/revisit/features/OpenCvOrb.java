package revisit.features;

import boofcv.struct.image.GrayU8;
import org.opencv.core.CvType;
import org.opencv.core.Mat;
import org.opencv.core.MatOfKeyPoint;
import org.opencv.features2d.ORB;

/**
 * OpenCV's ORB (org.openpnp:opencv 4.9.0 Java bindings, test scope) run on the same grey pixels as ours, as the
 * reference implementation of Rublee et al., ICCV 2011. Descriptors are repacked into our layout (32 bytes to
 * 4 longs) so the same matcher serves both; Hamming distances do not depend on the packing.
 */
final class OpenCvOrb {

    /** Keypoints in pixels and packed descriptors, {@link FrameFeatures#STRIDE} longs each. */
    record Keypoints(int count, float[] x, float[] y, long[] descriptors) {
    }

    private static boolean loaded;

    private OpenCvOrb() {
    }

    static synchronized void load() {
        if (!loaded) {
            nu.pattern.OpenCV.loadLocally();
            loaded = true;
        }
    }

    /** Copies a BoofCV grey image into a new 8-bit OpenCV matrix. */
    static Mat toMat(GrayU8 image) {
        load();
        Mat m = new Mat(image.height, image.width, CvType.CV_8UC1);
        byte[] row = new byte[image.width];
        for (int y = 0; y < image.height; y++) {
            System.arraycopy(image.data, image.startIndex + y * image.stride, row, 0, image.width);
            m.put(y, 0, row);
        }
        return m;
    }

    /** ORB with OpenCV's defaults except the feature count. */
    static Keypoints detect(GrayU8 image, int maxFeatures) {
        Mat m = toMat(image);
        ORB orb = ORB.create(maxFeatures);
        MatOfKeyPoint keypoints = new MatOfKeyPoint();
        Mat descriptors = new Mat();
        orb.detectAndCompute(m, new Mat(), keypoints, descriptors);
        float[] kp = new float[keypoints.rows() * 7];
        if (keypoints.rows() > 0) {
            keypoints.get(0, 0, kp);
        }
        int n = keypoints.rows();
        float[] x = new float[n];
        float[] y = new float[n];
        for (int i = 0; i < n; i++) {
            x[i] = kp[7 * i];
            y[i] = kp[7 * i + 1];
        }
        byte[] raw = new byte[n * 32];
        if (n > 0) {
            descriptors.get(0, 0, raw);
        }
        long[] packed = new long[n * FrameFeatures.STRIDE];
        for (int i = 0; i < n * 32; i++) {
            packed[i / 8] |= (raw[i] & 0xFFL) << (8 * (i % 8));
        }
        return new Keypoints(n, x, y, packed);
    }
}
