package org.baywright.plan;

import org.baywright.units.Units;

/**
 * The concrete slab on composite steel deck that a deck area carries, with its headed studs. SI:
 * m, Pa (area loads and strengths), N/m³, N.
 *
 * <p>The slab's own weight is worked out from this geometry by the design code (topping, filled ribs and
 * deck); {@code weightOverride} replaces it when the user gives a value (NaN otherwise).
 *
 * @param ribHeight deck rib height h_r (0 for a solid slab on forms)
 * @param ribWidth average width of a concrete rib w_r
 * @param ribPitch rib pitch, centre to centre
 * @param deckWeight the deck's own weight per area
 * @param topping concrete above the top of the deck t_c
 * @param density concrete unit weight w_c
 * @param fc specified concrete compressive strength f′c
 * @param studDiameter headed stud shank diameter d_sa
 * @param studFu stud tensile strength F_u
 * @param studsPerRib studs per rib where the ribs cross a member, per row where they run along it
 * @param studPosition weak or strong position in a rib (I8.2a)
 * @param weightOverride the slab weight per area the user gives instead of the computed one; NaN for none
 */
public record Slab(double ribHeight, double ribWidth, double ribPitch, double deckWeight, double topping, double density,
        double fc, double studDiameter, double studFu, int studsPerRib, StudPlacement studPosition, double weightOverride) {

    public Slab {
        if (studPosition == null) {
            throw new IllegalArgumentException("slab: the stud position is required (weak or strong)");
        }
    }

    /**
     * The slab new plans start with: 3 in deck (6 in average rib width at 12 in pitch, 2.5 psf), 4½ in of
     * normal-weight concrete (145 pcf, f′c 4 ksi) above it, ¾ in studs (F_u 65 ksi) one per rib in the weak
     * position. Common practice for an office floor (CHECK-VALUES §10: about 75 psf).
     */
    public static Slab typical() {
        return new Slab(Units.IN.toSi(3), Units.IN.toSi(6), Units.IN.toSi(12), Units.PSF.toSi(2.5), Units.IN.toSi(4.5),
                Units.PCF.toSi(145), Units.KSI.toSi(4), Units.IN.toSi(0.75), Units.KSI.toSi(65), 1, StudPlacement.WEAK, Double.NaN);
    }

    /** True when the user gave the slab weight. */
    public boolean weightGiven() {
        return !Double.isNaN(weightOverride);
    }

    /** Total slab thickness h_r + t_c, m. */
    public double thickness() {
        return ribHeight + topping;
    }

    /** This slab with another topping, m. */
    public Slab withTopping(double t) {
        return new Slab(ribHeight, ribWidth, ribPitch, deckWeight, t, density, fc, studDiameter, studFu, studsPerRib, studPosition,
                weightOverride);
    }

    /** This slab with another concrete unit weight, N/m³. */
    public Slab withDensity(double d) {
        return new Slab(ribHeight, ribWidth, ribPitch, deckWeight, topping, d, fc, studDiameter, studFu, studsPerRib, studPosition,
                weightOverride);
    }

    /** This slab with the weight given (NaN: computed from the geometry), Pa. */
    public Slab withWeightOverride(double w) {
        return new Slab(ribHeight, ribWidth, ribPitch, deckWeight, topping, density, fc, studDiameter, studFu, studsPerRib, studPosition,
                w);
    }
}
