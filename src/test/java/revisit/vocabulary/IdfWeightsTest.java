package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class IdfWeightsTest {

    @Test
    void weighsEachWordByTheLogOfImagesOverImagesContainingIt() {
        // Worked by hand from w_i = ln(N / N_i) (Nister and Stewenius, CVPR 2006), N = 3 images:
        //   word in 3 images: ln(3/3) = 0
        //   word in 2 images: ln(3/2) = 0.405465108...
        //   word in 1 image:  ln(3/1) = 1.098612288...
        //   word in no image: defined as 0 (IdfWeights documents why)
        double[] w = IdfWeights.of(3, new int[]{3, 2, 1, 0});
        assertArrayEquals(new double[]{0.0, 0.4054651081081644, 1.0986122886681098, 0.0}, w, 1e-15);
    }

    @Test
    void rejectsAWordInMoreImagesThanExist() {
        assertThrows(IllegalArgumentException.class, () -> IdfWeights.of(3, new int[]{4}));
        assertThrows(IllegalArgumentException.class, () -> IdfWeights.of(0, new int[]{0}));
    }
}
