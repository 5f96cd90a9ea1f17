package org.baywright.study;

/** The tolerances a study compares typed values with, each with the reason for its size. */
final class SearchLimits {
    /** A depth limit admits variants this much deeper: the member search's own allowance. */
    static final double DEPTH_ROUNDING = org.baywright.design.SearchFilter.DEPTH_ROUNDING;
    /**
     * A range's last step may fall short of its end by this fraction of a step and still count:
     * 6ft..15ft:1ft in metres divides to 8.999999999 steps, which is nine.
     */
    static final double STEP_ROUNDING = 1e-9;

    private SearchLimits() {
    }

    /** How many values the range from..to by step holds, its end included when it falls on a step. */
    static long count(double from, double to, double step) {
        return (long) Math.floor((to - from) / step + STEP_ROUNDING) + 1;
    }
}
