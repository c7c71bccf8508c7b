package revisit.scenario;

import georegression.struct.se.Se3_F64;
import java.util.List;

/**
 * Per-frame setup of the surfaces for {@link Renderer}: the plane and texture-coordinate coefficients in camera
 * axes, and the bounds in normalised image coordinates of the part of each surface in front of the near plane
 * (the rectangle clipped against z = near, Sutherland and Hodgman, CACM 1974, then projected). Back-facing and
 * fully hidden surfaces are dropped. Reused from frame to frame; not thread-safe.
 */
final class FrameSurfaces {

    int count;
    double[][] coefficients = new double[0][];
    double[][] bounds = new double[0][];
    /** Smallest z-depth of any visible point of each surface, metres (a lower bound for its hits). */
    double[] nearest = new double[0];
    Texture[] textures = new Texture[0];
    private final double[][] corners = new double[4][3];
    private final double[][] clipped = new double[8][3];

    /**
     * Coefficient layout per surface: 0-2 normal in camera axes, 3 plane offset N.(O - C), 4-6 axis u in camera
     * axes, 7 A.(C - O), 8-10 axis v, 11 B.(C - O), 12-13 width and height in metres, 14-15 texels per metre in
     * u and v, 16 the larger of the two, 17 brightness factor.
     */
    void prepare(Se3_F64 pose, List<Surface> surfaces, double[] shade, double near) {
        if (coefficients.length < surfaces.size()) {
            coefficients = new double[surfaces.size()][18];
            bounds = new double[surfaces.size()][4];
            nearest = new double[surfaces.size()];
            textures = new Texture[surfaces.size()];
        }
        count = 0;
        Vec3 centre = new Vec3(pose.T.x, pose.T.y, pose.T.z);
        for (int i = 0; i < surfaces.size(); i++) {
            Surface s = surfaces.get(i);
            Vec3 n = s.facing();
            if (n.dot(centre.minus(s.origin())) <= 0 || !clipAndBound(pose, s, near, count)) {
                continue;
            }
            double[] c = coefficients[count];
            toCamera(pose, n, c, 0);
            c[3] = n.dot(s.origin().minus(centre));
            toCamera(pose, s.axisU(), c, 4);
            c[7] = s.axisU().dot(centre.minus(s.origin()));
            toCamera(pose, s.axisV(), c, 8);
            c[11] = s.axisV().dot(centre.minus(s.origin()));
            c[12] = s.widthM();
            c[13] = s.heightM();
            c[14] = s.texture().width() / s.widthM();
            c[15] = s.texture().height() / s.heightM();
            c[16] = Math.max(c[14], c[15]);
            c[17] = shade[i];
            textures[count] = s.texture();
            count++;
        }
    }

    /** out[offset..offset+2] = R^T d (a world direction in camera axes). */
    private static void toCamera(Se3_F64 pose, Vec3 d, double[] out, int offset) {
        for (int j = 0; j < 3; j++) {
            out[offset + j] = pose.R.get(0, j) * d.x() + pose.R.get(1, j) * d.y() + pose.R.get(2, j) * d.z();
        }
    }

    private boolean clipAndBound(Se3_F64 pose, Surface s, double near, int slot) {
        double[] box = bounds[slot];
        List<Vec3> world = s.corners();
        for (int k = 0; k < 4; k++) {
            Vec3 d = world.get(k).minus(new Vec3(pose.T.x, pose.T.y, pose.T.z));
            toCamera(pose, d, corners[k], 0);
        }
        int n = 0;
        for (int k = 0; k < 4; k++) {
            double[] a = corners[k];
            double[] b = corners[(k + 1) % 4];
            if (a[2] >= near) {
                System.arraycopy(a, 0, clipped[n++], 0, 3);
            }
            if ((a[2] >= near) != (b[2] >= near)) {
                double t = (near - a[2]) / (b[2] - a[2]);
                for (int j = 0; j < 3; j++) {
                    clipped[n][j] = a[j] + t * (b[j] - a[j]);
                }
                n++;
            }
        }
        if (n == 0) {
            return false;
        }
        box[0] = Double.MAX_VALUE;
        box[1] = -Double.MAX_VALUE;
        box[2] = Double.MAX_VALUE;
        box[3] = -Double.MAX_VALUE;
        nearest[slot] = Double.MAX_VALUE;
        for (int k = 0; k < n; k++) {
            nearest[slot] = Math.min(nearest[slot], clipped[k][2]);
            double x = clipped[k][0] / clipped[k][2];
            double y = clipped[k][1] / clipped[k][2];
            box[0] = Math.min(box[0], x);
            box[1] = Math.max(box[1], x);
            box[2] = Math.min(box[2], y);
            box[3] = Math.max(box[3], y);
        }
        return true;
    }
}
