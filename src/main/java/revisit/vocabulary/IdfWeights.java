package revisit.vocabulary;

/**
 * Inverse document frequency weights of the words: {@code w_i = ln(N / N_i)}, where {@code N} is the number of
 * training images and {@code N_i} the number of those images that contain word {@code i} at least once (Sivic
 * and Zisserman, "Video Google", ICCV 2003; the entropy weight of Nistér and Stewénius, CVPR 2006). A word found
 * in every image weighs 0; a word found in one image weighs {@code ln N}.
 */
public final class IdfWeights {

    private IdfWeights() {
    }

    /**
     * @param imageCount    N, training images, >= 1
     * @param imagesPerWord N_i per word, each 0..N; a word in no image (it cannot arise from training, where every
     *                      word holds at least one descriptor) gets weight 0 so that it never dominates a score
     * @return weight per word, >= 0
     */
    public static double[] of(int imageCount, int[] imagesPerWord) {
        if (imageCount < 1) {
            throw new IllegalArgumentException("image count must be >= 1, was " + imageCount);
        }
        double[] weights = new double[imagesPerWord.length];
        for (int w = 0; w < weights.length; w++) {
            int n = imagesPerWord[w];
            if (n < 0 || n > imageCount) {
                throw new IllegalArgumentException("word " + w + " is in " + n + " images, expected 0.." + imageCount);
            }
            weights[w] = n == 0 ? 0.0 : Math.log((double) imageCount / n);
        }
        return weights;
    }
}
