package revisit.evaluation;

import revisit.camera.CameraModel;
import revisit.io.StampedPose;

/**
 * One calibrated view of a K/R/t camera file: the image it belongs to, its intrinsic matrix and its pose.
 *
 * @param imageName file name of the image as written in the camera file
 * @param k         intrinsic matrix K, row-major, 9 values (copied)
 * @param pose      camera-to-world pose; its time is the view's 0-based position in the file, in seconds
 */
public record KrtView(String imageName, double[] k, StampedPose pose) {

    public KrtView {
        if (imageName == null || imageName.isBlank()) {
            throw new IllegalArgumentException("image name must not be blank");
        }
        if (k == null || k.length != 9) {
            throw new IllegalArgumentException("K must hold 9 values");
        }
        k = k.clone();
    }

    @Override
    public double[] k() {
        return k.clone();
    }

    /**
     * The pinhole camera of this view (no distortion: the format carries none).
     *
     * @param width  image width, pixels
     * @param height image height, pixels
     */
    public CameraModel cameraModel(int width, int height) {
        return new CameraModel(width, height, k[0], k[4], k[1], k[2], k[5], 0, 0, 0, 0, 0);
    }
}
