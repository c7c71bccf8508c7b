package revisit.bench;

import com.sun.management.OperatingSystemMXBean;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.stream.Stream;
import revisit.scenario.FrameMaker;
import revisit.scenario.Scenario;
import revisit.scenario.ScenarioConfig;
import revisit.scenario.ScenarioWriter;

/**
 * Times writing the default first session (1000 frames at 640x480 with every nuisance, PNG frames and 16-bit
 * depth PNGs) with 2 threads, and prints wall time and process CPU time. On a shared machine the wall time
 * includes waiting for other jobs; CPU time / 2 is the wall time on 2 otherwise idle cores.
 * With the argument {@code render} it prints instead the thread CPU time of rendering one frame (no writing).
 * Run: {@code mvn -B -Pbench -DskipTests package && java -cp target/benchmarks.jar revisit.bench.ScenarioTiming}
 */
public final class ScenarioTiming {

    private ScenarioTiming() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length > 0 && args[0].equals("render")) {
            renderOnly(ScenarioConfig.defaults());
            renderOnly(ScenarioConfig.defaults().withoutNuisances());
            return;
        }
        int frames = args.length > 0 ? Integer.parseInt(args[0]) : 1000;
        OperatingSystemMXBean os = (OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        long cpu0 = os.getProcessCpuTime();
        long wall0 = System.nanoTime();
        Scenario s = Scenario.build(ScenarioConfig.defaults().withFrameCount(frames).withSecondSession(false));
        long cpu1 = os.getProcessCpuTime();
        long wall1 = System.nanoTime();
        Path dir = Files.createTempDirectory("revisit-scenario-timing");
        try {
            ScenarioWriter.write(s, dir, false, 2, (done, total) -> { });
            long cpu2 = os.getProcessCpuTime();
            long wall2 = System.nanoTime();
            System.out.printf(Locale.ROOT, "build: wall %.1f s, cpu %.1f s%n", (wall1 - wall0) / 1e9,
                    (cpu1 - cpu0) / 1e9);
            System.out.printf(Locale.ROOT, "write %d frames 640x480, 2 threads: wall %.1f s, cpu %.1f s "
                    + "(cpu / 2 = %.1f s), %.1f ms cpu per frame%n", frames, (wall2 - wall1) / 1e9,
                    (cpu2 - cpu1) / 1e9, (cpu2 - cpu1) / 2e9, (cpu2 - cpu1) / 1e6 / frames);
        } finally {
            try (Stream<Path> walk = Files.walk(dir)) {
                for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                    Files.delete(p);
                }
            }
        }
    }

    /** Thread CPU time per frame of rendering alone (one thread, after 30 warm-up frames). */
    private static void renderOnly(ScenarioConfig config) {
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        FrameMaker maker = new FrameMaker(Scenario.build(config));
        for (int i = 0; i < 30; i++) {
            maker.make(0, i * 30);
        }
        long cpu0 = threads.getCurrentThreadCpuTime();
        int n = 100;
        long sink = 0;
        for (int i = 0; i < n; i++) {
            sink += maker.make(0, (i * 9) % 1000).grey()[0];
        }
        System.out.printf(Locale.ROOT, "render one frame 640x480 (%s): %.1f ms thread cpu (checksum %d)%n",
                config.noiseSigma() > 0 ? "all nuisances" : "clean",
                (threads.getCurrentThreadCpuTime() - cpu0) / 1e6 / n, sink);
    }
}
