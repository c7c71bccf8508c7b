package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.camera.CameraFile;
import revisit.io.BadInputException;
import revisit.io.FrameListFile;
import revisit.io.StampedPose;
import revisit.io.TrajectoryFile;

class ScenarioWriterTest {

    /** Tiny but complete: sessions of 24 and 20 frames at 1.5 Hz, 160x120, every nuisance and the twin on. */
    static final ScenarioConfig TINY = ScenarioConfig.small().withSize(160, 120).withLoopCount(1)
            .withFrameCount(24).withRateHz(1.5);

    /** Built once: a scenario is immutable and painting its textures is the slow part. */
    private static final Scenario BUILT = Scenario.build(TINY);

    private static List<Path> files(Path root) throws IOException {
        try (Stream<Path> walk = Files.walk(root)) {
            return walk.filter(Files::isRegularFile).map(root::relativize).sorted().toList();
        }
    }

    @Test
    void sameSeedGivesIdenticalBytesWithOneOrTwoThreads(@TempDir Path dir) throws IOException {
        ScenarioWriter.write(BUILT, dir.resolve("a"), false, 1, (d, t) -> { });
        ScenarioWriter.write(Scenario.build(TINY), dir.resolve("b"), false, 2, (d, t) -> { });
        List<Path> a = files(dir.resolve("a"));
        assertEquals(a, files(dir.resolve("b")));
        assertEquals(3 + (2 * 24 + 2) + (2 * 20 + 2), a.size(),
                "README, manifest, camera and per session frames, depths, poses, frame list");
        for (Path p : a) {
            assertArrayEquals(Files.readAllBytes(dir.resolve("a").resolve(p)),
                    Files.readAllBytes(dir.resolve("b").resolve(p)), p.toString());
        }
        ScenarioWriter.write(Scenario.build(TINY.withSeed(8)), dir.resolve("c"), false, 2, (d, t) -> { });
        Path frame = Path.of("session1", "frames", "frame_00003.png");
        assertFalse(java.util.Arrays.equals(Files.readAllBytes(dir.resolve("a").resolve(frame)),
                Files.readAllBytes(dir.resolve("c").resolve(frame))), "another seed paints another yard");
    }

    @Test
    void framesInAnyOrderEqualFramesInSequence() {
        Scenario s = BUILT;
        FrameMaker forward = new FrameMaker(s);
        FrameMaker backward = new FrameMaker(s);
        RenderedFrame[] seen = new RenderedFrame[20];
        for (int i = 0; i < 20; i++) {
            seen[i] = forward.make(1, i);
        }
        for (int i = 19; i >= 0; i--) {
            RenderedFrame f = backward.make(1, i);
            assertArrayEquals(seen[i].grey(), f.grey(), "grey of frame " + i);
            assertArrayEquals(seen[i].depthMm(), f.depthMm(), "depth of frame " + i);
        }
    }

    @Test
    void writtenFilesReadBackAsPosesCameraDepthAndManifest(@TempDir Path dir) throws IOException {
        Scenario s = BUILT;
        ScenarioWriter.write(s, dir, false, 2, (d, t) -> { });
        Session ses = s.sessions().get(0);
        List<StampedPose> poses = TrajectoryFile.read(dir.resolve("session1/poses.txt"));
        assertEquals(24, poses.size());
        assertEquals(ses.route().frame(7, 1.5).x(), poses.get(7).x(), 1e-6);
        assertEquals(s.camera(), CameraFile.read(dir.resolve("camera.json")));
        List<FrameListFile.Entry> list = FrameListFile.read(dir.resolve("session1/frames.txt"));
        assertEquals(24, list.size());
        for (int i = 0; i < 24; i++) {
            assertEquals(poses.get(i).timeSeconds(), list.get(i).timeSeconds(), 1e-6, "time of frame " + i);
            assertEquals(ScenarioWriter.framePath(dir, ses, i).toAbsolutePath().normalize(), list.get(i).image());
        }
        RenderedFrame f = new FrameMaker(s).make(0, 5);
        BufferedImage depth = ImageIO.read(ScenarioWriter.depthPath(dir, ses, 5).toFile());
        assertEquals(BufferedImage.TYPE_USHORT_GRAY, depth.getType());
        int[] values = depth.getRaster().getPixels(0, 0, 160, 120, (int[]) null);
        for (int i = 0; i < values.length; i++) {
            assertEquals(f.depthMm()[i] & 0xffff, values[i], "depth pixel " + i);
        }
        BufferedImage grey = ImageIO.read(ScenarioWriter.framePath(dir, ses, 5).toFile());
        assertEquals(f.grey()[160 * 60 + 80] & 0xff, grey.getRaster().getSample(80, 60, 0));
        JsonNode m = new ObjectMapper().readTree(dir.resolve("manifest.json").toFile());
        assertEquals("revisit-scenario", m.get("format").asText());
        assertEquals(TINY.seed(), m.get("seed").asLong());
        assertEquals(s.revisits().size(), m.get("revisits").size());
        assertTrue(Files.readString(dir.resolve("README.txt")).contains("Tallow Yard"));
    }

    @Test
    void refusesNonEmptyFolderUnlessOverwriteAndThenRemovesStaleFrames(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("notes.txt"), "mine");
        BadInputException e = assertThrows(BadInputException.class,
                () -> ScenarioWriter.write(BUILT, dir, false, 1, (d, t) -> { }));
        assertTrue(e.getMessage().contains("not empty") && e.getMessage().contains("--overwrite"), e.getMessage());
        Path stale = dir.resolve("session1/frames/frame_00050.png");
        Files.createDirectories(stale.getParent());
        Files.writeString(stale, "old");
        ScenarioWriter.write(Scenario.build(TINY.withSecondSession(false)), dir, true, 1, (d, t) -> { });
        assertFalse(Files.exists(stale), "frame beyond the new count removed");
        assertTrue(Files.exists(dir.resolve("notes.txt")), "other files left alone");
        assertTrue(Files.exists(dir.resolve("session1/frames/frame_00023.png")));
    }
}
