package revisit.scenario;

import revisit.io.StampedPose;

/**
 * One generated frame with its ground truth.
 *
 * @param width   pixels
 * @param height  pixels
 * @param grey    8-bit grey image, row-major (unsigned bytes)
 * @param depthMm z-depth per pixel in millimetres as unsigned 16-bit values; 0 where no surface was hit (sky)
 * @param pose    camera-to-world pose at the frame's time stamp
 */
public record RenderedFrame(int width, int height, byte[] grey, short[] depthMm, StampedPose pose) {

    /** Depth of pixel (u, v) in metres, or 0 for sky. */
    public double depthMetres(int u, int v) {
        return (depthMm[v * width + u] & 0xffff) / 1000.0;
    }

    /** Grey value of pixel (u, v), 0 to 255. */
    public int grey(int u, int v) {
        return grey[v * width + u] & 0xff;
    }
}
