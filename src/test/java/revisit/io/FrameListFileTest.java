package revisit.io;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class FrameListFileTest {

    @TempDir
    Path dir;

    @Test
    void readsTimesAndPathsSkippingCommentsAndBlankLines() throws IOException {
        Path a = image("imgs/a.png");
        Path b = image("imgs/with space.png");
        Path elsewhere = Files.createTempDirectory(dir, "other");
        Path c = image(dir.relativize(elsewhere).resolve("c.png").toString());
        Path list = text("run.frames", "\uFEFF# revisit-frames 1\n# made by hand\n\n0 imgs/a.png\r\n"
                + "   # indented comment\n0.5\timgs/with space.png  \n1e1 " + c + "\n");
        List<FrameListFile.Entry> entries = FrameListFile.read(list);
        assertEquals(List.of(new FrameListFile.Entry(0.0, a), new FrameListFile.Entry(0.5, b),
                new FrameListFile.Entry(10.0, c)), entries);
    }

    @Test
    void writeThenReadGivesTheSameEntries() throws IOException {
        List<FrameListFile.Entry> written = List.of(new FrameListFile.Entry(0.0, image("seq/f0.png")),
                new FrameListFile.Entry(0.1, image("seq/f1.png")),
                new FrameListFile.Entry(1.0e-5 + 0.1, image("seq/f2.png")),
                new FrameListFile.Entry(1234.000001, image("seq/f3.png")));
        Path list = dir.resolve("out.frames");
        FrameListFile.write(list, written);
        assertEquals(written, FrameListFile.read(list));
        String text = Files.readString(list);
        assertTrue(text.startsWith("# revisit-frames 1\n"), text);
        assertTrue(text.contains(" seq/f1.png\n"), "relative path with '/': " + text);
    }

    @Test
    void writeRejectsTimesThatDoNotIncrease() throws IOException {
        Path f = image("x.png");
        List<FrameListFile.Entry> backwards = List.of(new FrameListFile.Entry(1.0, f), new FrameListFile.Entry(0.5, f));
        assertThrows(IllegalArgumentException.class, () -> FrameListFile.write(dir.resolve("bad.frames"), backwards));
        assertTrue(Files.notExists(dir.resolve("bad.frames")));
    }

    @Test
    void eachMalformedListNamesFileAndLine() throws IOException {
        image("a.png");
        image("b.png");
        assertMalformed("# frames\n0 a.png\n", 1, "missing header");
        assertMalformed("# revisit-frames 2\n0 a.png\n", 1, "version 2");
        assertMalformed("# revisit-frames one\n0 a.png\n", 1, "not a whole number");
        assertMalformed("# revisit-frames 1\n0 a.png\nabc b.png\n", 3, "not a decimal number");
        assertMalformed("# revisit-frames 1\nNaN a.png\n", 2, "not a decimal number");
        assertMalformed("# revisit-frames 1\n-1 a.png\n", 2, "negative");
        assertMalformed("# revisit-frames 1\n0.25\n", 2, "no image path");
        assertMalformed("# revisit-frames 1\n1 a.png\n# c\n0.5 b.png\n", 4, "not after 1.0 s on line 2");
        assertMalformed("# revisit-frames 1\n1 a.png\n1 b.png\n", 3, "not after");
        assertMalformed("# revisit-frames 1\n0 a.png\n1 gone.png\n", 3, "'gone.png' not found");
    }

    @Test
    void emptyUnreadableAndMissingListsAreRejected() throws IOException {
        assertTrue(reject(text("empty.frames", "# revisit-frames 1\n# nothing\n")).contains("no frames listed"));
        Path latin1 = dir.resolve("latin1.frames");
        Files.write(latin1, "# revisit-frames 1\n0 caf\u00e9.png\n".getBytes(StandardCharsets.ISO_8859_1));
        assertTrue(reject(latin1).contains("not UTF-8"));
        assertTrue(reject(dir.resolve("absent.frames")).contains("not found"));
    }

    private void assertMalformed(String content, int line, String fragment) throws IOException {
        Path list = text("bad.frames", content);
        String message = reject(list);
        assertTrue(message.startsWith(list + ": line " + line + ": "), message);
        assertTrue(message.contains(fragment), message);
        assertTrue(!message.contains("\n"), message);
    }

    private static String reject(Path list) {
        return assertThrows(BadInputException.class, () -> FrameListFile.read(list)).getMessage();
    }

    private Path text(String name, String content) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, content, StandardCharsets.UTF_8);
        return file;
    }

    private Path image(String relative) throws IOException {
        Path file = dir.resolve(relative);
        Files.createDirectories(file.getParent());
        ImageIO.write(new BufferedImage(2, 2, BufferedImage.TYPE_BYTE_GRAY), "png", file.toFile());
        return file;
    }
}
