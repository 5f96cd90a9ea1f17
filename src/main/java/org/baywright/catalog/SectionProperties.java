package org.baywright.catalog;

/**
 * Cross-section properties of a doubly symmetric I-shape, canonical SI (m, m², m³, m⁴, m⁶).
 *
 * @param a gross area A
 * @param ix strong-axis second moment of area Ix
 * @param sx strong-axis elastic section modulus Sx
 * @param zx strong-axis plastic section modulus Zx
 * @param iy weak-axis second moment of area Iy
 * @param sy weak-axis elastic section modulus Sy
 * @param zy weak-axis plastic section modulus Zy
 * @param j St-Venant torsion constant J
 * @param cw warping constant Cw
 */
public record SectionProperties(double a, double ix, double sx, double zx, double iy, double sy, double zy,
        double j, double cw) {

    /** Strong-axis radius of gyration rx = √(Ix/A). */
    public double rx() {
        return Math.sqrt(ix / a);
    }

    /** Weak-axis radius of gyration ry = √(Iy/A). */
    public double ry() {
        return Math.sqrt(iy / a);
    }

    /** Effective radius of gyration for LTB, rts = √(√(Iy·Cw)/Sx) (AISC 360-16 Eq. F2-7). */
    public double rts() {
        return Math.sqrt(Math.sqrt(iy * cw) / sx);
    }
}
