package org.baywright.design.dg11;

/**
 * Modal damping ratio β by fit-out, DG11 (2nd ed.) guidance, from memory and approximate (CHECK-VALUES
 * §6: the 2nd edition builds β from components, Table 4-2; these are the usual totals). The caller may
 * use any other value.
 */
public enum Damping {
    /** An electronic office with little fit-out: β = 0.02. */
    ELECTRONIC_OFFICE("electronic office, little fit-out", 0.02),
    /** A paper office: β = 0.025. */
    PAPER_OFFICE("paper office", 0.025),
    /** Full-height partitions: β = 0.03. */
    FULL_HEIGHT_PARTITIONS("full-height partitions", 0.03),
    /** Shopping malls: β = 0.02 (1st ed. Table 4.1, from memory). */
    SHOPPING_MALL("shopping mall", 0.02),
    /** Footbridges: β = 0.01 (1st ed. Table 4.1, from memory). */
    FOOTBRIDGE("footbridge", 0.01);

    private final String label;
    private final double beta;

    Damping(String label, double beta) {
        this.label = label;
        this.beta = beta;
    }

    public String label() {
        return label;
    }

    /** The damping ratio β. */
    public double beta() {
        return beta;
    }
}
