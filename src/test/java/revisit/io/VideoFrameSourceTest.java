package revisit.io;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Video decoding on real files: ../shared/data/video (CC BY-SA 4.0, P. Abeles, BoofCV-Data). The tests skip when
 * that folder is absent. Only the first frames are decoded to keep the suite quick.
 */
class VideoFrameSourceTest {

    @TempDir
    Path dir;

    /** 426x320 H.264 High 4:2:0 at 30000/1001 Hz, 493 frames, first time 0.066 s (as ffprobe 5.1 reports). */
    private static Path parkingLot() {
        return sharedVideo("parking_lot_scan.mp4");
    }

    @Test
    void firstFramesHaveTheVideoSizeAndIncreasingContainerTimes() {
        try (FrameSource source = FrameSources.open(parkingLot(), FrameSourceOptions.defaults().withMaxFrames(8))) {
            assertEquals(OptionalInt.of(8), source.frameCount());
            assertTrue(source.describe().contains("493 frames"), source.describe());
            List<Frame> frames = FrameSourcesTest.readAll(source);
            assertEquals(8, frames.size());
            for (int i = 0; i < frames.size(); i++) {
                Frame f = frames.get(i);
                assertEquals(i, f.index());
                assertEquals("parking_lot_scan.mp4#" + i, f.name());
                assertEquals(426, f.image().width);
                assertEquals(320, f.image().height);
                // presentation times from ffprobe: start 0.066 s, then 1001/30000 s apart (ms rounding in the file)
                assertEquals(0.066 + i * 1001.0 / 30000.0, f.timeSeconds(), 0.002, "frame " + i);
                assertSaneLuma(f);
            }
        }
    }

    @Test
    void lumaMatchesFfmpegDecoderBitForBit() throws IOException, InterruptedException {
        // reference decoder: FFmpeg's libavcodec H.264, run in the test when installed (Debian package ffmpeg).
        // OpenCV's Java build (openpnp 4.9.0-0) has no FFmpeg or GStreamer video I/O here and cannot open MP4.
        Path video = parkingLot();
        Assumptions.assumeTrue(onPath("ffmpeg"), "ffmpeg not installed; skipping the cross-decoder check");
        int frames = 12;
        Path raw = dir.resolve("ffmpeg.yuv");
        Process ffmpeg = new ProcessBuilder("ffmpeg", "-v", "error", "-nostdin", "-i", video.toString(),
                "-frames:v", String.valueOf(frames), "-f", "rawvideo", "-pix_fmt", "yuv420p", raw.toString())
                .redirectErrorStream(true).redirectOutput(dir.resolve("ffmpeg.log").toFile()).start();
        assertEquals(0, ffmpeg.waitFor(), () -> "ffmpeg failed: " + readQuietly(dir.resolve("ffmpeg.log")));
        byte[] reference = Files.readAllBytes(raw);
        int lumaBytes = 426 * 320;
        int frameBytes = lumaBytes * 3 / 2;
        assertEquals(frames * frameBytes, reference.length);
        try (FrameSource source = FrameSources.open(video, FrameSourceOptions.defaults().withMaxFrames(frames))) {
            List<Frame> ours = FrameSourcesTest.readAll(source);
            for (int i = 0; i < frames; i++) {
                byte[] expected = Arrays.copyOfRange(reference, i * frameBytes, i * frameBytes + lumaBytes);
                assertArrayEquals(expected, ours.get(i).image().data, "frame " + i);
            }
        }
    }

    @Test
    void strideAndStartKeepIndicesTimesAndPixelsOfTheFullSequence() {
        List<Frame> all;
        try (FrameSource source = FrameSources.open(parkingLot(), FrameSourceOptions.defaults().withMaxFrames(14))) {
            all = FrameSourcesTest.readAll(source);
        }
        FrameSourceOptions thinned = FrameSourceOptions.defaults().withStartSeconds(0.1).withStride(4)
                .withMaxFrames(3);
        try (FrameSource source = FrameSources.open(parkingLot(), thinned)) {
            assertEquals(OptionalInt.empty(), source.frameCount(), "unknown with a start time");
            List<Frame> some = FrameSourcesTest.readAll(source);
            // times 0.066, 0.099, 0.133 ...: the first at or after 0.1 s is frame 2, then every 4th
            assertEquals(List.of(2, 6, 10), some.stream().map(Frame::index).toList());
            for (Frame f : some) {
                assertEquals(all.get(f.index()).timeSeconds(), f.timeSeconds());
                assertArrayEquals(all.get(f.index()).image().data, f.image().data, "frame " + f.index());
            }
        }
    }

    @Test
    void unsupportedProfileIsRejectedAtOpenWithItsName() {
        // ffprobe 5.1 reports this file as H.264 "High 4:4:4 Predictive" (profile_idc 244), which jcodec 0.2.5
        // cannot decode (it fails with a misleading "interlace" error)
        Path video = sharedVideo("ditch_02.mp4");
        BadInputException e = assertThrows(BadInputException.class, () -> FrameSources.open(video, 30.0));
        assertTrue(e.getMessage().startsWith(video + ": H.264 profile 244 (High 4:4:4 Predictive)"), e.getMessage());
    }

    @Test
    void randomBytesAndCutVideosAreRejectedWithTheFileName() throws IOException {
        byte[] noise = new byte[50_000];
        new Random(9L).nextBytes(noise);
        Path fake = dir.resolve("noise.mp4");
        Files.write(fake, noise);
        assertTrue(assertThrows(BadInputException.class, () -> FrameSources.open(fake, 30.0)).getMessage()
                .startsWith(fake + ": not a readable MP4/MOV video"));
        byte[] real = Files.readAllBytes(parkingLot());
        Path cut = dir.resolve("cut.mp4");
        Files.write(cut, Arrays.copyOf(real, real.length / 2));
        assertTrue(assertThrows(BadInputException.class, () -> FrameSources.open(cut, 30.0)).getMessage()
                .startsWith(cut + ": not a readable MP4/MOV video"), "index box is at the end of this file");
    }

    @Test
    void videoCutAfterItsIndexDeliversTheFramesPresentThenReportsTheCut() throws IOException {
        byte[] streamable = Mp4Boxes.indexFirst(Files.readAllBytes(parkingLot()));
        Path cut = dir.resolve("cut-streamable.mp4");
        Files.write(cut, Arrays.copyOf(streamable, 60_000));
        int[] delivered = {0};
        try (FrameSource source = FrameSources.open(cut, 30.0)) {
            BadInputException e = assertThrows(BadInputException.class, () -> {
                while (source.next().isPresent()) {
                    delivered[0]++;
                }
            });
            assertFalse(e instanceof BadFrameException, "a cut ends the source: " + e.getMessage());
            Matcher m = Pattern.compile(Pattern.quote(cut.toString())
                    + ": video data ends after (\\d+) of 493 frames; .*").matcher(e.getMessage());
            assertTrue(m.matches(), e.getMessage());
            assertTrue(delivered[0] > 0, "frames before the cut are delivered");
            assertEquals(Integer.parseInt(m.group(1)), delivered[0], "every complete packet decoded");
            assertEquals(Optional.empty(), source.next());
        }
    }

    @Test
    void damagedPacketsBecomeBadFramesAndReadingContinues() throws IOException {
        byte[] bytes = Mp4Boxes.indexFirst(Files.readAllBytes(parkingLot()));
        Random random = new Random(21L);
        int start = Mp4Boxes.topLevelOffset(bytes, "mdat") + 20_000;
        for (int hit = 0; hit < 12; hit++) {
            int at = start + random.nextInt(150_000);
            for (int k = 0; k < 64; k++) {
                bytes[at + k] = (byte) random.nextInt(256);
            }
        }
        Path damaged = dir.resolve("damaged.mp4");
        Files.write(damaged, bytes);
        int good = 0;
        int bad = 0;
        try (FrameSource source = FrameSources.open(damaged, FrameSourceOptions.defaults().withMaxFrames(80))) {
            while (true) {
                try {
                    Optional<Frame> f = source.next();
                    if (f.isEmpty()) {
                        break;
                    }
                    good++;
                } catch (BadFrameException e) {
                    assertTrue(e.getMessage().startsWith(damaged + ": frame " + e.frameIndex()), e.getMessage());
                    bad++;
                }
            }
        }
        assertEquals(80, good + bad);
        assertTrue(bad > 0, "seed 21 damages packets the decoder rejects");
    }

    /** Mean in the video luma range and real contrast: not a blank, saturated or misaligned plane. */
    private static void assertSaneLuma(Frame f) {
        long sum = 0;
        long sumSq = 0;
        int n = f.image().width * f.image().height;
        for (int i = 0; i < n; i++) {
            int v = f.image().data[i] & 0xFF;
            sum += v;
            sumSq += (long) v * v;
        }
        double mean = (double) sum / n;
        double sd = Math.sqrt((double) sumSq / n - mean * mean);
        // ITU-R BT.601 puts video luma in 16..235; an outdoor scene has a standard deviation of tens of levels
        assertTrue(mean > 16 && mean < 235, "frame " + f.index() + " mean " + mean);
        assertTrue(sd > 10, "frame " + f.index() + " standard deviation " + sd);
    }

    static Path sharedVideo(String name) {
        for (String base : List.of("../shared/data", "../../shared/data", "/work/shared/data")) {
            Path candidate = Path.of(System.getProperty("user.dir")).resolve(base).resolve("video").resolve(name)
                    .normalize();
            if (Files.isRegularFile(candidate)) {
                return candidate;
            }
        }
        return Assumptions.abort("shared data video/" + name + " not found next to the project; skipping");
    }

    private static boolean onPath(String program) {
        String path = System.getenv("PATH");
        return path != null && Arrays.stream(path.split(File.pathSeparator))
                .anyMatch(d -> Files.isExecutable(Path.of(d, program)));
    }

    private static String readQuietly(Path file) {
        try {
            return Files.readString(file);
        } catch (IOException e) {
            return "(log unreadable: " + e.getMessage() + ")";
        }
    }
}
