package revisit.index;

import java.util.Arrays;

/**
 * Frame slot -> features grouped by tree node, stored compactly as one byte array per frame of unsigned
 * variable-length integers (7 bits per byte, high bit = more bytes follow): the node count, then per node the gap
 * to the previous node id, the number of features, and the gaps between its increasing feature indices (the first
 * gap from -1). About 1.5-2.5 bytes per feature.
 */
final class DirectIndex {

    private byte[][] entries = new byte[16][];
    private int slots;

    /** Stores the nodes of the frame in slot {@link #slotCount()}. */
    void append(int[] nodes) {
        if (slots == entries.length) {
            entries = Arrays.copyOf(entries, slots + (slots >> 1));
        }
        entries[slots++] = encode(nodes);
    }

    /** Installs an already encoded entry read from a file; it must decode ({@link #decode} throws otherwise). */
    void appendEncoded(byte[] encoded) {
        decode(encoded);
        if (slots == entries.length) {
            entries = Arrays.copyOf(entries, slots + (slots >> 1));
        }
        entries[slots++] = encoded;
    }

    NodeFeatures features(int slot) {
        return decode(entries[slot]);
    }

    byte[] encoded(int slot) {
        return entries[slot];
    }

    int slotCount() {
        return slots;
    }

    /** Drops removed slots; {@code newSlot} as in {@link FrameTable#compact()}. */
    void compact(int[] newSlot) {
        int next = 0;
        for (int s = 0; s < slots; s++) {
            if (newSlot[s] >= 0) {
                entries[next++] = entries[s];
            }
        }
        Arrays.fill(entries, next, slots, null);
        slots = next;
    }

    long memoryBytes() {
        long bytes = Sizes.array(entries.length, 4);
        for (int s = 0; s < slots; s++) {
            bytes += Sizes.array(entries[s].length, 1);
        }
        return bytes;
    }

    static byte[] encode(int[] nodes) {
        long[] keyed = new long[nodes.length];
        for (int i = 0; i < nodes.length; i++) {
            keyed[i] = (long) nodes[i] << 32 | i;
        }
        Arrays.sort(keyed);
        int distinct = 0;
        for (int i = 0; i < keyed.length; i++) {
            if (i == 0 || keyed[i] >>> 32 != keyed[i - 1] >>> 32) {
                distinct++;
            }
        }
        byte[] out = new byte[5 + 15 * nodes.length];
        int pos = writeVarint(out, 0, distinct);
        int previousNode = 0;
        for (int start = 0; start < keyed.length; ) {
            int node = (int) (keyed[start] >>> 32);
            int end = start;
            while (end < keyed.length && (int) (keyed[end] >>> 32) == node) {
                end++;
            }
            pos = writeVarint(out, pos, node - previousNode);
            pos = writeVarint(out, pos, end - start);
            int previousFeature = -1;
            for (int k = start; k < end; k++) {
                int feature = (int) keyed[k];
                pos = writeVarint(out, pos, feature - previousFeature);
                previousFeature = feature;
            }
            previousNode = node;
            start = end;
        }
        return Arrays.copyOf(out, pos);
    }

    /** Decodes an entry; throws {@link IllegalArgumentException} when the bytes are not a valid entry. */
    static NodeFeatures decode(byte[] bytes) {
        int[] pos = {0};
        int distinct = readVarint(bytes, pos);
        if (distinct > bytes.length) {
            throw new IllegalArgumentException("node count " + distinct + " exceeds entry size " + bytes.length);
        }
        int[] nodes = new int[distinct];
        int[] offsets = new int[distinct + 1];
        int[] features = new int[Math.max(0, bytes.length)];
        int total = 0;
        long node = 0;
        for (int i = 0; i < distinct; i++) {
            node += readVarint(bytes, pos);
            int count = readVarint(bytes, pos);
            if (node > Integer.MAX_VALUE || (i > 0 && node == nodes[i - 1]) || count < 1
                    || total + count > features.length) {
                throw new IllegalArgumentException("invalid node " + node + " or count " + count);
            }
            nodes[i] = (int) node;
            long feature = -1;
            for (int k = 0; k < count; k++) {
                feature += readVarint(bytes, pos);
                if (feature > Integer.MAX_VALUE || (k > 0 && feature == features[total - 1])) {
                    throw new IllegalArgumentException("invalid feature index " + feature);
                }
                features[total++] = (int) feature;
            }
            offsets[i + 1] = total;
        }
        if (pos[0] != bytes.length) {
            throw new IllegalArgumentException((bytes.length - pos[0]) + " stray bytes after the entry");
        }
        return new NodeFeatures(nodes, offsets, Arrays.copyOf(features, total));
    }

    /** Writes {@code value} (>= 0) at {@code pos} and returns the position after it. */
    private static int writeVarint(byte[] out, int pos, int value) {
        int v = value;
        int p = pos;
        while ((v & ~0x7F) != 0) {
            out[p++] = (byte) ((v & 0x7F) | 0x80);
            v >>>= 7;
        }
        out[p++] = (byte) v;
        return p;
    }

    private static int readVarint(byte[] bytes, int[] pos) {
        int value = 0;
        for (int shift = 0; shift < 32; shift += 7) {
            if (pos[0] >= bytes.length) {
                throw new IllegalArgumentException("entry ends inside a number");
            }
            int b = bytes[pos[0]++];
            value |= (b & 0x7F) << shift;
            if ((b & 0x80) == 0) {
                if (value < 0) {
                    throw new IllegalArgumentException("number out of range");
                }
                return value;
            }
        }
        throw new IllegalArgumentException("number longer than 5 bytes");
    }
}
