package org.baywright.catalog;

import org.baywright.units.Dimension;

/** A tabulated cross-section property, with the column name used in catalog files. */
public enum Property {
    A("A", Dimension.AREA),
    IX("Ix", Dimension.MOMENT_OF_INERTIA),
    ZX("Zx", Dimension.SECTION_MODULUS),
    SX("Sx", Dimension.SECTION_MODULUS),
    IY("Iy", Dimension.MOMENT_OF_INERTIA),
    ZY("Zy", Dimension.SECTION_MODULUS),
    SY("Sy", Dimension.SECTION_MODULUS),
    J("J", Dimension.MOMENT_OF_INERTIA),
    CW("Cw", Dimension.WARPING_CONSTANT);

    private final String column;
    private final Dimension dimension;

    Property(String column, Dimension dimension) {
        this.column = column;
        this.dimension = dimension;
    }

    public String column() {
        return column;
    }

    public Dimension dimension() {
        return dimension;
    }

    /** The value of this property in a property set. */
    public double of(SectionProperties p) {
        return switch (this) {
            case A -> p.a();
            case IX -> p.ix();
            case ZX -> p.zx();
            case SX -> p.sx();
            case IY -> p.iy();
            case ZY -> p.zy();
            case SY -> p.sy();
            case J -> p.j();
            case CW -> p.cw();
        };
    }

    /** Builds a property set from values indexed by {@link #ordinal()}. */
    static SectionProperties build(double[] v) {
        return new SectionProperties(v[A.ordinal()], v[IX.ordinal()], v[SX.ordinal()], v[ZX.ordinal()],
                v[IY.ordinal()], v[SY.ordinal()], v[ZY.ordinal()], v[J.ordinal()], v[CW.ordinal()]);
    }
}
