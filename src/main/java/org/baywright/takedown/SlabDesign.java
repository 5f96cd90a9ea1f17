package org.baywright.takedown;

import org.baywright.design.SlabOnDeck;
import org.baywright.design.Studs;
import org.baywright.design.aisc360.StudPosition;
import org.baywright.plan.Slab;
import org.baywright.plan.StudPlacement;

/** A plan's slab as the design code sees it, and its weight. */
public final class SlabDesign {
    private SlabDesign() {
    }

    /** The slab on deck of the design code (its weight from the geometry by {@link SlabOnDeck#weight}). */
    public static SlabOnDeck slabOnDeck(Slab s) {
        return new SlabOnDeck(s.ribHeight(), s.ribWidth(), s.ribPitch(), s.deckWeight(), s.topping(), s.density(), s.fc());
    }

    /** The studs of the design code. */
    public static Studs studs(Slab s) {
        return new Studs(s.studDiameter(), s.studFu(), s.studsPerRib(),
                s.studPosition() == StudPlacement.STRONG ? StudPosition.STRONG : StudPosition.WEAK);
    }

    /** The slab's weight per area, Pa: the user's value where given, else from the geometry (common practice). */
    public static double weight(Slab s) {
        return s.weightGiven() ? s.weightOverride() : slabOnDeck(s).weight(null);
    }

    /** The slab's weight per area from its geometry alone, Pa (what the user may override). */
    public static double computedWeight(Slab s) {
        return slabOnDeck(s).weight(null);
    }
}
