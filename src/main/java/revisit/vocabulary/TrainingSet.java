package revisit.vocabulary;

import java.util.Arrays;
import revisit.features.FrameFeatures;

/**
 * Descriptors to train a vocabulary on, grouped by the image they came from (the grouping gives the image counts
 * behind the idf weights).
 *
 * @param descriptors packed 256-bit descriptors, {@link FrameFeatures#STRIDE} longs each; not modified
 * @param count       number of descriptors
 * @param imageStarts index of the first descriptor of each image, ascending, starting at 0; image {@code i} owns
 *                    descriptors {@code imageStarts[i] .. imageStarts[i+1]-1} (the last image runs to
 *                    {@code count}); images may be empty
 */
public record TrainingSet(long[] descriptors, int count, int[] imageStarts) {

    public TrainingSet {
        if (count < 0 || (long) count * FrameFeatures.STRIDE > descriptors.length) {
            throw new IllegalArgumentException("count " + count + " does not fit " + descriptors.length
                    + " longs of descriptors");
        }
        if (imageStarts.length == 0 || imageStarts[0] != 0) {
            throw new IllegalArgumentException("imageStarts must start with 0");
        }
        for (int i = 1; i < imageStarts.length; i++) {
            if (imageStarts[i] < imageStarts[i - 1] || imageStarts[i] > count) {
                throw new IllegalArgumentException("imageStarts must ascend within 0.." + count + ", entry " + i
                        + " was " + imageStarts[i]);
            }
        }
    }

    /** Number of images. */
    public int imageCount() {
        return imageStarts.length;
    }

    /**
     * Image of every descriptor.
     *
     * @return array of {@code count} image indices
     */
    public int[] imageOfDescriptor() {
        int[] image = new int[count];
        for (int i = 0; i < imageStarts.length; i++) {
            int end = i + 1 < imageStarts.length ? imageStarts[i + 1] : count;
            Arrays.fill(image, imageStarts[i], end, i);
        }
        return image;
    }

    /** Collects the descriptors of many frames into one training set. Not thread-safe. */
    public static final class Builder {
        private long[] descriptors = new long[FrameFeatures.STRIDE * 1024];
        private int count;
        private int[] starts = new int[64];
        private int images;

        /**
         * Appends all descriptors of one image as a new image.
         *
         * @param features the image's features
         * @return this builder
         */
        public Builder add(FrameFeatures features) {
            return add(features.descriptors(), features.count());
        }

        /**
         * Appends {@code n} packed descriptors as a new image.
         *
         * @param packed descriptors, {@link FrameFeatures#STRIDE} longs each
         * @param n      number of descriptors to take from the start of {@code packed}
         * @return this builder
         */
        public Builder add(long[] packed, int n) {
            long needed = (long) (count + n) * FrameFeatures.STRIDE;
            if (needed > Integer.MAX_VALUE - 8) {
                throw new IllegalArgumentException("training set would exceed " + (Integer.MAX_VALUE / 8 / 4)
                        + " descriptors; train on fewer frames");
            }
            if (needed > descriptors.length) {
                descriptors = Arrays.copyOf(descriptors, (int) Math.min(Integer.MAX_VALUE - 8,
                        Math.max(needed, 2L * descriptors.length)));
            }
            System.arraycopy(packed, 0, descriptors, count * FrameFeatures.STRIDE, n * FrameFeatures.STRIDE);
            if (images == starts.length) {
                starts = Arrays.copyOf(starts, 2 * starts.length);
            }
            starts[images++] = count;
            count += n;
            return this;
        }

        /** Descriptors collected so far. */
        public int count() {
            return count;
        }

        /** Images collected so far. */
        public int imageCount() {
            return images;
        }

        /** The collected set (copies the arrays). */
        public TrainingSet build() {
            int[] s = images == 0 ? new int[]{0} : Arrays.copyOf(starts, images);
            return new TrainingSet(Arrays.copyOf(descriptors, count * FrameFeatures.STRIDE), count, s);
        }
    }
}
