package revisit.camera;

/**
 * Pinhole camera with Brown-Conrady radial (k1, k2, k3) and tangential (p1, p2) distortion.
 *
 * <p>Normalised undistorted coordinates (xn, yn) map to distorted (xd, yd) by
 * {@code r2 = xn^2 + yn^2; radial = 1 + k1 r2 + k2 r2^2 + k3 r2^3;
 * xd = xn radial + 2 p1 xn yn + p2 (r2 + 2 xn^2); yd = yn radial + p1 (r2 + 2 yn^2) + 2 p2 xn yn},
 * then to pixels by {@code u = fx xd + skew yd + cx, v = fy yd + cy} (Brown 1966; the same model as OpenCV's
 * five-coefficient distortion).
 *
 * @param width  image width, pixels
 * @param height image height, pixels
 * @param fx     focal length along x, pixels
 * @param fy     focal length along y, pixels
 * @param skew   skew, pixels (usually 0)
 * @param cx     principal point x, pixels
 * @param cy     principal point y, pixels
 * @param k1     radial coefficient of r^2
 * @param k2     radial coefficient of r^4
 * @param k3     radial coefficient of r^6
 * @param p1     tangential coefficient
 * @param p2     tangential coefficient
 */
public record CameraModel(int width, int height, double fx, double fy, double skew, double cx, double cy,
                          double k1, double k2, double k3, double p1, double p2) {

    public CameraModel {
        if (width <= 0 || height <= 0) {
            throw new IllegalArgumentException("image size must be positive, was " + width + "x" + height);
        }
        if (!(fx > 0) || !(fy > 0) || !Double.isFinite(fx) || !Double.isFinite(fy)) {
            throw new IllegalArgumentException("focal lengths must be positive and finite, were " + fx + ", " + fy);
        }
        for (double v : new double[]{skew, cx, cy, k1, k2, k3, p1, p2}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("camera parameters must be finite");
            }
        }
    }

    /** A distortion-free pinhole camera. */
    public static CameraModel pinhole(int width, int height, double fx, double fy, double cx, double cy) {
        return new CameraModel(width, height, fx, fy, 0, cx, cy, 0, 0, 0, 0, 0);
    }

    /** True when all distortion coefficients are zero. */
    public boolean isDistortionFree() {
        return k1 == 0 && k2 == 0 && k3 == 0 && p1 == 0 && p2 == 0;
    }

    /**
     * Projects normalised undistorted coordinates to a pixel.
     *
     * @param xn  X/Z
     * @param yn  Y/Z
     * @param out receives (u, v) in pixels; modified
     */
    public void normalizedToPixel(double xn, double yn, double[] out) {
        double r2 = xn * xn + yn * yn;
        double radial = 1 + r2 * (k1 + r2 * (k2 + r2 * k3));
        double xd = xn * radial + 2 * p1 * xn * yn + p2 * (r2 + 2 * xn * xn);
        double yd = yn * radial + p1 * (r2 + 2 * yn * yn) + 2 * p2 * xn * yn;
        out[0] = fx * xd + skew * yd + cx;
        out[1] = fy * yd + cy;
    }

    /**
     * Removes distortion from a pixel and returns normalised coordinates, by fixed-point iteration (20 steps,
     * converges to well below 1e-6 px for the distortion levels of ordinary lenses; common practice).
     *
     * @param u   column, pixels
     * @param v   row, pixels
     * @param out receives (xn, yn); modified
     */
    public void pixelToNormalized(double u, double v, double[] out) {
        double yd = (v - cy) / fy;
        double xd = (u - cx - skew * yd) / fx;
        double xn = xd;
        double yn = yd;
        if (!isDistortionFree()) {
            for (int iter = 0; iter < 20; iter++) {
                double r2 = xn * xn + yn * yn;
                double radial = 1 + r2 * (k1 + r2 * (k2 + r2 * k3));
                double dx = 2 * p1 * xn * yn + p2 * (r2 + 2 * xn * xn);
                double dy = p1 * (r2 + 2 * yn * yn) + 2 * p2 * xn * yn;
                xn = (xd - dx) / radial;
                yn = (yd - dy) / radial;
            }
        }
        out[0] = xn;
        out[1] = yn;
    }
}
