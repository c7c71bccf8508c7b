package revisit.vocabulary;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import revisit.io.BadInputException;

/**
 * Big-endian reads from the bytes of a file that check, before each read or allocation, that the bytes are
 * there; a shortfall or a malformed value becomes a one-line {@link BadInputException} naming the file.
 */
final class BoundedBytes {

    private final Path file;
    private final ByteBuffer buffer;
    private final int end;
    private final String fix;

    /**
     * @param file  named in messages
     * @param bytes the content; not modified
     * @param end   reads stop here (the checksum that follows is not content)
     * @param fix   what the user should do, appended to every message
     */
    BoundedBytes(Path file, byte[] bytes, int end, String fix) {
        this.file = file;
        this.buffer = ByteBuffer.wrap(bytes, 0, end);
        this.end = end;
        this.fix = fix;
    }

    /** Fails unless {@code count} items of {@code size} bytes remain. */
    void need(long count, int size, String what) {
        if (count < 0 || count * size > end - buffer.position()) {
            throw fail(what + " needs " + count + " x " + size + " bytes but only " + (end - buffer.position())
                    + " remain");
        }
    }

    int readInt(String what) {
        need(1, Integer.BYTES, what);
        return buffer.getInt();
    }

    /** Reads an int and checks it lies in {@code min..max}. */
    int readInt(String what, int min, int max) {
        int v = readInt(what);
        if (v < min || v > max) {
            throw fail(what + " is " + v + ", expected " + min + ".." + max);
        }
        return v;
    }

    long readLong(String what) {
        need(1, Long.BYTES, what);
        return buffer.getLong();
    }

    double readDouble(String what) {
        need(1, Double.BYTES, what);
        return buffer.getDouble();
    }

    int readUnsignedByte(String what) {
        need(1, 1, what);
        return buffer.get() & 0xFF;
    }

    /** Reads {@code out.length} bytes. */
    void readBytes(byte[] out, String what) {
        need(out.length, 1, what);
        buffer.get(out);
    }

    /** Reads a string: unsigned 16-bit byte length, then that many bytes of strict UTF-8. */
    String readString(String what, int maxChars) {
        need(1, Short.BYTES, what + " length");
        int length = buffer.getShort() & 0xFFFF;
        need(length, 1, what);
        ByteBuffer slice = buffer.slice(buffer.position(), length);
        buffer.position(buffer.position() + length);
        try {
            CharBuffer chars = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(slice);
            if (chars.length() > maxChars) {
                throw fail(what + " has " + chars.length() + " characters, at most " + maxChars + " allowed");
            }
            return chars.toString();
        } catch (CharacterCodingException e) {
            throw fail(what + " is not valid UTF-8", e);
        }
    }

    /** Fails unless every content byte was read. */
    void expectEnd(String what) {
        if (buffer.position() != end) {
            throw fail((end - buffer.position()) + " unexpected bytes after " + what);
        }
    }

    BadInputException fail(String problem) {
        return new BadInputException(file + ": " + problem + "; " + fix);
    }

    BadInputException fail(String problem, Throwable cause) {
        return new BadInputException(file + ": " + problem + "; " + fix, cause);
    }
}
