package revisit;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;

/** Finds ../shared/data (see its README.md) from the project root or a worktree; skips the test when absent. */
public final class SharedData {

    private SharedData() {
    }

    /** The shared data folder holding {@code relative}, or a skipped test. */
    public static Path require(String relative) {
        Path root = Path.of(System.getProperty("user.dir"));
        for (Path base : new Path[]{root.resolve("../shared/data"), root.resolve("../../shared/data"),
                Path.of("/work/shared/data")}) {
            Path candidate = base.resolve(relative).normalize();
            if (Files.exists(candidate)) {
                return candidate;
            }
        }
        assumeTrue(false, "shared data '" + relative + "' not found beside the project (../shared/data); skipped");
        throw new IllegalStateException("unreachable");
    }
}
