package revisit.bench;

/** Row-major 3x3 and 3-vector helpers for the bench reports (the verification package keeps its own private). */
final class BenchMath {

    private BenchMath() {
    }

    static double[] mul(double[] a, double[] b) {
        double[] c = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                c[3 * i + j] = a[3 * i] * b[j] + a[3 * i + 1] * b[3 + j] + a[3 * i + 2] * b[6 + j];
            }
        }
        return c;
    }

    static double[] transpose(double[] a) {
        return new double[]{a[0], a[3], a[6], a[1], a[4], a[7], a[2], a[5], a[8]};
    }

    static double[] mulVec(double[] a, double[] v) {
        return new double[]{a[0] * v[0] + a[1] * v[1] + a[2] * v[2], a[3] * v[0] + a[4] * v[1] + a[5] * v[2],
                a[6] * v[0] + a[7] * v[1] + a[8] * v[2]};
    }

    /** The entries {@code from .. from + 8} (a 3x3 matrix) or {@code from .. from + 2} when fewer remain. */
    static double[] block(double[] v, int from) {
        return java.util.Arrays.copyOfRange(v, from, Math.min(v.length, from + 9));
    }

    /** Rotation angle of R, degrees in [0, 180]. */
    static double angleDeg(double[] r) {
        double c = (r[0] + r[4] + r[8] - 1) / 2;
        return Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, c))));
    }

    static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    static double[] unit(double[] v) {
        double n = Math.sqrt(dot(v, v));
        return new double[]{v[0] / n, v[1] / n, v[2] / n};
    }
}
