package revisit.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import revisit.scenario.Scenario;
import revisit.scenario.ScenarioConfig;
import revisit.scenario.ScenarioWriter;

/** {@code revisit make-scenario}: renders the invented yard scenario with exact ground truth into a folder. */
@Command(name = "make-scenario", mixinStandardHelpOptions = true,
        description = "Renders an invented yard scenario (frames, depth, ground-truth poses, planted revisits) "
                + "into a folder, the same bytes for the same seed and options.")
final class MakeScenarioCommand implements Callable<Integer> {

    /** Presets of the generator. */
    enum Preset { full, small }

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "DIR",
            description = "Folder to write (created; must be empty unless --overwrite).")
    private Path output;

    @Option(names = "--preset", paramLabel = "NAME", defaultValue = "full",
            description = "full (1000 + 500 frames, 640x480) or small (240 + 120 frames, 320x240). "
                    + "Default: ${DEFAULT-VALUE}.")
    private Preset preset;

    @Option(names = "--seed", paramLabel = "N", description = "Seed of every random choice (default: the preset's).")
    private Long seed;

    @Option(names = "--frames", paramLabel = "N",
            description = "Frames of the first session; the second has half (default: the preset's).")
    private Integer frames;

    @Option(names = "--loops", paramLabel = "N", description = "1 or 2 laps in the first session (default 2).")
    private Integer loops;

    @Option(names = "--size", paramLabel = "WxH", description = "Image size, e.g. 640x480 (default: the preset's).")
    private String size;

    @Option(names = "--clean", description = "No noise, blur, exposure drift or walkers.")
    private boolean clean;

    @Option(names = "--no-second-session", description = "Record only the first session.")
    private boolean noSecondSession;

    @Option(names = "--no-twin", description = "Give the two kiosks different textures.")
    private boolean noTwin;

    @Option(names = "--no-distortion", description = "Use a distortion-free pinhole camera.")
    private boolean noDistortion;

    @Option(names = "--photos", paramLabel = "DIR",
            description = "Folder of real photos to paste as posters (credits go to the scenario's README).")
    private Path photos;

    @Option(names = "--threads", paramLabel = "N", description = "Rendering threads (default: number of cores).")
    private Integer threads;

    @Option(names = "--overwrite", description = "Write into a non-empty folder, replacing our files.")
    private boolean overwrite;

    @Option(names = "--verbose", description = "Show stack traces of errors.")
    private boolean verbose;

    @Override
    public Integer call() {
        ScenarioConfig config = config();
        long start = System.nanoTime();
        Scenario scenario;
        try {
            scenario = photos == null ? Scenario.build(config) : Scenario.build(config, photos);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
        }
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (n < 1) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--threads must be at least 1, was " + n);
        }
        var err = spec.commandLine().getErr();
        ScenarioWriter.write(scenario, output, overwrite, n, (done, total) -> {
            if (done * 10 / total != (done - 1) * 10 / total) {
                synchronized (err) {
                    err.printf(Locale.ROOT, "make-scenario: %d%% (%d/%d frames)%n", done * 100 / total, done, total);
                    err.flush();
                }
            }
        });
        double seconds = (System.nanoTime() - start) / 1e9;
        spec.commandLine().getOut().printf(Locale.ROOT,
                "wrote %s: %d frames in %d session(s), %dx%d, seed %d, %d planted revisits, %d twin decoys "
                        + "(%.1f s, %d threads)%n", output, scenario.totalFrames(), scenario.sessions().size(),
                config.width(), config.height(), config.seed(), scenario.revisits().size(),
                scenario.decoys().size(), seconds, n);
        return 0;
    }

    private ScenarioConfig config() {
        ScenarioConfig c = preset == Preset.small ? ScenarioConfig.small() : ScenarioConfig.defaults();
        try {
            if (seed != null) {
                c = c.withSeed(seed);
            }
            if (frames != null) {
                c = c.withFrameCount(frames);
            }
            if (loops != null) {
                c = c.withLoopCount(loops);
            }
            if (size != null) {
                String[] wh = size.toLowerCase(Locale.ROOT).split("x");
                if (wh.length != 2) {
                    throw new NumberFormatException(size);
                }
                c = c.withSize(Integer.parseInt(wh[0].strip()), Integer.parseInt(wh[1].strip()));
            }
            c = clean ? c.withoutNuisances() : c;
            return c.withSecondSession(!noSecondSession).withTwinPlace(!noTwin).withDistortion(!noDistortion);
        } catch (NumberFormatException e) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--size must look like 640x480, was '" + size + "'");
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
        }
    }
}
