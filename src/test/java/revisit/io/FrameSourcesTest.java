package revisit.io;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class FrameSourcesTest {

    @TempDir
    Path dir;

    @Test
    void folderFramesComeInNaturalOrderWithTimesFromTheRate() throws IOException {
        for (String name : List.of("frame10.png", "frame2.png", "frame1.jpg", "Frame3.bmp")) {
            writeImage(dir.resolve(name), name.length());
        }
        Files.writeString(dir.resolve("notes.txt"), "not an image");
        writeImage(dir.resolve(".hidden.png"), 1);
        Files.createDirectories(dir.resolve("sub.png"));
        try (FrameSource source = FrameSources.open(dir, 4.0)) {
            assertEquals(OptionalInt.of(4), source.frameCount());
            List<Frame> frames = readAll(source);
            assertEquals(List.of("frame1.jpg", "frame2.png", "Frame3.bmp", "frame10.png"),
                    frames.stream().map(Frame::name).toList());
            assertEquals(List.of(0.0, 0.25, 0.5, 0.75), frames.stream().map(Frame::timeSeconds).toList());
            assertEquals(List.of(0, 1, 2, 3), frames.stream().map(Frame::index).toList());
            assertEquals(11, frames.get(3).image().width, "frame10.png was written 11 pixels wide");
        }
    }

    @Test
    void startStrideAndMaximumSelectFramesButKeepTheirIndices() throws IOException {
        for (int i = 0; i < 12; i++) {
            writeImage(dir.resolve("f" + i + ".png"), 3);
        }
        FrameSourceOptions options = FrameSourceOptions.defaults().withFrameRateHz(2.0).withStartSeconds(1.0)
                .withStride(3).withMaxFrames(3);
        try (FrameSource source = FrameSources.open(dir, options)) {
            assertEquals(OptionalInt.of(3), source.frameCount());
            List<Frame> frames = readAll(source);
            // times i / 2 Hz; from 1.0 s on: frames 2..11; every 3rd: 2, 5, 8, 11; at most 3
            assertEquals(List.of(2, 5, 8), frames.stream().map(Frame::index).toList());
            assertEquals(List.of(1.0, 2.5, 4.0), frames.stream().map(Frame::timeSeconds).toList());
        }
    }

    @Test
    void badFrameIsReportedAndTheNextCallContinues() throws IOException {
        writeImage(dir.resolve("a0.png"), 4);
        byte[] png = Files.readAllBytes(dir.resolve("a0.png"));
        Files.write(dir.resolve("a1.png"), Arrays.copyOf(png, png.length / 2));
        writeImage(dir.resolve("a2.png"), 6);
        try (FrameSource source = FrameSources.open(dir, 10.0)) {
            assertEquals(0, source.next().orElseThrow().index());
            BadFrameException bad = assertThrows(BadFrameException.class, source::next);
            assertEquals(1, bad.frameIndex());
            assertEquals("a1.png", bad.frameName());
            assertTrue(bad.getMessage().contains("a1.png"), bad.getMessage());
            Frame after = source.next().orElseThrow();
            assertEquals(2, after.index());
            assertEquals(6, after.image().width);
            assertEquals(Optional.empty(), source.next());
        }
    }

    @Test
    void frameListSourceUsesListedTimesAndNames() throws IOException {
        writeImage(dir.resolve("imgs/x.png"), 2);
        writeImage(dir.resolve("imgs/y.png"), 3);
        Path list = dir.resolve("seq.txt");
        Files.writeString(list, "# revisit-frames 1\n0.125 imgs/y.png\n7.5 imgs/x.png\n");
        try (FrameSource source = FrameSources.open(list, 99.0)) {
            List<Frame> frames = readAll(source);
            assertEquals(List.of(0.125, 7.5), frames.stream().map(Frame::timeSeconds).toList());
            assertEquals(List.of("imgs/y.png", "imgs/x.png"), frames.stream().map(Frame::name).toList());
            assertEquals(3, frames.get(0).image().width);
        }
    }

    @Test
    void unusableInputsGiveOneLineNamingThePath() throws IOException {
        Path missing = dir.resolve("nowhere");
        assertTrue(reject(missing).startsWith(missing + ": not found"));
        Path empty = Files.createDirectories(dir.resolve("empty"));
        Files.writeString(empty.resolve("readme.txt"), "x");
        assertTrue(reject(empty).contains("no images in the folder (1 other entries)"), reject(empty));
        Path single = dir.resolve("one.png");
        writeImage(single, 2);
        assertTrue(reject(single).contains("a single image"));
        Path notList = dir.resolve("notes.csv");
        Files.writeString(notList, "t,file\n");
        assertTrue(reject(notList).contains("line 1: missing header"));
        Path avi = dir.resolve("clip.avi");
        Files.write(avi, new byte[]{1, 2, 3});
        assertTrue(reject(avi).startsWith(avi + ": .avi videos are not read"));
    }

    @Test
    void optionsRejectValuesOutsideTheirRange() {
        FrameSourceOptions d = FrameSourceOptions.defaults();
        assertThrows(IllegalArgumentException.class, () -> d.withFrameRateHz(0));
        assertThrows(IllegalArgumentException.class, () -> d.withFrameRateHz(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> d.withStride(0));
        assertThrows(IllegalArgumentException.class, () -> d.withMaxFrames(0));
        assertThrows(IllegalArgumentException.class, () -> d.withStartSeconds(-1));
    }

    private static String reject(Path input) {
        return assertThrows(BadInputException.class, () -> FrameSources.open(input, 10.0)).getMessage();
    }

    static List<Frame> readAll(FrameSource source) {
        List<Frame> frames = new ArrayList<>();
        for (Optional<Frame> f = source.next(); f.isPresent(); f = source.next()) {
            frames.add(f.get());
        }
        return frames;
    }

    /** Writes a grey image {@code width} pixels wide, so a frame can be recognised by its width. */
    private static void writeImage(Path file, int width) throws IOException {
        Files.createDirectories(file.getParent());
        String name = file.getFileName().toString();
        String format = name.substring(name.lastIndexOf('.') + 1);
        BufferedImage image = new BufferedImage(width, 2, BufferedImage.TYPE_BYTE_GRAY);
        assertTrue(ImageIO.write(image, format.equals("jpg") ? "jpeg" : format, file.toFile()));
    }
}
