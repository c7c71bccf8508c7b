package revisit.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Finds a file of ../shared/data (see its README.md for sources and licences) from the working directory. */
final class FrameInputData {

    private FrameInputData() {
    }

    static Path file(String relative) {
        for (String base : List.of("../shared/data", "../../shared/data", "/work/shared/data")) {
            Path candidate = Path.of(System.getProperty("user.dir")).resolve(base).resolve(relative).normalize();
            if (Files.isRegularFile(candidate)) {
                return candidate;
            }
        }
        throw new IllegalStateException("shared data file " + relative + " not found; run from the project root "
                + "with ../shared/data beside it");
    }
}
