package revisit.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import revisit.scenario.FrameMaker;
import revisit.scenario.RenderedFrame;
import revisit.scenario.Scenario;
import revisit.scenario.ScenarioConfig;
import revisit.scenario.ScenarioWriter;

/**
 * Speed of the invented-scenario generator at 640x480 with every nuisance on.
 *
 * <ul>
 *   <li>{@code renderFrame}: one frame (render, blur, exposure, noise, depth) on one thread, ms per frame.</li>
 *   <li>{@code writeThousandFrames}: the whole default first session (1000 frames, PNG frames and 16-bit depth
 *       PNGs, poses, manifest) written with 2 threads, seconds per run (the target is under 60 s on 2 cores).</li>
 * </ul>
 * Run: {@code mvn -B -Pbench -DskipTests package && java -jar target/benchmarks.jar ScenarioBench}
 */
public class ScenarioBench {

    @State(Scope.Thread)
    public static class OneFrame {
        FrameMaker maker;
        int next;

        @Setup(Level.Trial)
        public void build() {
            maker = new FrameMaker(Scenario.build(ScenarioConfig.defaults()));
        }
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Warmup(iterations = 2, time = 5)
    @Measurement(iterations = 3, time = 10)
    @Fork(1)
    public RenderedFrame renderFrame(OneFrame state) {
        state.next = (state.next + 37) % 1000;
        return state.maker.make(0, state.next);
    }

    @State(Scope.Benchmark)
    public static class Folder {
        Scenario scenario;
        Path dir;

        @Setup(Level.Trial)
        public void build() {
            scenario = Scenario.build(ScenarioConfig.defaults().withSecondSession(false));
        }

        @Setup(Level.Iteration)
        public void create() throws IOException {
            dir = Files.createTempDirectory("revisit-scenario-bench");
        }

        @TearDown(Level.Iteration)
        public void delete() throws IOException {
            try (Stream<Path> walk = Files.walk(dir)) {
                for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                    Files.delete(p);
                }
            }
        }
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.SECONDS)
    @Warmup(iterations = 1)
    @Measurement(iterations = 3)
    @Fork(1)
    public Path writeThousandFrames(Folder state) {
        ScenarioWriter.write(state.scenario, state.dir, false, 2, (done, total) -> { });
        return state.dir;
    }
}
