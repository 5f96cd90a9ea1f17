package org.baywright.load;

/** The two design methods of AISC 360 B3 and ASCE 7 Chapter 2. */
public enum DesignMethod {
    /** Load and resistance factor design: factored loads (ASCE 7 §2.3) against φRn. */
    LRFD,
    /** Allowable strength design: service loads (ASCE 7 §2.4) against Rn/Ω. */
    ASD;

    /** The available strength: φ·Rn for LRFD, Rn/Ω for ASD (AISC 360-16 B3.1, B3.2). */
    public double available(double nominal, double phi, double omega) {
        return this == LRFD ? phi * nominal : nominal / omega;
    }

    /** Parses "lrfd" or "asd" in any case; null otherwise. */
    public static DesignMethod parse(String s) {
        if (s == null) {
            return null;
        }
        return switch (s.trim().toUpperCase(java.util.Locale.ROOT)) {
            case "LRFD" -> LRFD;
            case "ASD" -> ASD;
            default -> null;
        };
    }
}
