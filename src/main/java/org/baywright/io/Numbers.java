package org.baywright.io;

import java.util.Locale;

/** The shortest-stable text of numbers written to plan files. */
final class Numbers {
    /** Significant digits written: enough that read → write → read agrees to 1e-9 relative. */
    static final int DIGITS = 10;

    private Numbers() {
    }

    /**
     * Formats a finite number with {@value #DIGITS} significant digits, dropping trailing zeros and
     * writing an exponent only for very large or small magnitudes: {@code 30}, {@code 2.394},
     * {@code 1.5e-7}. Formatting a number parsed from this text gives the same text again.
     */
    static String format(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("cannot write a non-finite number (" + v + ") to a plan file");
        }
        if (v == 0) {
            return "0";
        }
        String s = String.format(Locale.ROOT, "%." + DIGITS + "g", v);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        if (mantissa.indexOf('.') >= 0) {
            int end = mantissa.length();
            while (mantissa.charAt(end - 1) == '0') {
                end--;
            }
            if (mantissa.charAt(end - 1) == '.') {
                end--;
            }
            mantissa = mantissa.substring(0, end);
        }
        if (e < 0) {
            return mantissa.equals("-0") ? "0" : mantissa;
        }
        return mantissa + "e" + Integer.parseInt(s.substring(e + 1));
    }
}
