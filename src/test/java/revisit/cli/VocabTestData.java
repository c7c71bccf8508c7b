package revisit.cli;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/** Finds ../shared/data (see its README.md) from the project root or a worktree, for the vocabulary tests. */
final class VocabTestData {

    private VocabTestData() {
    }

    /** The shared data path {@code relative}, when present. */
    static Optional<Path> find(String relative) {
        Path root = Path.of(System.getProperty("user.dir"));
        for (Path base : new Path[]{root.resolve("../shared/data"), root.resolve("../../shared/data"),
                Path.of("/work/shared/data")}) {
            Path candidate = base.resolve(relative).normalize();
            if (Files.exists(candidate)) {
                return Optional.of(candidate);
            }
        }
        return Optional.empty();
    }

    /** The shared data path {@code relative}, or a skipped test saying it is missing. */
    static Path require(String relative) {
        Optional<Path> path = find(relative);
        assumeTrue(path.isPresent(), "shared data '" + relative + "' not found beside the project "
                + "(../shared/data); skipped");
        return path.orElseThrow();
    }
}
