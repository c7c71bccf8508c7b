package revisit.index;

/** Heap size of arrays on a 64-bit JVM with compressed references: 16-byte header, 8-byte alignment. */
final class Sizes {

    private Sizes() {
    }

    /** Bytes of an array of {@code length} elements of {@code elementBytes} each (4 for references). */
    static long array(long length, int elementBytes) {
        return (16 + length * elementBytes + 7) & ~7L;
    }
}
