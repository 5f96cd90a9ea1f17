package org.baywright.catalog;

/**
 * The standard dimensions of a rolled doubly symmetric I-shape (W, and later HP, IPE, HE), in metres.
 *
 * @param d overall depth
 * @param bf flange width
 * @param tw web thickness
 * @param tf flange thickness
 * @param kdes design k-distance: outer face of flange to the web toe of the fillet
 */
public record IShapeDimensions(double d, double bf, double tw, double tf, double kdes) {

    public IShapeDimensions {
        check("d", d);
        check("bf", bf);
        check("tw", tw);
        check("tf", tf);
        check("kdes", kdes);
        if (2 * tf >= d) {
            throw new IllegalArgumentException("flanges (2 tf) must be thinner than the depth d");
        }
        if (tw >= bf) {
            throw new IllegalArgumentException("web thickness tw must be less than flange width bf");
        }
        if (kdes < tf) {
            throw new IllegalArgumentException("kdes must be at least tf (kdes = tf + fillet radius)");
        }
        if (2 * kdes >= d) {
            throw new IllegalArgumentException("2 kdes must be less than the depth d");
        }
    }

    private static void check(String name, double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be a positive finite length, got " + v);
        }
    }

    /** Fillet radius r = kdes − tf. */
    public double filletRadius() {
        return kdes - tf;
    }

    /** Distance between flange centroids, ho = d − tf. */
    public double ho() {
        return d - tf;
    }

    /** Clear web height less the fillets, h = d − 2 kdes (AISC 360-16 B4.1b(a) for rolled shapes). */
    public double h() {
        return d - 2 * kdes;
    }
}
