package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class FeaturesCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        return cl.execute(args);
    }

    @Test
    void drawsFeaturesOfAnImageIntoAPng() throws IOException {
        Path image = dir.resolve("blocks.png");
        ImageIO.write(blocks(320, 240, 5), "png", image.toFile());
        Path picture = dir.resolve("out/blocks-features.png");
        int code = run("features", image.toString(), "-o", picture.toString(), "--max-features", "200");
        assertEquals(0, code, err.toString());
        BufferedImage drawn = ImageIO.read(picture.toFile());
        assertEquals(320, drawn.getWidth());
        assertEquals(240, drawn.getHeight());
        assertTrue(out.toString().matches("(?s).*blocks\\.png: \\d+ features \\(per level( \\d+)+\\) drawn to .*"),
                out.toString());
        int coloured = 0;
        for (int y = 0; y < 240; y++) {
            for (int x = 0; x < 320; x++) {
                int rgb = drawn.getRGB(x, y);
                coloured += ((rgb >> 16) & 0xFF) != (rgb & 0xFF) ? 1 : 0;
            }
        }
        assertTrue(coloured > 500, "feature marks drawn: " + coloured);
    }

    @Test
    void missingImageIsOneLineDomainError() {
        int code = run("features", dir.resolve("nothing.png").toString(), "-o", dir.resolve("x.png").toString());
        assertEquals(1, code);
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertTrue(err.toString().contains("nothing.png: image not found"), err.toString());
        assertTrue(Files.notExists(dir.resolve("x.png")));
    }

    @Test
    void fileThatIsNotAnImageIsOneLineDomainError() throws IOException {
        Path text = dir.resolve("notes.png");
        Files.writeString(text, "not a picture");
        int code = run("features", text.toString(), "-o", dir.resolve("x.png").toString());
        assertEquals(1, code);
        assertTrue(err.toString().contains("notes.png: not a recognised image format"), err.toString());
    }

    @Test
    void outOfRangeOptionIsAUsageError() throws IOException {
        Path image = dir.resolve("blocks.png");
        ImageIO.write(blocks(100, 100, 1), "png", image.toFile());
        int code = run("features", image.toString(), "--levels", "0");
        assertEquals(2, code);
        assertTrue(err.toString().contains("levels = 0 is out of range; use 1..16"), err.toString());
    }

    private static BufferedImage blocks(int width, int height, long seed) {
        Random random = new Random(seed);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_BYTE_GRAY);
        for (int k = 0; k < 150; k++) {
            int w = 5 + random.nextInt(30);
            int h = 5 + random.nextInt(30);
            int x0 = random.nextInt(width - w);
            int y0 = random.nextInt(height - h);
            int v = random.nextInt(256);
            for (int y = y0; y < y0 + h; y++) {
                for (int x = x0; x < x0 + w; x++) {
                    image.getRaster().setSample(x, y, 0, v);
                }
            }
        }
        return image;
    }
}
