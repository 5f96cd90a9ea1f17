package org.baywright.takedown;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.baywright.calc.Calc;
import org.baywright.catalog.Section;
import org.baywright.design.Steel;
import org.baywright.design.aisc360.StudStrengthI8;
import org.baywright.design.dg11.BayVibration;
import org.baywright.design.dg11.Damping;
import org.baywright.design.dg11.Dg11;
import org.baywright.design.dg11.EffectiveWeights;
import org.baywright.design.dg11.Occupancy;
import org.baywright.design.dg11.Ribs;
import org.baywright.design.dg11.Stiffness;
import org.baywright.design.dg11.VibrationLoads;
import org.baywright.design.dg11.VibrationMember;
import org.baywright.design.dg11.VibrationResult;
import org.baywright.design.dg11.VibrationSlab;
import org.baywright.design.dg11.Walking;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.plan.Slab;
import org.baywright.plan.VibrationSettings;

/**
 * The floor-vibration check from walking (AISC Design Guide 11, 2nd ed., low-frequency floors;
 * {@code design.dg11}) of every bay ({@link Bays}) of every floor layout of a run.
 *
 * <p>For each bay: the slab of the deck under its centre ({@link Deck#slab()}; none: "no slab described — not
 * checked"), realistic loads (the slab's weight {@link SlabDesign#weight}, the superimposed dead load of the area
 * loads at its centre, the vibration live load of the settings' use), the transformed sections of its most
 * flexible beam and of each member carrying the beams with the dynamic modulus, the floor extents and edge, and
 * continuity read from the plan; the walking check is made with each interior carrying member (beams framing
 * into it from both sides; a bay without one, with each edge member) and the one with the highest ratio
 * governs. Roof layouts are not checked (walking on a roof is not what DG11's office limits are
 * for).
 */
public final class BayChecks {
    /** Note of a bay on a deck without a slab description. */
    public static final String NO_SLAB = "no slab described — not checked";
    /** Note of a bay of a roof layout. */
    public static final String ROOF = "roof — walking not checked";

    private BayChecks() {
    }

    /**
     * What the walking check of a bay was given, worked out from the plan (SI).
     *
     * @param ec static modulus of the concrete E_c (AISC 360-16 I2.1b) [Pa]
     * @param slabWeight the slab's weight (slab and deck) [Pa]
     * @param live the vibration live load [Pa]
     * @param areaWeight w_a = D + SD + L_v [Pa]
     * @param beamIt the beam's transformed moment of inertia [m⁴]
     * @param girderIt the governing carrying member's [m⁴]
     * @param vibration the inputs of the walking check itself
     * @param interior true for C_j = 2.0, false for an edge bay (C_j = 1.0)
     * @param ribsAlongBeams true when the deck ribs run along the beams (then the girders' ribs cross them)
     */
    public record Inputs(double ec, double slabWeight, double live, double areaWeight, double beamIt, double girderIt,
            BayVibration vibration, boolean interior, boolean ribsAlongBeams) {
    }

    /** Every bay of every floor layout of {@code t}, layouts in the order of the levels first using them. */
    public static List<BayResult> of(Plan plan, TakedownResult t, VibrationSettings settings) {
        Map<String, List<String>> levelsByKey = new LinkedHashMap<>();
        Map<String, Floor> floorByKey = new LinkedHashMap<>();
        for (Level lv : plan.levels()) {
            String key = t.levelFloors().get(lv.name());
            Optional<Floor> f = plan.floor(lv.floor());
            if (key == null || f.isEmpty()) {
                continue;
            }
            levelsByKey.computeIfAbsent(key, k -> new ArrayList<>()).add(lv.name());
            floorByKey.putIfAbsent(key, f.get());
        }
        List<BayResult> out = new ArrayList<>();
        for (Map.Entry<String, List<String>> e : levelsByKey.entrySet()) {
            Floor floor = floorByKey.get(e.getKey());
            for (Bay bay : Bays.find(plan, floor, e.getKey(), t.members().getOrDefault(e.getKey(), List.of()))) {
                out.add(check(floor, bay, e.getValue(), settings));
            }
        }
        return out;
    }

    /** The check of one bay of {@code floor}. */
    public static BayResult check(Floor floor, Bay bay, List<String> levels, VibrationSettings settings) {
        double sd = 0;
        for (AreaLoad a : floor.areaLoads()) {
            if (a.outline().contains(bay.centre().x(), bay.centre().y())) {
                sd += a.values().superimposed();
            }
        }
        Deck deck = floor.decks().stream().filter(d -> d.outline().contains(bay.centre().x(), bay.centre().y()))
                .findFirst().orElse(null);
        Slab slab = deck == null ? null : deck.slab();
        if (floor.roof()) {
            return new BayResult(bay, levels, slab, sd, settings, null, null, null, ROOF);
        }
        if (slab == null) {
            return new BayResult(bay, levels, null, sd, settings, null, null, null, NO_SLAB);
        }
        boolean ribsAlongBeams = ribsAlong(deck.spanAngle(), bay.beamAngle());
        BayResult draft = new BayResult(bay, levels, slab, sd, settings, null, null, null, "");
        String governing = null;
        Evaluation best = null;
        // the girder mode is DG11's interior girder's (D_g = I_g/L_j): a member with beams on both sides; only a
        // bay without one (a floor one bay deep) is checked with its edge girders
        List<Bay.BayGirder> candidates = bay.girders().stream().filter(Bay.BayGirder::bothSides).toList();
        for (Bay.BayGirder g : candidates.isEmpty() ? bay.girders() : candidates) {
            Evaluation ev;
            try {
                ev = evaluate(draft, g.id(), ribsAlongBeams, null);
            } catch (IllegalArgumentException e) {
                // an input the method refuses (a slab without concrete above the deck …): said, not thrown
                return new BayResult(bay, levels, slab, sd, settings, null, null, null, "not checked: " + e.getMessage());
            }
            if (best == null || ev.result().ratio() > best.result().ratio()) {
                best = ev;
                governing = g.id();
            }
        }
        return new BayResult(bay, levels, slab, sd, settings, governing, best.inputs(), best.result(), "");
    }

    /** True when deck ribs at {@code ribAngle} run along members at {@code memberAngle} (degrees), within 45°. */
    static boolean ribsAlong(double ribAngle, double memberAngle) {
        double d = Math.abs(ribAngle - memberAngle) % 180;
        return Math.min(d, 180 - d) < 45;
    }

    private record Evaluation(Inputs inputs, VibrationResult result) {
    }

    /** Re-runs the check of {@code r} with {@code girder} as the carrying member, recording into {@code calc}. */
    static VibrationResult evaluate(BayResult r, String girder, Calc calc) {
        return evaluate(r, girder, r.inputs().ribsAlongBeams(), calc).result();
    }

    private static Evaluation evaluate(BayResult r, String girderId, boolean ribsAlongBeams, Calc calc) {
        Bay bay = r.bay();
        Slab s = r.slab();
        VibrationSettings set = r.settings();
        Bay.BayGirder g = bay.girders().stream().filter(x -> x.id().equals(girderId)).findFirst().orElseThrow();
        Occupancy occ = Occupancy.valueOf(set.use().name());
        Damping fit = Damping.valueOf(set.effectiveFitOut().name());
        double beta = Double.isNaN(set.damping()) ? fit.beta() : set.damping();
        double live = Double.isNaN(set.live()) ? occ.vibrationLive() : set.live();
        double es = Steel.A992.e();
        if (calc != null) {
            calc.heading("Bay " + bay.id() + ": beams " + String.join(", ", bay.beams()) + " (" + bay.beam() + " checked, "
                    + bay.beamSection().designation() + "), carried by " + g.id() + " (" + g.section().designation() + ")");
            calc.note(String.format(java.util.Locale.ROOT, "%s; %s; damping β = %s (%s)", occ.label(),
                    bay.edge() ? "edge bay: a side along the beams is at the slab edge" : "interior bay",
                    org.baywright.calc.CalcFormat.sig(beta), Double.isNaN(set.damping()) ? fit.label() : "given"),
                    Dg11.section("§4.1"));
            calc.heading("Slab and realistic loads");
        }
        double ec = StudStrengthI8.ec(s.density(), s.fc(), calc);
        double ribFraction = s.ribHeight() > 0 && s.ribPitch() > 0 ? Math.min(1, s.ribWidth() / s.ribPitch()) : 0;
        VibrationSlab vs = new VibrationSlab(s.topping(), s.ribHeight(), ribFraction, ec);
        double n = Stiffness.modularRatio(es, ec, calc);
        double ds = Stiffness.ds(vs.de(), n, calc);
        double slabWeight = s.weightGiven() ? s.weightOverride() : SlabDesign.slabOnDeck(s).weight(calc);
        if (calc != null && s.weightGiven()) {
            calc.note("slab weight given in the plan: " + org.baywright.calc.CalcFormat.sig(slabWeight) + " Pa", "plan");
        }
        double wa = VibrationLoads.areaWeight(slabWeight, r.superimposed(), live, calc);
        Section bs = bay.beamSection();
        Section gs = g.section();
        double wj = VibrationLoads.beamWeight(wa, bay.spacing(), bs.weight(), calc);
        double carried = g.carriedWidth() > 0 ? g.carriedWidth() : bay.beamSpan();
        if (calc != null && Math.abs(carried - bay.beamSpan()) > 1e-6) {
            calc.note("the girder carries beams of other spans or on one side only: Lj in w_g is the width of floor it"
                    + " carries, half the beams' span on each side", Dg11.section("§4.1"));
        }
        double wg = VibrationLoads.girderWeight(wj, bay.spacing(), carried, gs.weight(), calc);
        Ribs beamRibs = ribsAlongBeams ? Ribs.PARALLEL : Ribs.PERPENDICULAR;
        Ribs girderRibs = ribsAlongBeams ? Ribs.PERPENDICULAR : Ribs.PARALLEL;
        if (calc != null) {
            calc.heading("Beam " + bay.beam() + ": transformed section, ribs " + (ribsAlongBeams ? "along" : "across") + " it");
        }
        double ij = Stiffness.transformedInertia(bs, vs, beamRibs, bay.beamSpan(), bay.spacing(), es, calc);
        if (calc != null) {
            calc.heading("Girder " + g.id() + ": transformed section, ribs " + (ribsAlongBeams ? "across" : "along") + " it");
        }
        double ig = Stiffness.transformedInertia(gs, vs, girderRibs, g.span(), carried, es, calc);
        boolean beamCont = bay.beamAdjacentSpan() > 0 && EffectiveWeights.continuous(bay.beamSpan(), bay.beamAdjacentSpan());
        boolean girderCont = g.adjacentSpan() > 0 && EffectiveWeights.continuous(g.span(), g.adjacentSpan());
        BayVibration v = BayVibration.interior(new VibrationMember(bay.beamSpan(), bay.spacing(), ij, wj, beamCont),
                new VibrationMember(g.span(), carried, ig, wg, girderCont), es, ds, occ, fit)
                .withBeta(beta)
                .withFloor(bay.floorWidth(), bay.floorLength())
                .withCoefficients(bay.edge() ? Dg11.CJ_PARALLEL_TO_INTERIOR_EDGE : Dg11.CJ_INTERIOR, Dg11.CG_WEB_CONNECTED);
        VibrationResult res = Walking.check(v, calc);
        return new Evaluation(new Inputs(ec, slabWeight, live, wa, ij, ig, v, !bay.edge(), ribsAlongBeams), res);
    }
}
