package revisit.vocabulary;

import java.time.Instant;
import java.util.List;

/**
 * What a training run is told about its input, recorded in the vocabulary's {@link Provenance}.
 *
 * @param descriptorKind names the descriptor the vocabulary is for (extractor and sampling pattern); a vocabulary
 *                       only suits descriptors of the same kind. 1..200 characters
 * @param sources        what the descriptors were extracted from (folders, videos, with counts), 0..10000
 *                       entries of at most 1000 characters
 * @param command        the command line that ran the training, at most 4000 characters
 * @param created        when the training ran
 */
public record TrainingOrigin(String descriptorKind, List<String> sources, String command, Instant created) {

    public TrainingOrigin {
        if (descriptorKind.isEmpty() || descriptorKind.length() > 200) {
            throw new IllegalArgumentException("descriptor kind must be 1..200 characters, was "
                    + descriptorKind.length());
        }
        if (sources.size() > 10_000 || sources.stream().anyMatch(s -> s.length() > 1000)) {
            throw new IllegalArgumentException("at most 10000 sources of at most 1000 characters each");
        }
        if (command.length() > 4000) {
            throw new IllegalArgumentException("command must be at most 4000 characters, was " + command.length());
        }
        sources = List.copyOf(sources);
    }
}
