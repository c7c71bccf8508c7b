package revisit.bench;

/**
 * One frame as both retrieval systems of {@link RetrievalComparison} receive it: who it is, when it was taken, and
 * its 256-bit descriptors.
 *
 * @param sequence    sequence (session) index, >= 0
 * @param frame       frame index within the sequence, >= 0
 * @param timeSeconds capture time on the sequence's clock, seconds
 * @param descriptors packed descriptors, {@link revisit.features.FrameFeatures#STRIDE} longs each; not modified
 * @param count       number of descriptors
 */
record DescriptorFrame(int sequence, int frame, double timeSeconds, long[] descriptors, int count) {
}
