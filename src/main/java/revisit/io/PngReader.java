package revisit.io;

import boofcv.struct.image.GrayU16;
import boofcv.struct.image.GrayU8;
import java.nio.file.Path;
import java.util.Optional;
import java.util.zip.CRC32;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;

/**
 * Strict, fast reader for the PNG layouts camera logs and depth sensors write: non-interlaced grey, grey with
 * alpha, RGB and RGBA with 8- or 16-bit samples (PNG specification, ISO/IEC 15948:2004 / W3C PNG 2nd edition:
 * chunks 5.3, IHDR 11.2.2, filters 9, zlib stream 10). Every chunk's CRC is checked, the zlib stream must hold
 * exactly the bytes the header promises and end with a valid Adler-32, and the file must end with IEND, so a
 * truncated or damaged file is rejected, never half decoded. Samples become grey by the rules of
 * {@link GrayConversion}, so the result equals the ImageIO path pixel for pixel.
 *
 * <p>Palette images, sample depths below 8 bits and interlaced files are left to ImageIO (an empty result).
 * The gain, in thread CPU per 640x480 frame (docs/BENCHMARKS.md, "Image reading"): 8-bit grey frames of the
 * generated scenario 1.57 ms against 2.25 ms through ImageIO and the grey conversion; RGB frames of the Middlebury
 * dino ring 7.3 against 8.6-9.0 ms (JMH: {@code ImageReadBench}).
 */
final class PngReader {

    private static final byte[] SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A};
    private static final int IHDR = 0x49484452;
    private static final int IDAT = 0x49444154;
    private static final int IEND = 0x49454E44;
    private static final int PLTE = 0x504C5445;

    private final Path file;
    private final byte[] bytes;
    private PngHeader header;

    private PngReader(Path file, byte[] bytes) {
        this.file = file;
        this.bytes = bytes;
    }

    /** True when {@code head} starts with the 8-byte PNG signature. */
    static boolean isPng(byte[] head, int length) {
        if (length < SIGNATURE.length) {
            return false;
        }
        for (int i = 0; i < SIGNATURE.length; i++) {
            if (head[i] != SIGNATURE[i]) {
                return false;
            }
        }
        return true;
    }

    /**
     * Decodes the whole file content {@code bytes} of {@code file} to 8-bit grey.
     *
     * @return the grey image, or empty when the layout is one this reader leaves to ImageIO
     * @throws BadInputException when the file is damaged or truncated
     */
    static Optional<GrayU8> readGray(Path file, byte[] bytes) {
        PngReader reader = new PngReader(file, bytes);
        Optional<byte[]> raw = reader.pixels();
        return raw.map(r -> PngSamples.toGray(reader.header, r));
    }

    /**
     * Decodes a 16-bit grey PNG to its raw samples.
     *
     * @return the samples, or empty when the file is not 16-bit grey or is a layout left to ImageIO
     * @throws BadInputException when the file is damaged or truncated
     */
    static Optional<GrayU16> readGray16(Path file, byte[] bytes) {
        PngReader reader = new PngReader(file, bytes);
        Optional<byte[]> raw = reader.pixels();
        if (raw.isEmpty() || reader.header.colourType() != 0 || reader.header.bitDepth() != 16) {
            return Optional.empty();
        }
        return Optional.of(PngSamples.toGray16(reader.header, raw.get()));
    }

    /** Walks the chunks, inflates and unfilters the image data; empty for layouts left to ImageIO. */
    private Optional<byte[]> pixels() {
        int pos = SIGNATURE.length;
        int[] idatStarts = new int[16];
        int[] idatLengths = new int[16];
        int idatCount = 0;
        boolean ended = false;
        while (!ended) {
            if (pos + 8 > bytes.length) {
                throw damaged("file ends inside a chunk header at byte " + pos + ", before IEND");
            }
            int length = readInt(pos);
            int type = readInt(pos + 4);
            if (length < 0 || (long) pos + 12 + length > bytes.length) {
                throw damaged("chunk " + typeName(type) + " at byte " + pos + " runs past the end of the file");
            }
            checkCrc(pos, length, type);
            if (header == null && type != IHDR) {
                throw damaged("first chunk is " + typeName(type) + ", not IHDR");
            }
            if (type == IHDR) {
                header = PngHeader.parse(file, bytes, pos + 8, length);
                if (!header.fastPath()) {
                    return Optional.empty();
                }
            } else if (type == IDAT) {
                if (idatCount == idatStarts.length) {
                    idatStarts = java.util.Arrays.copyOf(idatStarts, idatCount * 2);
                    idatLengths = java.util.Arrays.copyOf(idatLengths, idatCount * 2);
                }
                idatStarts[idatCount] = pos + 8;
                idatLengths[idatCount++] = length;
            } else if (type == IEND) {
                ended = true;
            } else if (isCritical(type) && type != PLTE) {
                throw damaged("unknown critical chunk " + typeName(type));
            }
            pos += 12 + length;
        }
        if (idatCount == 0) {
            throw damaged("no image data (IDAT) chunk");
        }
        byte[] raw = inflate(idatStarts, idatLengths, idatCount);
        PngFilters.undo(raw, header.height(), header.rowBytes(), header.bytesPerPixel(), this::damaged);
        return Optional.of(raw);
    }

    /** Inflates the concatenated IDAT data into exactly {@code height * (1 + rowBytes)} bytes. */
    private byte[] inflate(int[] starts, int[] lengths, int count) {
        byte[] raw = new byte[Math.toIntExact((long) header.height() * (1 + header.rowBytes()))];
        Inflater inflater = new Inflater();
        try {
            int next = 0;
            int produced = 0;
            while (!inflater.finished()) {
                if (inflater.needsInput()) {
                    if (next == count) {
                        throw damaged(produced < raw.length
                                ? "image data ends after " + produced + " of " + raw.length + " bytes"
                                : "image data stream is not closed (no zlib end and checksum)");
                    }
                    inflater.setInput(bytes, starts[next], lengths[next]);
                    next++;
                    continue;
                }
                if (produced == raw.length) {
                    if (inflater.inflate(new byte[1]) > 0) {
                        throw damaged("more image data than the header's " + header.width() + "x"
                                + header.height() + " pixels");
                    }
                    continue;
                }
                produced += inflater.inflate(raw, produced, raw.length - produced);
                if (inflater.needsDictionary()) {
                    throw damaged("image data asks for a preset dictionary");
                }
            }
            if (produced < raw.length) {
                throw damaged("image data ends after " + produced + " of " + raw.length + " bytes");
            }
            return raw;
        } catch (DataFormatException e) {
            throw damaged("corrupt image data: " + ImageFiles.oneLine(e));
        } finally {
            inflater.end();
        }
    }

    private void checkCrc(int pos, int length, int type) {
        CRC32 crc = new CRC32();
        crc.update(bytes, pos + 4, length + 4);
        if ((int) crc.getValue() != readInt(pos + 8 + length)) {
            throw damaged("CRC mismatch in chunk " + typeName(type) + " at byte " + pos);
        }
    }

    private static boolean isCritical(int type) {
        return (type & 0x20000000) == 0;
    }

    private static String typeName(int type) {
        char[] c = new char[4];
        for (int i = 0; i < 4; i++) {
            int v = (type >>> (24 - 8 * i)) & 0xFF;
            c[i] = v >= 0x20 && v < 0x7F ? (char) v : '?';
        }
        return new String(c);
    }

    private int readInt(int pos) {
        return ((bytes[pos] & 0xFF) << 24) | ((bytes[pos + 1] & 0xFF) << 16) | ((bytes[pos + 2] & 0xFF) << 8)
                | (bytes[pos + 3] & 0xFF);
    }

    private BadInputException damaged(String what) {
        return PngHeader.damaged(file, what);
    }
}
