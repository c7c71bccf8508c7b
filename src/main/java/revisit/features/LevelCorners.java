package revisit.features;

import java.util.Arrays;

/**
 * Corner candidates of one pyramid level in growable primitive arrays: level-pixel position and ranking score.
 * Reused from frame to frame; not thread-safe.
 */
final class LevelCorners {

    private int count;
    private int[] x = new int[256];
    private int[] y = new int[256];
    private float[] score = new float[256];

    void clear() {
        count = 0;
    }

    void add(int px, int py, float s) {
        if (count == x.length) {
            int n = count * 2;
            x = Arrays.copyOf(x, n);
            y = Arrays.copyOf(y, n);
            score = Arrays.copyOf(score, n);
        }
        x[count] = px;
        y[count] = py;
        score[count] = s;
        count++;
    }

    int count() {
        return count;
    }

    int x(int i) {
        return x[i];
    }

    int y(int i) {
        return y[i];
    }

    float score(int i) {
        return score[i];
    }

    void setScore(int i, float s) {
        score[i] = s;
    }
}
