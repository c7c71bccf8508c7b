package revisit.scenario;

import georegression.struct.se.Se3_F64;
import java.util.Arrays;
import java.util.List;

/**
 * Renders the radiance and z-depth seen by one camera by casting each pixel's ray against the planes of the
 * visible surfaces (ray-plane intersection, nearest hit wins) and sampling the hit surface's texture trilinearly
 * at the level that matches the pixel's footprint. Surfaces are culled per frame (back faces, behind the camera)
 * and binned into screen tiles ({@link CameraRays}) so each pixel tests only the few surfaces that can cover it.
 *
 * <p>For a camera with rotation R (camera to world) and centre C, the ray of a pixel is {@code X = C + s R r} with
 * {@code r = (xn, yn, 1)}, s the z-depth. For a plane with unit normal N through O the hit is
 * {@code s = N.(O - C) / (R^T N).r}, and the surface coordinates are {@code u = s (R^T A).r + A.(C - O)} (same
 * for v), so the per-pixel work is three dot products after a per-surface setup.
 *
 * <p>Not thread-safe (it owns its scratch buffers); use one renderer per thread. Output depends only on the
 * inputs, so any number of renderers give identical results.
 */
final class Renderer {

    /** Nearest z-depth drawn, metres (a near clipping plane; chosen here, below any camera-to-object gap). */
    static final double NEAR = 0.05;

    private final CameraRays rays;
    private final FrameSurfaces setup = new FrameSurfaces();
    private final int[][] tileLists;
    private final int[] tileCounts;
    /** Radiance of the last frame, row-major, roughly [0, 1]. */
    final float[] radiance;
    /** Z-depth of the last frame, metres; 0 where only sky was seen. */
    final float[] depth;

    Renderer(CameraRays rays) {
        this.rays = rays;
        int tiles = rays.tilesX * rays.tilesY;
        tileLists = new int[tiles][16];
        tileCounts = new int[tiles];
        radiance = new float[rays.width * rays.height];
        depth = new float[rays.width * rays.height];
    }

    /**
     * Renders one frame into {@link #radiance} and {@link #depth}.
     *
     * @param pose     camera to world
     * @param surfaces everything in the world at this instant
     * @param shade    brightness factor per surface (lighting times albedo), same order as surfaces
     * @param sky      sky brightness at the horizon and its growth per unit of upward ray slope
     */
    void render(Se3_F64 pose, List<Surface> surfaces, double[] shade, double[] sky) {
        setup.prepare(pose, surfaces, shade, NEAR);
        bin();
        for (int tile = 0; tile < tileCounts.length; tile++) {
            sortByNearest(tileLists[tile], tileCounts[tile]);
            renderTile(tile, pose, sky);
        }
    }

    /**
     * Orders a tile's candidates by their nearest possible depth (ties by index), so a pixel can stop testing
     * once its best hit is nearer than the next candidate could be. Insertion sort: lists are short.
     */
    private void sortByNearest(int[] list, int count) {
        double[] near = setup.nearest;
        for (int i = 1; i < count; i++) {
            int k = list[i];
            int j = i - 1;
            while (j >= 0 && (near[list[j]] > near[k] || (near[list[j]] == near[k] && list[j] > k))) {
                list[j + 1] = list[j];
                j--;
            }
            list[j + 1] = k;
        }
    }

    private void bin() {
        Arrays.fill(tileCounts, 0);
        double[] tb = rays.tileBounds;
        for (int k = 0; k < setup.count; k++) {
            double[] b = setup.bounds[k];
            for (int t = 0; t < tileCounts.length; t++) {
                if (b[0] <= tb[4 * t + 1] && b[1] >= tb[4 * t] && b[2] <= tb[4 * t + 3] && b[3] >= tb[4 * t + 2]) {
                    if (tileCounts[t] == tileLists[t].length) {
                        tileLists[t] = Arrays.copyOf(tileLists[t], 2 * tileLists[t].length);
                    }
                    tileLists[t][tileCounts[t]++] = k;
                }
            }
        }
    }

    private void renderTile(int tile, Se3_F64 pose, double[] sky) {
        int u0 = (tile % rays.tilesX) * CameraRays.TILE;
        int v0 = (tile / rays.tilesX) * CameraRays.TILE;
        int uEnd = Math.min(rays.width, u0 + CameraRays.TILE);
        int vEnd = Math.min(rays.height, v0 + CameraRays.TILE);
        int[] list = tileLists[tile];
        int count = tileCounts[tile];
        double r20 = pose.R.get(2, 0);
        double r21 = pose.R.get(2, 1);
        double r22 = pose.R.get(2, 2);
        for (int v = v0; v < vEnd; v++) {
            for (int u = u0; u < uEnd; u++) {
                int p = v * rays.width + u;
                double x = rays.xn[p];
                double y = rays.yn[p];
                if (!shadePixel(p, x, y, list, count)) {
                    double up = (r20 * x + r21 * y + r22) / Math.sqrt(x * x + y * y + 1);
                    radiance[p] = (float) (sky[0] + sky[1] * Math.max(0, up));
                    depth[p] = 0;
                }
            }
        }
    }

    private boolean shadePixel(int p, double x, double y, int[] list, int count) {
        FrameSurfaces f = setup;
        double best = Double.MAX_VALUE;
        int hit = -1;
        double hu = 0;
        double hv = 0;
        double[] near = f.nearest;
        for (int i = 0; i < count; i++) {
            int k = list[i];
            if (near[k] >= best) {
                break;
            }
            double[] c = f.coefficients[k];
            double den = c[0] * x + c[1] * y + c[2];
            if (den >= 0) {
                continue;
            }
            double s = c[3] / den;
            if (s < NEAR || s >= best) {
                continue;
            }
            double su = s * (c[4] * x + c[5] * y + c[6]) + c[7];
            double sv = s * (c[8] * x + c[9] * y + c[10]) + c[11];
            if (su < 0 || sv < 0 || su > c[12] || sv > c[13]) {
                continue;
            }
            best = s;
            hit = k;
            hu = su;
            hv = sv;
        }
        if (hit < 0) {
            return false;
        }
        double[] c = f.coefficients[hit];
        double cosIncidence = -(c[0] * x + c[1] * y + c[2]) / Math.sqrt(x * x + y * y + 1);
        double metres = best * rays.footprint[p] / Math.sqrt(Math.max(cosIncidence, 0.02));
        double lod = log2(metres * c[16]);
        radiance[p] = (float) (f.textures[hit].sample(hu * c[14], hv * c[15], lod) * c[17]);
        depth[p] = (float) best;
        return true;
    }

    /**
     * Piecewise-linear log2 (exact at powers of two, continuous, monotone): enough to choose a mip level and much
     * cheaper than Math.log (common practice in texture units).
     */
    static double log2(double v) {
        if (!(v > 0)) {
            return -1074;
        }
        int e = Math.getExponent(v);
        return e + (v / Math.scalb(1.0, e) - 1);
    }
}
