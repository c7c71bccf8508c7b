package revisit.io;

import boofcv.struct.image.GrayU16;
import boofcv.struct.image.GrayU8;

/**
 * Unfiltered PNG rows to images, by the grey rules of {@link GrayConversion}: grey samples scaled to 8 bits
 * (16-bit: {@code round(v / 257)}), colour to BT.601 luma, alpha ignored. Samples are big-endian (PNG
 * specification, 7.1).
 */
final class PngSamples {

    private PngSamples() {
    }

    /** 8-bit grey of the unfiltered rows {@code raw} (each row led by its filter byte). */
    static GrayU8 toGray(PngHeader h, byte[] raw) {
        GrayU8 gray = new GrayU8(h.width(), h.height());
        int stride = h.rowBytes() + 1;
        int bytesPerSample = h.bitDepth() / 8;
        int step = h.channels() * bytesPerSample;
        boolean colour = h.colourType() == 2 || h.colourType() == 6;
        for (int y = 0; y < h.height(); y++) {
            int in = y * stride + 1;
            int out = y * gray.stride;
            if (!colour && step == 1) {
                System.arraycopy(raw, in, gray.data, out, h.width());
            } else if (!colour) {
                greyRow(raw, in, step, bytesPerSample, gray.data, out, h.width());
            } else {
                lumaRow(raw, in, step, bytesPerSample, gray.data, out, h.width());
            }
        }
        return gray;
    }

    /** The raw samples of a 16-bit grey image. */
    static GrayU16 toGray16(PngHeader h, byte[] raw) {
        GrayU16 out = new GrayU16(h.width(), h.height());
        int stride = h.rowBytes() + 1;
        for (int y = 0; y < h.height(); y++) {
            int in = y * stride + 1;
            int o = y * out.stride;
            for (int x = 0; x < h.width(); x++) {
                out.data[o + x] = (short) (((raw[in + 2 * x] & 0xFF) << 8) | (raw[in + 2 * x + 1] & 0xFF));
            }
        }
        return out;
    }

    private static void greyRow(byte[] raw, int in, int step, int bytesPerSample, byte[] out, int o, int width) {
        int max = bytesPerSample == 1 ? 255 : 65535;
        for (int x = 0; x < width; x++) {
            out[o + x] = (byte) GrayConversion.scaleGray(sample(raw, in + x * step, bytesPerSample), max);
        }
    }

    private static void lumaRow(byte[] raw, int in, int step, int bytesPerSample, byte[] out, int o, int width) {
        if (bytesPerSample == 1) {
            // GrayConversion.luma with M = 255: (510 W + 255000) / 510000 = (W + 500) / 1000, all in int
            for (int x = 0; x < width; x++) {
                int p = in + x * step;
                int weighted = 299 * (raw[p] & 0xFF) + 587 * (raw[p + 1] & 0xFF) + 114 * (raw[p + 2] & 0xFF);
                out[o + x] = (byte) ((weighted + 500) / 1000);
            }
            return;
        }
        int max = bytesPerSample == 1 ? 255 : 65535;
        for (int x = 0; x < width; x++) {
            int p = in + x * step;
            out[o + x] = (byte) GrayConversion.luma(sample(raw, p, bytesPerSample),
                    sample(raw, p + bytesPerSample, bytesPerSample), sample(raw, p + 2 * bytesPerSample,
                            bytesPerSample), max);
        }
    }

    private static int sample(byte[] raw, int p, int bytesPerSample) {
        return bytesPerSample == 1 ? raw[p] & 0xFF : ((raw[p] & 0xFF) << 8) | (raw[p + 1] & 0xFF);
    }
}
