package revisit.features;

import java.util.ArrayList;
import java.util.List;

/**
 * Reference matcher for tests: for every descriptor of the first set, the nearest and second-nearest descriptor of
 * the second set by exhaustive Hamming search; a match is kept when nearest < ratio x second (the ratio test of
 * Lowe, IJCV 2004) and the two are mutual nearest neighbours (cross check, common practice).
 */
final class BruteForceMatcher {

    /** One match: index into the first and into the second set, and the Hamming distance. */
    record Match(int first, int second, int distance) {
    }

    private BruteForceMatcher() {
    }

    static List<Match> match(long[] a, int countA, long[] b, int countB, double ratio) {
        int[] bestForB = new int[countB];
        int[] bestDistForB = new int[countB];
        java.util.Arrays.fill(bestDistForB, Integer.MAX_VALUE);
        int[] nearest = new int[countA];
        int[] nearestDist = new int[countA];
        int[] secondDist = new int[countA];
        for (int i = 0; i < countA; i++) {
            int best = -1;
            int d1 = Integer.MAX_VALUE;
            int d2 = Integer.MAX_VALUE;
            for (int j = 0; j < countB; j++) {
                int d = Hamming.distance(a, i, b, j);
                if (d < d1) {
                    d2 = d1;
                    d1 = d;
                    best = j;
                } else if (d < d2) {
                    d2 = d;
                }
                if (d < bestDistForB[j]) {
                    bestDistForB[j] = d;
                    bestForB[j] = i;
                }
            }
            nearest[i] = best;
            nearestDist[i] = d1;
            secondDist[i] = d2;
        }
        List<Match> out = new ArrayList<>();
        for (int i = 0; i < countA; i++) {
            int j = nearest[i];
            if (j >= 0 && nearestDist[i] < ratio * secondDist[i] && bestForB[j] == i) {
                out.add(new Match(i, j, nearestDist[i]));
            }
        }
        return out;
    }

    static List<Match> match(FrameFeatures a, FrameFeatures b, double ratio) {
        return match(a.descriptors(), a.count(), b.descriptors(), b.count(), ratio);
    }
}
