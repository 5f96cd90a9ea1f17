package org.baywright.catalog;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One rolled section of a catalog: its designation as the standard prints it (W18X50), its nominal
 * weight per length, its dimensions, and the properties design uses. Design properties are the
 * catalog's tabulated values where it has them, otherwise the values computed from the dimensions.
 * Canonical SI throughout.
 */
public final class Section {
    private static final Pattern DESIGNATION = Pattern.compile("^([A-Z]+)(\\d+(?:\\.\\d+)?)X(\\d+(?:\\.\\d+)?)$");

    private final String designation;
    private final String siDesignation;
    private final String shape;
    private final String nominalDepth;
    private final String series;
    private final double weight;
    private final IShapeDimensions dims;
    private final SectionProperties computed;
    private final SectionProperties design;
    private final Map<Property, Double> tabulated;
    private final int hash;

    /**
     * @param designation e.g. {@code W18X50}
     * @param weight nominal weight per length, N/m
     * @param dims the standard dimensions
     * @param tabulated the tabulated properties the catalog gives (any subset), SI
     */
    public Section(String designation, double weight, IShapeDimensions dims, Map<Property, Double> tabulated) {
        this(designation, "", weight, dims, tabulated);
    }

    /**
     * A section that also carries the designation of the same shape in the SI edition of the standard
     * (W460X52 for W18X35). That name is a listing of the standard (ASTM A6/A6M), not a formula of the
     * dimensions: a catalog gives it or it is absent.
     *
     * @param siDesignation the SI designation, e.g. {@code W460X52}; "" or null for none
     */
    public Section(String designation, String siDesignation, double weight, IShapeDimensions dims,
            Map<Property, Double> tabulated) {
        String si = siDesignation == null ? "" : normalize(siDesignation);
        if (!si.isEmpty() && !DESIGNATION.matcher(si).matches()) {
            throw new IllegalArgumentException("SI designation \"" + siDesignation
                    + "\" is not of the form W460X52 (shape letters, nominal depth in mm, X, mass in kg/m)");
        }
        this.siDesignation = si;
        this.designation = normalize(Objects.requireNonNull(designation, "designation"));
        Matcher m = DESIGNATION.matcher(this.designation);
        if (!m.matches()) {
            throw new IllegalArgumentException("designation \"" + designation
                    + "\" is not of the form W18X50 (shape letters, nominal depth, X, nominal weight)");
        }
        this.shape = m.group(1);
        this.nominalDepth = m.group(2);
        this.series = shape + nominalDepth;
        if (!(weight > 0) || !Double.isFinite(weight)) {
            throw new IllegalArgumentException(designation + ": weight must be positive, got " + weight);
        }
        this.weight = weight;
        this.dims = Objects.requireNonNull(dims, "dims");
        this.computed = IShapeGeometry.compute(dims);
        EnumMap<Property, Double> tab = new EnumMap<>(Property.class);
        tab.putAll(tabulated);
        this.tabulated = java.util.Collections.unmodifiableMap(tab);
        double[] v = new double[Property.values().length];
        for (Property p : Property.values()) {
            Double t = tab.get(p);
            if (t != null && (!(t > 0) || !Double.isFinite(t))) {
                throw new IllegalArgumentException(designation + ": " + p.column() + " must be positive, got " + t);
            }
            v[p.ordinal()] = t != null ? t : p.of(computed);
        }
        this.design = Property.build(v);
        this.hash = Objects.hash(this.designation, weight, dims);
    }

    /** Upper-case, no spaces, "x" → "X": {@code w18x50} and {@code W18 X 50} both give {@code W18X50}. */
    public static String normalize(String designation) {
        return designation.trim().replace(" ", "").toUpperCase(Locale.ROOT);
    }

    public String designation() {
        return designation;
    }

    /** The designation of the same shape in the SI edition (W460X52), or "" when the catalog does not give it. */
    public String siDesignation() {
        return siDesignation;
    }

    /**
     * The designation to print in a unit system: in SI the SI designation where the catalog gives one,
     * otherwise (and in US units) the designation.
     */
    public String designationIn(org.baywright.units.UnitSystem units) {
        return units == org.baywright.units.UnitSystem.SI && !siDesignation.isEmpty() ? siDesignation : designation;
    }

    /** Shape letters: {@code W}. */
    public String shape() {
        return shape;
    }

    /** Series by nominal depth, as used for filters: {@code W18}. */
    public String series() {
        return series;
    }

    /** Nominal weight per length, N/m (the self-weight design adds to the dead load). */
    public double weight() {
        return weight;
    }

    public IShapeDimensions dims() {
        return dims;
    }

    /** Actual depth d, m. */
    public double depth() {
        return dims.d();
    }

    /** The properties design uses: tabulated where given, computed otherwise. */
    public SectionProperties props() {
        return design;
    }

    /** The properties computed from the dimensions (for verification and custom sections). */
    public SectionProperties computed() {
        return computed;
    }

    /** The tabulated values the catalog gives, SI. */
    public Map<Property, Double> tabulated() {
        return tabulated;
    }

    /** Web slenderness h/tw with h = d − 2kdes. */
    public double hOverTw() {
        return dims.h() / dims.tw();
    }

    /** Flange slenderness bf/2tf. */
    public double bfOver2tf() {
        return dims.bf() / (2 * dims.tf());
    }

    /** ho = d − tf. */
    public double ho() {
        return dims.ho();
    }

    @Override
    public String toString() {
        return designation;
    }

    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof Section s && s.hash == hash && s.designation.equals(designation) && s.siDesignation.equals(siDesignation) && s.weight == weight
                && s.dims.equals(dims) && s.tabulated.equals(tabulated);
    }

    @Override
    public int hashCode() {
        return hash;
    }
}
