package org.baywright.report.drawing;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Fixed, locale-free number formatting for files: at most two decimals, no trailing zeros, no "-0". */
final class Num {
    private Num() {
    }

    static String mm(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("not a finite coordinate: " + v);
        }
        BigDecimal b = BigDecimal.valueOf(v).setScale(2, RoundingMode.HALF_EVEN).stripTrailingZeros();
        if (b.signum() == 0) {
            return "0";
        }
        return b.toPlainString();
    }
}
