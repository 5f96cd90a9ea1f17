package org.baywright.report.drawing;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.baywright.calc.CalcFormat;
import org.baywright.plan.CompositeFloor;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Slab;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.SlabDesign;
import org.baywright.units.UnitSystem;

/**
 * The slab and stud specification of a floor layout whose members act with their slab, as the notes of
 * a framing plan state it: the deck profile, the concrete above it, its unit weight and f′c, the slab
 * weight, the studs (diameter, F_u, per rib and position), shored or unshored with the construction live
 * load, and how a member's studs and camber are written. Empty for a layout without composite members.
 */
public final class SlabNotes {
    private SlabNotes() {
    }

    /** The notes, one paragraph each; empty when no member of {@code members} is composite. */
    public static List<String> of(Floor floor, List<MemberResult> members, UnitSystem us) {
        Set<String> deckIds = new LinkedHashSet<>();
        int composite = 0;
        for (MemberResult m : members) {
            if (m.isComposite()) {
                composite++;
                deckIds.add(m.composite().deck());
            }
        }
        if (composite == 0) {
            return List.of();
        }
        // decks with the same slab share one note
        Map<Slab, List<String>> slabs = new LinkedHashMap<>();
        for (String id : deckIds) {
            for (Deck d : floor.decks()) {
                if (d.id().equals(id) && d.slab() != null) {
                    slabs.computeIfAbsent(d.slab(), k -> new ArrayList<>()).add(id);
                }
            }
        }
        List<String> out = new ArrayList<>();
        for (Map.Entry<Slab, List<String>> e : slabs.entrySet()) {
            String where = slabs.size() > 1 ? "Deck " + String.join(", ", e.getValue()) + ": " : "";
            out.add(where + slabText(e.getKey(), us));
            out.add((slabs.size() > 1 ? "Studs on deck " + String.join(", ", e.getValue()) + ": " : "") + studText(e.getKey(), us));
        }
        CompositeFloor cf = floor.composite();
        out.add(cf.shored()
                ? "Shored: the beams are propped until the concrete reaches f'c; every load acts on the composite section; no camber."
                : "Unshored: the bare steel carries the wet concrete, the deck, its own weight and a construction live load of "
                        + areaLoad(cf.constructionLive(), us) + " (checked by AISC 360-16 F2); camber, where shown, is at midspan.");
        String c = MemberLabels.camber(0.75 * 0.0254, us);
        out.add(composite + " members act with the slab (AISC 360-16 Chapter I), marked size (studs) c=camber: W16X26 (16) c=" + c
                + " is a W16X26 with 16 studs on it, half between each support and midspan, cambered " + c
                + ". A size alone is bare steel.");
        return out;
    }

    /** The slab: deck profile, topping, concrete, weight. */
    static String slabText(Slab s, UnitSystem us) {
        String w = areaLoad(SlabDesign.weight(s), us) + (s.weightGiven() ? " (given)" : " (deck, ribs and topping)");
        if (s.ribHeight() == 0) {
            return "Slab: " + length(s.topping(), us) + " solid concrete, " + density(s.density(), us) + ", f'c = "
                    + stress(s.fc(), us) + "; weight " + w + ".";
        }
        return "Slab: " + length(s.ribHeight(), us) + " composite deck (ribs " + length(s.ribWidth(), us) + " wide on average at "
                + length(s.ribPitch(), us) + ", deck " + areaLoad(s.deckWeight(), us) + ") with " + length(s.topping(), us)
                + " of concrete above the deck (" + length(s.thickness(), us) + " overall), " + density(s.density(), us)
                + ", f'c = " + stress(s.fc(), us) + "; weight " + w + ".";
    }

    /** The studs. */
    static String studText(Slab s, UnitSystem us) {
        return "Studs: " + length(s.studDiameter(), us) + " dia. headed studs, Fu = " + stress(s.studFu(), us) + ", welded through the"
                + " deck; " + s.studsPerRib() + " per rib, " + s.studPosition().name().toLowerCase(Locale.ROOT)
                + " position, where the ribs cross a member; in one row along members parallel to the ribs.";
    }

    /** A section dimension: inches with fractions to 1/8 in, or mm. */
    static String length(double metres, UnitSystem us) {
        if (us == UnitSystem.SI) {
            return CalcFormat.sig(Math.rint(metres * 10000) / 10) + " mm";
        }
        String s = MemberLabels.camber(metres, us);
        return s.isEmpty() ? "0\"" : s;
    }

    static String areaLoad(double pa, UnitSystem us) {
        return CalcFormat.sig(us.areaLoad().fromSi(pa)) + " " + us.areaLoad().symbol();
    }

    static String stress(double pa, UnitSystem us) {
        return CalcFormat.sig(us.stress().fromSi(pa)) + " " + us.stress().symbol();
    }

    static String density(double nPerM3, UnitSystem us) {
        return CalcFormat.sig(us.unitWeight().fromSi(nPerM3)) + " " + us.unitWeight().symbol() + " concrete";
    }
}
