package revisit.io;

import java.util.Comparator;

/**
 * Orders file names the way a person counts: runs of digits compare by numeric value, so {@code frame2} comes
 * before {@code frame10}; other text compares case-insensitively. Names that differ only in leading zeros or case
 * are ordered by fewer leading zeros first, then by plain {@link String#compareTo}, so the order is total and
 * the same on every machine.
 */
public final class NaturalOrder implements Comparator<String> {

    /** The shared instance (stateless). */
    public static final NaturalOrder INSTANCE = new NaturalOrder();

    private NaturalOrder() {
    }

    @Override
    public int compare(String a, String b) {
        int i = 0;
        int j = 0;
        int zerosTieBreak = 0;
        while (i < a.length() && j < b.length()) {
            char ca = a.charAt(i);
            char cb = b.charAt(j);
            if (isDigit(ca) && isDigit(cb)) {
                int endA = digitRunEnd(a, i);
                int endB = digitRunEnd(b, j);
                int startA = skipZeros(a, i, endA);
                int startB = skipZeros(b, j, endB);
                int byValue = compareDigits(a, startA, endA, b, startB, endB);
                if (byValue != 0) {
                    return byValue;
                }
                if (zerosTieBreak == 0) {
                    zerosTieBreak = Integer.compare(startA - i, startB - j);
                }
                i = endA;
                j = endB;
            } else {
                int byChar = Character.compare(Character.toLowerCase(ca), Character.toLowerCase(cb));
                if (byChar != 0) {
                    return byChar;
                }
                i++;
                j++;
            }
        }
        int byRest = Integer.compare(a.length() - i, b.length() - j);
        if (byRest != 0) {
            return byRest;
        }
        return zerosTieBreak != 0 ? zerosTieBreak : a.compareTo(b);
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static int digitRunEnd(String s, int start) {
        int end = start;
        while (end < s.length() && isDigit(s.charAt(end))) {
            end++;
        }
        return end;
    }

    private static int skipZeros(String s, int start, int end) {
        int k = start;
        while (k < end - 1 && s.charAt(k) == '0') {
            k++;
        }
        return k;
    }

    /** Compares two digit runs without leading zeros by value, for any length (no overflow). */
    private static int compareDigits(String a, int startA, int endA, String b, int startB, int endB) {
        int byLength = Integer.compare(endA - startA, endB - startB);
        if (byLength != 0) {
            return byLength;
        }
        for (int k = 0; k < endA - startA; k++) {
            int byDigit = Character.compare(a.charAt(startA + k), b.charAt(startB + k));
            if (byDigit != 0) {
                return byDigit;
            }
        }
        return 0;
    }
}
