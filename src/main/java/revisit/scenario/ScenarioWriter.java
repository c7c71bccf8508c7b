package revisit.scenario;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import revisit.camera.CameraFile;
import revisit.io.BadInputException;
import revisit.io.FrameListFile;
import revisit.io.StampedPose;
import revisit.io.TrajectoryFile;

/**
 * Writes a scenario into a folder: README.txt, manifest.json, camera.json and per session the frames, a frame
 * list with their time stamps (docs/FORMAT-frames.md), the depth images and the ground-truth poses. Every file is
 * written atomically; frames are rendered on several threads, thread k taking frames k, k + n, k + 2n, ..., with
 * identical bytes whatever the thread count.
 */
public final class ScenarioWriter {

    static final String CAMERA_FILE = "camera.json";
    static final String FRAMES = "frames";
    static final String DEPTH = "depth";
    static final String POSES = "poses.txt";
    static final String FRAME_LIST = "frames.txt";
    static final String FRAME_PATTERN = "frame_%05d.png";
    static final String DEPTH_PATTERN = "depth_%05d.png";

    /** Told after each frame is written, from the writing thread. */
    @FunctionalInterface
    public interface Progress {
        void frameWritten(int done, int total);
    }

    private ScenarioWriter() {
    }

    /**
     * Writes the scenario.
     *
     * @param folder    target folder, created if missing
     * @param overwrite allow a non-empty folder; stale frame and depth images of ours beyond the new counts are
     *                  removed, other files are left alone
     * @param threads   rendering threads, at least 1
     * @param progress  told after every frame
     * @throws BadInputException when the folder is not empty and overwrite is off, or is not a folder
     */
    public static void write(Scenario s, Path folder, boolean overwrite, int threads, Progress progress) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, was " + threads);
        }
        prepareFolder(folder, overwrite);
        CameraFile.write(folder.resolve(CAMERA_FILE), s.camera());
        for (Session ses : s.sessions()) {
            List<StampedPose> poses = new ArrayList<>(ses.frameCount());
            for (int i = 0; i < ses.frameCount(); i++) {
                poses.add(StampedPose.of(ses.time(i), ses.route().poseAt(ses.time(i))));
            }
            TrajectoryFile.write(folder.resolve(ses.name()).resolve(POSES), poses);
            if (overwrite) {
                removeStale(folder.resolve(ses.name()), ses.frameCount());
            }
        }
        if (overwrite && s.sessions().size() == 1) {
            removeStale(folder.resolve("session2"), 0);
        }
        renderAll(s, folder, threads, progress);
        for (Session ses : s.sessions()) {
            List<FrameListFile.Entry> entries = new ArrayList<>(ses.frameCount());
            for (int i = 0; i < ses.frameCount(); i++) {
                entries.add(new FrameListFile.Entry(ses.time(i), framePath(folder, ses, i)));
            }
            FrameListFile.write(folder.resolve(ses.name()).resolve(FRAME_LIST), entries);
        }
        revisit.io.AtomicFiles.writeString(folder.resolve("manifest.json"), ScenarioManifest.toJson(s));
        revisit.io.AtomicFiles.writeString(folder.resolve("README.txt"), ScenarioReadme.text(s));
    }

    /** Path of one frame image inside a scenario folder. */
    public static Path framePath(Path folder, Session ses, int frame) {
        return folder.resolve(ses.name()).resolve(FRAMES).resolve(String.format(Locale.ROOT, FRAME_PATTERN, frame));
    }

    /** Path of one depth image inside a scenario folder. */
    public static Path depthPath(Path folder, Session ses, int frame) {
        return folder.resolve(ses.name()).resolve(DEPTH).resolve(String.format(Locale.ROOT, DEPTH_PATTERN, frame));
    }

    private static void renderAll(Scenario s, Path folder, int threads, Progress progress) {
        int total = s.totalFrames();
        AtomicInteger done = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<?>> jobs = new ArrayList<>();
            for (int k = 0; k < threads; k++) {
                int first = k;
                jobs.add(pool.submit(() -> {
                    FrameMaker maker = new FrameMaker(s);
                    for (int g = first; g < total; g += threads) {
                        writeFrame(s, maker, folder, g);
                        progress.frameWritten(done.incrementAndGet(), total);
                    }
                }));
            }
            for (Future<?> job : jobs) {
                job.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("scenario writing was interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new IllegalStateException("scenario frame failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    private static void writeFrame(Scenario s, FrameMaker maker, Path folder, int global) {
        int session = 0;
        int frame = global;
        while (frame >= s.sessions().get(session).frameCount()) {
            frame -= s.sessions().get(session).frameCount();
            session++;
        }
        Session ses = s.sessions().get(session);
        RenderedFrame f = maker.make(session, frame);
        PngEncoder.writeGrey(framePath(folder, ses, frame), f.width(), f.height(), f.grey());
        PngEncoder.writeGrey16(depthPath(folder, ses, frame), f.width(), f.height(), f.depthMm());
    }

    private static void prepareFolder(Path folder, boolean overwrite) {
        if (Files.exists(folder) && !Files.isDirectory(folder)) {
            throw new BadInputException(folder + ": exists and is not a folder; choose another output folder");
        }
        if (Files.isDirectory(folder) && !overwrite) {
            try (Stream<Path> entries = Files.list(folder)) {
                if (entries.findAny().isPresent()) {
                    throw new BadInputException(folder + ": folder is not empty; choose an empty or new folder, "
                            + "or pass --overwrite to write over it");
                }
            } catch (IOException e) {
                throw new UncheckedIOException(folder + ": cannot list folder (" + e.getMessage() + ")", e);
            }
        }
    }

    /** Deletes our frame_/depth_ images numbered at or beyond {@code frames} (left by a longer earlier run). */
    private static void removeStale(Path sessionFolder, int frames) {
        for (String[] kind : new String[][]{{FRAMES, "frame_"}, {DEPTH, "depth_"}}) {
            Path dir = sessionFolder.resolve(kind[0]);
            if (!Files.isDirectory(dir)) {
                continue;
            }
            try (Stream<Path> entries = Files.list(dir)) {
                for (Path p : entries.toList()) {
                    String n = p.getFileName().toString();
                    if (n.matches(kind[1] + "\\d{5,}\\.png") && Integer.parseInt(n.replaceAll("\\D", "")) >= frames) {
                        Files.delete(p);
                    }
                }
            } catch (IOException e) {
                throw new UncheckedIOException(dir + ": cannot remove stale images (" + e.getMessage() + ")", e);
            }
        }
    }
}
