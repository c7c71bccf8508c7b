package revisit.evaluation;

import java.nio.file.Path;

/**
 * Images of a query and its match, shown side by side as thumbnails in the report.
 *
 * @param query      the query frame
 * @param match      the matched frame
 * @param queryImage image file of the query frame
 * @param matchImage image file of the matched frame
 */
public record ImagePair(FrameKey query, FrameKey match, Path queryImage, Path matchImage) {

    public ImagePair {
        if (query == null || match == null || queryImage == null || matchImage == null) {
            throw new IllegalArgumentException("query, match and both image paths are required");
        }
    }
}
