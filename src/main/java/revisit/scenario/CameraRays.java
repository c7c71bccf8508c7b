package revisit.scenario;

import revisit.camera.CameraModel;

/**
 * The viewing ray of every pixel, precomputed once per camera: undistorted normalised coordinates (xn, yn) so the
 * ray through pixel p is {@code (xn, yn, 1)} in camera axes (x right, y down, z forward), scaled by z-depth.
 * Pixels are grouped into square tiles whose bounds in normalised coordinates let the renderer skip surfaces that
 * cannot be seen in a tile; with lens distortion the bounds come from the exact rays, so culling stays exact.
 */
final class CameraRays {

    /** Tile side, pixels (16 is common practice for screen-space binning). */
    static final int TILE = 16;

    final CameraModel camera;
    final int width;
    final int height;
    final float[] xn;
    final float[] yn;
    /** Pixel footprint factor: normalised spacing of neighbouring rays divided by |ray|, per pixel. */
    final float[] footprint;
    final int tilesX;
    final int tilesY;
    /** Per tile: min xn, max xn, min yn, max yn. */
    final double[] tileBounds;

    CameraRays(CameraModel camera) {
        this.camera = camera;
        this.width = camera.width();
        this.height = camera.height();
        int n = width * height;
        xn = new float[n];
        yn = new float[n];
        footprint = new float[n];
        double[] a = new double[2];
        double[] b = new double[2];
        for (int v = 0; v < height; v++) {
            for (int u = 0; u < width; u++) {
                camera.pixelToNormalized(u, v, a);
                camera.pixelToNormalized(u + 1, v, b);
                int p = v * width + u;
                xn[p] = (float) a[0];
                yn[p] = (float) a[1];
                double norm = Math.sqrt(a[0] * a[0] + a[1] * a[1] + 1);
                footprint[p] = (float) (Math.hypot(b[0] - a[0], b[1] - a[1]) / norm);
            }
        }
        tilesX = (width + TILE - 1) / TILE;
        tilesY = (height + TILE - 1) / TILE;
        tileBounds = new double[tilesX * tilesY * 4];
        for (int t = 0; t < tilesX * tilesY; t++) {
            tileBounds(t);
        }
    }

    private void tileBounds(int tile) {
        int u0 = (tile % tilesX) * TILE;
        int v0 = (tile / tilesX) * TILE;
        double minX = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE;
        double minY = Double.MAX_VALUE;
        double maxY = -Double.MAX_VALUE;
        for (int v = v0; v < Math.min(height, v0 + TILE); v++) {
            for (int u = u0; u < Math.min(width, u0 + TILE); u++) {
                int p = v * width + u;
                minX = Math.min(minX, xn[p]);
                maxX = Math.max(maxX, xn[p]);
                minY = Math.min(minY, yn[p]);
                maxY = Math.max(maxY, yn[p]);
            }
        }
        tileBounds[4 * tile] = minX;
        tileBounds[4 * tile + 1] = maxX;
        tileBounds[4 * tile + 2] = minY;
        tileBounds[4 * tile + 3] = maxY;
    }
}
