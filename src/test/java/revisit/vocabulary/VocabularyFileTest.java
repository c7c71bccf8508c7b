package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.CRC32;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.io.BadInputException;

class VocabularyFileTest {

    private static Vocabulary small;

    @TempDir
    Path dir;

    @BeforeAll
    static void trainSmallVocabulary() {
        long[] data = SyntheticDescriptors.clustered(SyntheticDescriptors.random(40, 1), 4000, 30, 2);
        small = new VocabularyTrainer(VocabularyConfig.defaults().withBranching(4).withDepth(3).withThreads(1))
                .train(SyntheticDescriptors.set(data, 4000, 100), new TrainingOrigin("test-kind",
                        List.of("synthetic a", "synthetic é"), "revisit vocab-train x",
                        java.time.Instant.parse("2025-02-03T04:05:06Z")), TrainingProgress.NONE);
    }

    @Test
    void roundTripIsBitIdentical() throws IOException {
        Path first = dir.resolve("a.rvoc");
        Path second = dir.resolve("b.rvoc");
        VocabularyFile.write(first, small);
        Vocabulary back = VocabularyFile.read(first);
        VocabularyFile.write(second, back);
        assertEquals(-1, Files.mismatch(first, second));
        assertArrayEquals(small.childCounts(), back.childCounts());
        assertArrayEquals(small.centres(), back.centres());
        assertArrayEquals(small.weights(), back.weights());
        assertArrayEquals(small.occupancies(), back.occupancies());
        assertEquals(small.provenance(), back.provenance());
        assertEquals("test-kind", back.descriptorKind());
        assertEquals(small.branching(), back.branching());
        assertEquals(small.depth(), back.depth());
    }

    @Test
    void rejectsAFileThatIsNotAVocabulary() throws IOException {
        Path text = dir.resolve("notes.txt");
        Files.writeString(text, "hello, this is not a vocabulary");
        BadInputException e = assertThrows(BadInputException.class, () -> VocabularyFile.read(text));
        assertTrue(e.getMessage().startsWith(text + ": not a Revisit vocabulary file"), e.getMessage());
        assertThrows(BadInputException.class, () -> VocabularyFile.read(dir.resolve("missing.rvoc")));
    }

    @Test
    void rejectsAnotherFormatVersion() throws IOException {
        byte[] bytes = bytesOf(small);
        ByteBuffer.wrap(bytes).putInt(8, 2);
        Path file = write(fixCrc(bytes));
        BadInputException e = assertThrows(BadInputException.class, () -> VocabularyFile.read(file));
        assertTrue(e.getMessage().contains("format version 2"), e.getMessage());
    }

    @Test
    void rejectsATruncatedFileByItsChecksum() throws IOException {
        byte[] bytes = bytesOf(small);
        Path file = write(java.util.Arrays.copyOf(bytes, bytes.length - 100));
        BadInputException e = assertThrows(BadInputException.class, () -> VocabularyFile.read(file));
        assertTrue(e.getMessage().contains("checksum mismatch"), e.getMessage());
    }

    @Test
    void rejectsAHugeNodeCountBeforeAllocating() throws IOException {
        byte[] bytes = bytesOf(small);
        int kindLength = ByteBuffer.wrap(bytes).getShort(24) & 0xFFFF;
        int nodeCountAt = 26 + kindLength;
        assertEquals(small.nodeCount(), ByteBuffer.wrap(bytes).getInt(nodeCountAt));
        ByteBuffer.wrap(bytes).putInt(nodeCountAt, Integer.MAX_VALUE);
        Path file = write(fixCrc(bytes));
        BadInputException e = assertThrows(BadInputException.class, () -> VocabularyFile.read(file));
        assertTrue(e.getMessage().contains("tree of " + Integer.MAX_VALUE + " nodes needs"), e.getMessage());
    }

    @Test
    void rejectsATreeWhoseChildCountsDoNotAddUp() throws IOException {
        byte[] bytes = bytesOf(small);
        int kindLength = ByteBuffer.wrap(bytes).getShort(24) & 0xFFFF;
        int firstChildCount = 26 + kindLength + 8;
        bytes[firstChildCount + 1] = (byte) (bytes[firstChildCount + 1] == 0 ? 1 : 0);
        Path file = write(fixCrc(bytes));
        BadInputException e = assertThrows(BadInputException.class, () -> VocabularyFile.read(file));
        assertTrue(e.getMessage().contains("inconsistent tree"), e.getMessage());
    }

    @Test
    void survivesThousandsOfSeededMutationsWithOnlyBadInputErrors() throws IOException {
        byte[] original = bytesOf(small);
        Path file = dir.resolve("fuzz.rvoc");
        int loaded = 0;
        int rejected = 0;
        for (long seed = 0; seed < 3000; seed++) {
            byte[] mutated = FileMutations.mutate(original, seed);
            Files.write(file, mutated);
            try {
                Vocabulary v = VocabularyFile.read(file);
                int word = v.word(SyntheticDescriptors.random(1, seed), 0);
                assertTrue(word >= 0 && word < v.wordCount());
                loaded++;
            } catch (BadInputException e) {
                assertTrue(e.getMessage().startsWith(file.toString()), "seed " + seed + ": " + e.getMessage());
                assertFalse(e.getMessage().contains("\n"), "seed " + seed + ": " + e.getMessage());
                rejected++;
            }
        }
        assertEquals(3000, loaded + rejected);
        assertTrue(rejected > 1000, "rejected " + rejected);
    }

    private byte[] bytesOf(Vocabulary v) throws IOException {
        Path file = dir.resolve("orig.rvoc");
        VocabularyFile.write(file, v);
        return Files.readAllBytes(file);
    }

    private Path write(byte[] bytes) throws IOException {
        Path file = dir.resolve("edited.rvoc");
        Files.write(file, bytes);
        return file;
    }

    /** Rewrites the trailing CRC32 so that the edit reaches the structural checks. */
    static byte[] fixCrc(byte[] bytes) {
        CRC32 crc = new CRC32();
        crc.update(bytes, 0, bytes.length - 4);
        ByteBuffer.wrap(bytes).putInt(bytes.length - 4, (int) crc.getValue());
        return bytes;
    }

    static String utf8(byte[] b) {
        return new String(b, StandardCharsets.UTF_8);
    }
}
