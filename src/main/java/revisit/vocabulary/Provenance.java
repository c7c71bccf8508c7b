package revisit.vocabulary;

import java.util.List;

/**
 * How a vocabulary was trained; stored in its file so that a vocabulary can be reproduced and audited.
 *
 * @param sources         what the training descriptors were extracted from
 * @param command         the command line that ran the training
 * @param createdUtc      when it ran, ISO-8601 UTC (e.g. {@code 2025-01-31T12:00:00Z})
 * @param seed            k-means++ seed
 * @param maxIterations   Lloyd iterations allowed per node
 * @param imageCount      training images (N of the idf weights)
 * @param descriptorCount training descriptors
 */
public record Provenance(List<String> sources, String command, String createdUtc, long seed, int maxIterations,
                         int imageCount, long descriptorCount) {

    public Provenance {
        sources = List.copyOf(sources);
        if (imageCount < 1 || descriptorCount < 0 || maxIterations < 1) {
            throw new IllegalArgumentException("provenance needs >= 1 image, >= 0 descriptors and >= 1 iteration");
        }
    }
}
