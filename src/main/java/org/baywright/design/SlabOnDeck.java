package org.baywright.design;

import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;
import org.baywright.units.Units;

/**
 * A concrete slab on composite steel deck (or a solid slab when {@code hr = 0}): the deck profile, the
 * concrete above it and the concrete itself. SI throughout: m, Pa (area loads and stresses), N/m³.
 *
 * @param hr rib height h_r (0 for a solid slab)
 * @param wr average width of a concrete rib w_r (ignored for a solid slab)
 * @param pitch rib pitch, centre to centre (ignored for a solid slab)
 * @param deckWeight the deck's own weight per area [Pa]
 * @param topping concrete above the top of the deck t_c [m]
 * @param density unit weight of the concrete w_c [N/m³] (145 pcf normal weight, 110–115 pcf lightweight)
 * @param fc specified compressive strength f′c [Pa]
 */
public record SlabOnDeck(double hr, double wr, double pitch, double deckWeight, double topping, double density,
        double fc) {

    private static final String PRACTICE = "slab weight from geometry, common practice (CHECK-VALUES §10)";

    public SlabOnDeck {
        if (!(hr >= 0) || !(topping > 0) || !(density > 0) || !(fc > 0) || !(deckWeight >= 0)
                || !Double.isFinite(hr + topping + density + fc + deckWeight)) {
            throw new IllegalArgumentException("slab: rib height and deck weight must be ≥ 0, topping, concrete unit weight "
                    + "and f′c positive");
        }
        if (hr > 0 && (!(wr > 0) || !(pitch > 0) || wr > pitch)) {
            throw new IllegalArgumentException("slab: the rib width must be positive and not more than the rib pitch, got w_r = "
                    + wr + " m, pitch = " + pitch + " m");
        }
    }

    /** A slab in US units: inches, psf, pcf, ksi. */
    public static SlabOnDeck us(double hrIn, double wrIn, double pitchIn, double deckPsf, double toppingIn, double pcf,
            double fcKsi) {
        double in = Units.IN.toSi(1);
        return new SlabOnDeck(hrIn * in, wrIn * in, pitchIn * in, Units.PSF.toSi(deckPsf), toppingIn * in,
                pcf * org.baywright.design.aisc360.StudStrengthI8.PCF, Units.KSI.toSi(fcKsi));
    }

    /** A solid slab (no deck) of thickness {@code t}. */
    public static SlabOnDeck solid(double t, double density, double fc) {
        return new SlabOnDeck(0, 0, 0, 0, t, density, fc);
    }

    /** Total slab thickness h_r + t_c [m]. */
    public double thickness() {
        return hr + topping;
    }

    /** Ratio w_r/h_r (∞ for a solid slab). */
    public double wrOverHr() {
        return hr > 0 ? wr / hr : Double.POSITIVE_INFINITY;
    }

    /**
     * The slab's own weight per area from its geometry [Pa]: the topping, the filled ribs (the share
     * w_r/pitch of the rib height) and the deck, w = w_c·(t_c + h_r·w_r/pitch) + w_deck. Common
     * practice, CHECK-VALUES §10 ("ribs roughly half filled" is w_r/pitch = ½).
     */
    public double weight(Calc calc) {
        double ribs = hr > 0 ? hr * wr / pitch : 0;
        double v = density * (topping + ribs) + deckWeight;
        if (hr == 0) {
            return Calc.eq(calc, "w_slab", "wc·tc + w_deck", PRACTICE, v, Quantity.AREA_LOAD,
                    Arg.num("wc", density), Arg.of("tc", topping, Quantity.SECTION_LENGTH),
                    Arg.of("w_deck", deckWeight, Quantity.AREA_LOAD));
        }
        return Calc.eq(calc, "w_slab", "wc·(tc + hr·wr/p) + w_deck", PRACTICE, v, Quantity.AREA_LOAD,
                Arg.num("wc", density), Arg.of("tc", topping, Quantity.SECTION_LENGTH),
                Arg.of("hr", hr, Quantity.SECTION_LENGTH), Arg.of("wr", wr, Quantity.SECTION_LENGTH),
                Arg.of("p", pitch, Quantity.SECTION_LENGTH), Arg.of("w_deck", deckWeight, Quantity.AREA_LOAD));
    }
}
