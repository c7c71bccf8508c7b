package revisit.cli;

import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Finds the project's shipped files (the default vocabulary) from the running jar or the working folder. */
final class ProjectHome {

    /** Path of the shipped default vocabulary, relative to the project root. */
    static final String DEFAULT_VOCABULARY = "vocab/default.rvoc";

    private ProjectHome() {
    }

    /** The default vocabulary: under -Drevisit.home, beside the jar's folder, or under the working folder. */
    static Path defaultVocabulary() {
        String home = System.getProperty("revisit.home");
        if (home != null) {
            return Path.of(home).resolve(DEFAULT_VOCABULARY);
        }
        try {
            Path jar = Path.of(ProjectHome.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            Path candidate = jar.getParent().getParent().resolve(DEFAULT_VOCABULARY);
            if (Files.exists(candidate)) {
                return candidate;
            }
        } catch (URISyntaxException | RuntimeException e) {
            // fall through to the working folder: the location is only a convenience
        }
        return Path.of(DEFAULT_VOCABULARY);
    }
}
