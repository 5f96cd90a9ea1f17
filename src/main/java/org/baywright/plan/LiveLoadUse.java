package org.baywright.plan;

/**
 * What an area load's live load is, for live-load reduction (ASCE 7-16 §4.7.2–4.7.5): the occupancy of
 * ASCE 7-16 Table 4.3-1 it stands for, in the trade's words.
 */
public enum LiveLoadUse {
    /** Ordinary reducible floor live load (offices, corridors, residential…): §4.7.2; above 100 psf, §4.7.3. */
    ORDINARY("Offices, residential, corridors", "ASCE 7-16 §4.7.2", 0),
    /** Places of public assembly: not reduced when L0 ≤ 100 psf (§4.7.5). */
    ASSEMBLY("Assembly: lobbies, theatres, stadiums", "ASCE 7-16 §4.7.5", 0),
    /** Passenger-vehicle garage: not reduced, except 20 % for members supporting two or more floors (§4.7.4). */
    GARAGE("Passenger-vehicle garage", "ASCE 7-16 §4.7.4", 40 * PSF()),
    /**
     * Light storage warehouse, Table 4.3-1 125 psf: a heavy live load, not reduced except by up to 20 % for
     * members supporting two or more floors (§4.7.3), whatever the value typed.
     */
    STORAGE_LIGHT("Storage warehouse, light", "ASCE 7-16 §4.7.3", 125 * PSF()),
    /** Heavy storage warehouse, Table 4.3-1 250 psf: §4.7.3 as for light storage. */
    STORAGE_HEAVY("Storage warehouse, heavy", "ASCE 7-16 §4.7.3", 250 * PSF()),
    /** Loads the engineer excludes from reduction for any other reason. */
    NOT_REDUCIBLE("Not reduced (engineer's choice)", "", 0);

    private final String words;
    private final String clause;
    private final double tableMinimum;

    LiveLoadUse(String words, String clause, double tableMinimum) {
        this.words = words;
        this.clause = clause;
        this.tableMinimum = tableMinimum;
    }

    /** 1 psf in Pa (the plan package knows no units; 1 lbf/ft² = 4.4482216152605 N / 0.09290304 m²). */
    private static double PSF() {
        return 4.4482216152605 / 0.09290304;
    }

    /** The occupancy in the trade's words, e.g. "Storage warehouse, light". */
    public String words() {
        return words;
    }

    /** The clause that governs its reduction, e.g. "ASCE 7-16 §4.7.3" (empty for the engineer's choice). */
    public String clause() {
        return clause;
    }

    /** The list entry: the words and the clause, e.g. "Storage warehouse, light (ASCE 7-16 §4.7.3)". */
    public String label() {
        return clause.isEmpty() ? words : words + " (" + clause + ")";
    }

    /**
     * The uniform live load ASCE 7-16 Table 4.3-1 gives for this occupancy, Pa; 0 where the table has several
     * rows for it (offices 50 psf, corridors 80 psf…; assembly 60–100 psf) and the engineer picks the row.
     */
    public double tableMinimum() {
        return tableMinimum;
    }

    /** True for the storage uses, whose live load is a heavy live load whatever its value (§4.7.3). */
    public boolean storage() {
        return this == STORAGE_LIGHT || this == STORAGE_HEAVY;
    }
}
