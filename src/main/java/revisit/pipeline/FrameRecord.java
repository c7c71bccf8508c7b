package revisit.pipeline;

import revisit.features.FrameFeatures;

/**
 * Everything the scan keeps of one frame once it has been read: its features and their vocabulary words and
 * nodes. Images are not kept.
 *
 * @param sequence sequence id
 * @param frame    frame index within the sequence
 * @param time     timestamp, seconds
 * @param name     file name or video position
 * @param features features of the frame
 * @param words    vocabulary leaf of each feature
 * @param nodes    vocabulary node of each feature at the matching level
 */
public record FrameRecord(int sequence, int frame, double time, String name, FrameFeatures features,
                          int[] words, int[] nodes) {

    public FrameRecord {
        if (words.length != features.count() || nodes.length != features.count()) {
            throw new IllegalArgumentException("words and nodes must have one entry per feature");
        }
    }
}
