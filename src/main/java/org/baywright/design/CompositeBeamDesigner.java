package org.baywright.design;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.baywright.analysis.DistributedLoad;
import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.Aisc360;
import org.baywright.design.aisc360.CompositeFlexureI3;
import org.baywright.design.aisc360.CompositeSlab;
import org.baywright.design.aisc360.CompositeStiffness;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.design.aisc360.EffectiveWidthI3;
import org.baywright.design.aisc360.IShapeShear;
import org.baywright.design.aisc360.StudStrengthI8;
import org.baywright.load.Combinations;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;

/**
 * Designs one simple-span composite beam under uniform loads (AISC 360-16 Chapter I with the bare-steel
 * construction stage of Chapters F and G): checks a section with a number of studs, and searches a
 * catalog for the pair (section, studs) of least cost-equivalent weight, steel weight plus studs × an
 * equivalent weight per stud.
 *
 * <p>The checks of a section with n studs per half span:
 * <ul>
 * <li><b>composite flexure</b>: M_u (or M_a) of the strength combinations on D = slab + superimposed
 * dead + own weight and L, against φ_b·M_n (M_n/Ω_b) of the plastic stress distribution with
 * ΣQ_n = n·Q_n (I3.2a, I3.2d(1), I8.2a); in an unshored beam too, the composite section carries the
 * total moment (I3.2a);</li>
 * <li><b>construction flexure</b> and <b>construction shear</b> (unshored): the bare steel under the wet
 * slab and its own weight as D and the construction live load as L, by {@link BeamDesigner} (F2/F3 with
 * the deck bracing the top flange when its ribs are perpendicular, the criteria's bracing otherwise;
 * G2.1);</li>
 * <li><b>shear</b>: the steel section alone (I4.2 → G2.1) under the composite-stage combinations;</li>
 * <li><b>live-load deflection</b> on I_LB (Commentary C-I3-1) under L; <b>total-load deflection</b>: the
 * pre-composite deflection less the camber, plus superimposed dead and live load on I_LB (shored:
 * everything on I_LB).</li>
 * </ul>
 * The studs per half span range from the least the rules require (the minimum degree of composite
 * action, and the maximum spacing of I8.2d) to the most that fit (one rib per pitch with the ribs
 * perpendicular, the minimum spacing of I8.2d otherwise) or the number that gives full composite
 * action, whichever is less. Flexural strength and I_LB rise with ΣQ_n, so the least stud count that
 * passes is found by bisection.
 *
 * <p>Ribs per half span (deck perpendicular): the ribs crossing the beam are ⌊L/pitch⌋; each half span
 * counts ⌈⌊L/pitch⌋/2⌉ of them, the rib at midspan (odd count) serving both halves, since it sits at the
 * point of maximum moment. The studs on the beam are reported as 2 × the studs per half span.
 *
 * <p>Known limitations: uniform loads on a simple span (a girder's point loads and the stud
 * requirement between a point load and the zero-moment point of I8.2c are not covered); positive
 * moment only; short-term stiffness (no creep or shrinkage); no vibration check; ponding of the wet
 * concrete is not added (the user can add it to the slab weight).
 */
public final class CompositeBeamDesigner {
    private static final String CLAUSE_I3_2A = Aisc360.clause("I3.2a");
    private static final String CLAUSE_I4_2 = Aisc360.clause("I4.2 (G2.1)");
    private static final String CLAUSE_I8_2C = Aisc360.clause("I8.2c");
    private static final String CLAUSE_I8_2D = Aisc360.clause("I8.2d");
    private static final String PRACTICE = "common practice";
    private static final String STATICS = "simple span, uniform load (AISC Manual Table 3-23 Case 1)";

    private final CompositeBeam beam;
    private final CompositeCriteria criteria;
    private final double span;
    private final double bLeft;
    private final double bRight;
    private final double beff;
    private final double slabWeight;
    private final double wSlab;
    private final double wSdl;
    private final double wLive;
    private final double wConstructionLive;
    private final double ec;
    private final double qn;
    private final double sMin;
    private final double sMax;
    private final int maxPerHalf;
    private final int spacingMinPerHalf;
    private final CompositeSlab concrete;
    private final List<LoadCombination> combos;
    private final BeamDesigner construction;

    public CompositeBeamDesigner(CompositeBeam beam, CompositeCriteria criteria) {
        this.beam = beam;
        this.criteria = criteria;
        this.span = beam.span();
        this.bLeft = EffectiveWidthI3.side(span, beam.toNeighbourLeft(), beam.toEdgeLeft(), "left", null);
        this.bRight = EffectiveWidthI3.side(span, beam.toNeighbourRight(), beam.toEdgeRight(), "right", null);
        this.beff = bLeft + bRight;
        SlabOnDeck slab = beam.slab();
        this.slabWeight = Double.isNaN(beam.slabWeightOverride()) ? slab.weight(null) : beam.slabWeightOverride();
        double tw = beam.tributaryWidth();
        this.wSlab = slabWeight * tw;
        this.wSdl = beam.superimposedDead() * tw;
        this.wLive = beam.live() * tw;
        this.wConstructionLive = beam.constructionLive() * tw;
        Studs st = beam.studs();
        this.ec = StudStrengthI8.ec(slab.density(), slab.fc(), null);
        double asa = StudStrengthI8.asa(st.diameter(), null);
        StudStrengthI8.Factors f = StudStrengthI8.factors(beam.ribs(), st.perRib(), st.position(), slab.wrOverHr(), null);
        this.qn = StudStrengthI8.qn(asa, slab.fc(), ec, f, st.fu(), null);
        this.sMin = StudStrengthI8.minSpacing(st.diameter(), null);
        this.sMax = StudStrengthI8.maxSpacing(slab.thickness(), null);
        double half = span / 2;
        if (beam.ribs() == DeckRibs.PERPENDICULAR) {
            int ribs = (int) Math.floor(span / slab.pitch() + 1e-9);
            this.maxPerHalf = ((ribs + 1) / 2) * st.perRib();
        } else {
            this.maxPerHalf = ((int) Math.floor(half / sMin + 1e-9)) * st.perRib();
        }
        this.spacingMinPerHalf = (int) Math.ceil(half / sMax - 1e-9);
        this.concrete = CompositeSlab.of(beff, slab.topping(), slab.hr(), slab.wr(), slab.pitch(), beam.ribs(), slab.fc());
        this.combos = Combinations.gravity(criteria.method(), Set.of(LoadCase.D, LoadCase.L));
        Bracing bracing = beam.ribs() == DeckRibs.PERPENDICULAR ? Bracing.continuous() : criteria.constructionBracing();
        BeamLoads cl = BeamLoads.of(span, Map.of(LoadCase.D, List.of(DistributedLoad.full(span, wSlab)),
                LoadCase.L, List.of(DistributedLoad.full(span, wConstructionLive))));
        this.construction = new BeamDesigner(cl, new BeamCriteria(criteria.method(), criteria.steel(), bracing,
                new DeflectionLimits(0, 0), criteria.selfWeight()));
    }

    public CompositeBeam beam() {
        return beam;
    }

    public CompositeCriteria criteria() {
        return criteria;
    }

    /** Effective width b (I3.1a) [m]. */
    public double effectiveWidth() {
        return beff;
    }

    /** Strength of one stud Q_n (I8-1) [N]. */
    public double qn() {
        return qn;
    }

    /** E_c of the slab's concrete (I2.1b) [Pa]. */
    public double ec() {
        return ec;
    }

    /** The most studs per half span the ribs (or the minimum spacing) allow. */
    public int maxStudsPerHalf() {
        return maxPerHalf;
    }

    // ---- per section -------------------------------------------------------------------------

    /** Shear strengths of the steel sections (G2.1), computed once per section and steel. */
    private static final Map<Steel, Map<Section, IShapeShear.Strength>> SHEAR = new ConcurrentHashMap<>();

    private static IShapeShear.Strength shearStrength(Section s, Steel steel, Calc calc) {
        if (calc != null) {
            return IShapeShear.strength(s, steel.fy(), steel.e(), calc);
        }
        Map<Section, IShapeShear.Strength> m = SHEAR.computeIfAbsent(steel, k -> new ConcurrentHashMap<>());
        IShapeShear.Strength v = m.get(s);
        if (v == null) {
            v = IShapeShear.strength(s, steel.fy(), steel.e(), null);
            m.put(s, v);
        }
        return v;
    }

    /**
     * What does not depend on the stud count: the pre-composite deflection and camber, the stud range,
     * and (by {@link #stages}, which the search runs only for a section that passes at its most studs)
     * the construction stage and the shear check.
     */
    private final class SectionState {
        final Section s;
        final double w;
        final double pre;
        final double camber;
        final double full;
        final int minPerHalf;
        final int hiPerHalf;
        final boolean limitedByRibs;
        List<Check> constructionChecks = List.of();
        double constructionRatio;
        Check shear;

        SectionState(Section s, Calc calc) {
            this.s = s;
            this.w = criteria.selfWeight() ? s.weight() : 0;
            if (criteria.shored()) {
                pre = 0;
                camber = 0;
            } else {
                if (calc != null) {
                    calc.heading("Deflection of the bare steel under the wet slab and camber");
                }
                pre = deflection("Δ_pre", wSlab + w, s.props().ix(), "wet slab and steel on the bare steel", calc);
                camber = criteria.camber().camber(pre, span, calc);
            }
            // the stud range
            this.full = Math.min(0.85 * concrete.fc() * concrete.ac(), s.props().a() * criteria.steel().fy());
            int forDegree = (int) Math.ceil(criteria.minDegree() * full / qn - 1e-9);
            this.minPerHalf = Math.max(Math.max(forDegree, spacingMinPerHalf), 1);
            int forFull = (int) Math.ceil(full / qn - 1e-9);
            this.hiPerHalf = Math.min(forFull, maxPerHalf);
            this.limitedByRibs = forFull > maxPerHalf;
        }

        /** The construction stage (bare steel, F2/F3 and G2.1 by {@link BeamDesigner}) and the composite-stage shear. */
        void stages(Calc calc) {
            if (criteria.shored()) {
                Calc.branch(calc, "shored: the composite section carries every load; no construction stage, no camber", PRACTICE);
            } else {
                if (calc != null) {
                    calc.heading("Construction stage: bare steel under the wet slab (D) and the construction live load (L)");
                }
                List<Check> cc = construction.check(s, calc);
                List<Check> renamed = new ArrayList<>(cc.size());
                double r = 0;
                for (Check c : cc) {
                    renamed.add(new Check("construction " + c.name(), c.demand(), c.capacity(), c.ratio(), c.loadCombination(),
                            c.clause(), c.quantity(), c.position(), c.segment(), c.lb(), c.cb(), c.note()));
                    r = Math.max(r, c.ratio());
                }
                constructionChecks = renamed;
                constructionRatio = r;
            }
            // shear on the steel section alone (I4.2 → G2.1)
            if (calc != null) {
                calc.heading("Shear: the steel section alone");
            }
            IShapeShear.Strength vs = shearStrength(s, criteria.steel(), calc);
            double[] byCase = byCase((wSlab + wSdl + w) * span / 2, wLive * span / 2);
            Combinations.Governing g = Combinations.governing(byCase, combos);
            double avail = criteria.method().available(vs.vn(), vs.phi(), vs.omega());
            if (calc != null) {
                calc.eq("Vu", "w·L/2", STATICS, g.value(), Quantity.FORCE,
                        Arg.of("w", g.value() * 2 / span, Quantity.LINE_LOAD), Arg.of("L", span, Quantity.SPAN_LENGTH));
                calc.note("governing combination " + g.combination().name(), g.combination().reference());
                calc.eq("ratio", "V_req/V_avail", CLAUSE_I4_2, g.value() / avail, Quantity.NUMBER,
                        Arg.of("V_req", g.value(), Quantity.FORCE), Arg.of("V_avail", avail, Quantity.FORCE));
            }
            this.shear = new Check("shear", g.value(), avail, g.value() / avail, g.combination(), CLAUSE_I4_2, Quantity.FORCE,
                    0, null, Double.NaN, Double.NaN, "steel section alone");
        }
    }

    /** Values by load case (D, L) in the order of {@link LoadCase}. */
    private static double[] byCase(double d, double l) {
        double[] v = new double[LoadCase.values().length];
        v[LoadCase.D.ordinal()] = d;
        v[LoadCase.L.ordinal()] = l;
        return v;
    }

    private double deflection(String symbol, double w, double i, String what, Calc calc) {
        double e = criteria.steel().e();
        double v = 5 * w * Math.pow(span, 4) / (384 * e * i);
        if (calc == null) {
            return v;
        }
        calc.note(symbol + ": " + what, STATICS);
        return calc.eq(symbol, "5·w·L⁴/(384·E·I)", STATICS, v, Quantity.SECTION_LENGTH, Arg.of("w", w, Quantity.LINE_LOAD),
                Arg.of("L", span, Quantity.SPAN_LENGTH), Arg.of("E", e, Quantity.STRESS), Arg.of("I", i, Quantity.INERTIA));
    }

    /** The stud-dependent checks of one section: composite flexure and the two deflections. */
    private record Trial(CompositeFlexureI3.Result flexure, double ilb, Check moment, Check live, Check total, double ratio) {
    }

    private Trial trial(SectionState st, int perHalf, Calc calc) {
        Section s = st.s;
        double fy = criteria.steel().fy();
        double sumQn = perHalf * qn;
        if (calc != null) {
            calc.eq("ΣQn", "n_h·Qn", CLAUSE_I8_2C, sumQn, Quantity.FORCE, Arg.num("n_h", perHalf), Arg.of("Qn", qn, Quantity.FORCE));
        }
        CompositeFlexureI3.Result r = CompositeFlexureI3.strength(s, fy, criteria.steel().e(), concrete, sumQn, calc);
        double[] byCase = byCase((wSlab + wSdl + st.w) * span * span / 8, wLive * span * span / 8);
        Combinations.Governing g = Combinations.governing(byCase, combos);
        double avail = criteria.method().available(r.mn(), CompositeFlexureI3.PHI_B, CompositeFlexureI3.OMEGA_B);
        double ratio = g.value() / avail;
        if (calc != null) {
            calc.eq("Mu", "w·L²/8", STATICS, g.value(), Quantity.MOMENT, Arg.of("w", g.value() * 8 / (span * span),
                    Quantity.LINE_LOAD), Arg.of("L", span, Quantity.SPAN_LENGTH));
            calc.note("governing combination " + g.combination().name(), g.combination().reference());
            calc.eq("ratio", "M_req/M_avail", CLAUSE_I3_2A, ratio, Quantity.NUMBER, Arg.of("M_req", g.value(), Quantity.MOMENT),
                    Arg.of("M_avail", avail, Quantity.MOMENT));
        }
        String note = r.pna() == CompositeFlexureI3.Pna.SLAB ? "PNA in the slab"
                : r.pna() == CompositeFlexureI3.Pna.TOP_FLANGE ? "PNA in the top flange" : "PNA in the web";
        Check moment = new Check("composite flexure", g.value(), avail, ratio, g.combination(), CLAUSE_I3_2A, Quantity.MOMENT,
                span / 2, null, 0, Double.NaN, note);
        if (calc != null) {
            calc.heading("Stiffness and deflections");
        }
        double ilb = CompositeStiffness.ilb(s, fy, r, calc);
        DeflectionLimits lim = criteria.deflection();
        Check live = null;
        Check total = null;
        double worst = ratio;
        if (lim.live() > 0) {
            double d = deflection("Δ_LL", wLive, ilb, "live load on I_LB", calc);
            double allow = span / lim.live();
            live = new Check("live-load deflection", d, allow, d / allow, null, DeflectionLimits.SOURCE,
                    Quantity.SECTION_LENGTH, span / 2, null, Double.NaN, Double.NaN, "I_LB, limit L/" + (long) lim.live());
            worst = Math.max(worst, live.ratio());
        }
        if (lim.total() > 0) {
            double d;
            String note2;
            if (criteria.shored()) {
                d = deflection("Δ_TL", wSlab + wSdl + st.w + wLive, ilb, "every load on I_LB (shored)", calc);
                note2 = "shored: all loads on I_LB";
            } else {
                double post = deflection("Δ_post", wSdl + wLive, ilb, "superimposed dead and live load on I_LB", calc);
                d = Calc.eq(calc, "Δ_TL", "Δ_pre − camber + Δ_post", PRACTICE, st.pre - st.camber + post,
                        Quantity.SECTION_LENGTH, Arg.of("Δ_pre", st.pre, Quantity.SECTION_LENGTH),
                        Arg.of("camber", st.camber, Quantity.SECTION_LENGTH), Arg.of("Δ_post", post, Quantity.SECTION_LENGTH));
                note2 = "pre-composite less camber, plus SDL and L on I_LB";
            }
            double allow = span / lim.total();
            total = new Check("total-load deflection", d, allow, d / allow, null, DeflectionLimits.SOURCE,
                    Quantity.SECTION_LENGTH, span / 2, null, Double.NaN, Double.NaN, note2 + ", limit L/" + (long) lim.total());
            worst = Math.max(worst, total.ratio());
        }
        return new Trial(r, ilb, moment, live, total, worst);
    }

    // ---- public API --------------------------------------------------------------------------

    /**
     * Checks {@code s} with {@code studsPerHalf} studs between each support and midspan, recording the
     * calculation sheet when {@code calc} is given. The status is {@link MemberStatus#FIXED_SIZE} when
     * every check passes and the stud count keeps to the rules (minimum degree, spacing, ribs available),
     * {@link MemberStatus#OVERSTRESSED} otherwise.
     */
    public CompositeDesign check(Section s, int studsPerHalf, Calc calc) {
        if (studsPerHalf < 0) {
            throw new IllegalArgumentException("studs per half span must be ≥ 0, got " + studsPerHalf);
        }
        if (calc != null) {
            recordSlab(calc);
        }
        SectionState st = new SectionState(s, calc);
        st.stages(calc);
        if (calc != null) {
            calc.heading("Composite flexure: " + s.designation() + " with " + studsPerHalf + " studs per half span");
        }
        Trial t = trial(st, studsPerHalf, calc);
        double itr = CompositeStiffness.transformed(s, concrete, criteria.steel().e(), ec, calc);
        List<Check> checks = checks(st, t);
        boolean ok = Check.governing(checks).passes();
        boolean layout = studsPerHalf >= st.minPerHalf && studsPerHalf <= maxPerHalf;
        if (calc != null) {
            Calc.branch(calc, studsPerHalf + " studs per half span; the rules allow " + st.minPerHalf + " to " + maxPerHalf
                    + (layout ? "" : " → the layout does not keep to them"), CLAUSE_I8_2D);
        }
        return result(ok && layout ? MemberStatus.FIXED_SIZE : MemberStatus.OVERSTRESSED, st, studsPerHalf, t, itr,
                List.of(), List.of(), 1);
    }

    /**
     * Searches {@code catalog} (in its search order, lightest first) for the section and stud count of
     * least cost-equivalent weight that pass every check. For each section, the least stud count that
     * passes; the search stops once a section's steel alone outweighs the best pair found.
     */
    public CompositeDesign search(Catalog catalog, SearchFilter filter) {
        List<Rejection> rejected = new ArrayList<>();
        List<CompositeDesign.Alternative> passing = new ArrayList<>();
        long evaluations = 0;
        SectionState best = null;
        int bestN = -1;
        double bestCost = Double.POSITIVE_INFINITY;
        SectionState closest = null;
        int closestN = 0;
        double closestRatio = Double.POSITIVE_INFINITY;
        for (Section s : catalog.sections()) {
            if (!filter.allows(s)) {
                continue;
            }
            double steel = s.weight() * span;
            if (steel >= bestCost) {
                break;
            }
            SectionState st = new SectionState(s, null);
            if (st.minPerHalf > maxPerHalf) {
                rejected.add(new Rejection(s, studLimit(st)));
                continue;
            }
            int hi = Math.max(st.hiPerHalf, st.minPerHalf);
            evaluations++;
            Trial top = trial(st, hi, null);
            if (!Check.passes(top.ratio)) {
                Check g = governingOf(top);
                String why = st.limitedByRibs ? "with " + hi + " studs per half span, the most that fit"
                        : "at full composite action";
                rejected.add(new Rejection(s, new Check(g.name(), g.demand(), g.capacity(), g.ratio(), g.loadCombination(),
                        g.clause(), g.quantity(), g.position(), g.segment(), g.lb(), g.cb(),
                        g.note().isEmpty() ? why : g.note() + "; " + why)));
                if (top.ratio < closestRatio) {
                    closestRatio = top.ratio;
                    closest = st;
                    closestN = hi;
                }
                continue;
            }
            // the stud count does not change these: checked only for a section the composite checks let through
            st.stages(null);
            Check fail = st.constructionRatio > 1 + Check.RATIO_TOLERANCE ? Check.governing(st.constructionChecks)
                    : !st.shear.passes() ? st.shear : null;
            if (fail != null) {
                rejected.add(new Rejection(s, fail));
                if (fail.ratio() < closestRatio) {
                    closestRatio = fail.ratio();
                    closest = st;
                    closestN = hi;
                }
                continue;
            }
            // the least stud count that passes: flexural strength and I_LB rise with ΣQn
            int lo = st.minPerHalf;
            int upper = hi;
            while (lo < upper) {
                int mid = (lo + upper) >>> 1;
                evaluations++;
                if (Check.passes(trial(st, mid, null).ratio)) {
                    upper = mid;
                } else {
                    lo = mid + 1;
                }
            }
            double cost = steel + 2 * lo * criteria.studWeight();
            passing.add(new CompositeDesign.Alternative(s, 2 * lo, cost));
            if (cost < bestCost) {
                bestCost = cost;
                best = st;
                bestN = lo;
            }
        }
        passing.sort(Comparator.comparingDouble(CompositeDesign.Alternative::costWeight));
        if (best == null) {
            if (closest == null) {
                return new CompositeDesign(MemberStatus.OVERSTRESSED, null, 0, 0, qn, 0, beff, bLeft, bRight, slabWeight, null,
                        Double.NaN, Double.NaN, Double.NaN, 0, Double.NaN, List.of(), rejected, passing, Double.NaN, evaluations);
            }
            closest.stages(null);
            Trial t = trial(closest, closestN, null);
            return result(MemberStatus.OVERSTRESSED, closest, closestN, t,
                    CompositeStiffness.transformed(closest.s, concrete, criteria.steel().e(), ec, null), rejected, passing,
                    evaluations);
        }
        // only the sections lighter than the chosen one count as rejected on the way
        double chosenWeight = best.s.weight();
        rejected.removeIf(r -> r.section().weight() > chosenWeight);
        Trial t = trial(best, bestN, null);
        return result(MemberStatus.SIZED, best, bestN, t,
                CompositeStiffness.transformed(best.s, concrete, criteria.steel().e(), ec, null), rejected, passing, evaluations);
    }

    private Check studLimit(SectionState st) {
        return new Check("studs", st.minPerHalf, maxPerHalf, (double) st.minPerHalf / maxPerHalf, null, CLAUSE_I8_2D,
                Quantity.NUMBER, Double.NaN, null, Double.NaN, Double.NaN,
                "the minimum degree of composite action and the stud spacing need more studs per half span than the ribs allow");
    }

    private static Check governingOf(Trial t) {
        List<Check> l = new ArrayList<>(3);
        l.add(t.moment);
        if (t.live != null) {
            l.add(t.live);
        }
        if (t.total != null) {
            l.add(t.total);
        }
        return Check.governing(l);
    }

    private List<Check> checks(SectionState st, Trial t) {
        List<Check> out = new ArrayList<>(6);
        out.add(t.moment);
        out.addAll(st.constructionChecks);
        out.add(st.shear);
        if (t.live != null) {
            out.add(t.live);
        }
        if (t.total != null) {
            out.add(t.total);
        }
        return out;
    }

    private CompositeDesign result(MemberStatus status, SectionState st, int perHalf, Trial t, double itr,
            List<Rejection> rejected, List<CompositeDesign.Alternative> passing, long evaluations) {
        return new CompositeDesign(status, st.s, perHalf, 2 * perHalf, qn, perHalf * qn, beff, bLeft, bRight, slabWeight,
                t.flexure, t.ilb, itr, st.pre, st.camber, st.constructionRatio, checks(st, t), rejected, passing,
                st.s.weight() * span + 2 * perHalf * criteria.studWeight(), evaluations);
    }

    /** The slab, the effective width and the stud strength, recorded once at the head of a sheet. */
    private void recordSlab(Calc calc) {
        SlabOnDeck slab = beam.slab();
        calc.heading("Slab, effective width and studs (" + switch (beam.ribs()) {
            case NONE -> "solid slab";
            case PERPENDICULAR -> "deck ribs perpendicular to the beam: concrete above the deck only, I3.2c(2)";
            case PARALLEL -> "deck ribs parallel to the beam: the ribs' concrete counts, I3.2c(3)";
        } + ")");
        if (Double.isNaN(beam.slabWeightOverride())) {
            slab.weight(calc);
        } else {
            calc.value("w_slab", slabWeight, Quantity.AREA_LOAD, "given by the user", "");
        }
        double l = EffectiveWidthI3.side(span, beam.toNeighbourLeft(), beam.toEdgeLeft(), "left", calc);
        double r = EffectiveWidthI3.side(span, beam.toNeighbourRight(), beam.toEdgeRight(), "right", calc);
        EffectiveWidthI3.total(l, r, calc);
        Studs st = beam.studs();
        StudStrengthI8.ec(slab.density(), slab.fc(), calc);
        double asa = StudStrengthI8.asa(st.diameter(), calc);
        StudStrengthI8.Factors f = StudStrengthI8.factors(beam.ribs(), st.perRib(), st.position(), slab.wrOverHr(), calc);
        StudStrengthI8.qn(asa, slab.fc(), ec, f, st.fu(), calc);
        StudStrengthI8.minSpacing(st.diameter(), calc);
        StudStrengthI8.maxSpacing(slab.thickness(), calc);
        for (String p : StudStrengthI8.deckLimits(beam.ribs(), slab.hr(), slab.wr(), st.diameter(), slab.topping(), Double.NaN)) {
            calc.note("outside the limits: " + p, "");
        }
        calc.value("w_D", wSlab + wSdl, Quantity.LINE_LOAD, "slab and superimposed dead load (own weight added per section)", "",
                Arg.of("w_L", wLive, Quantity.LINE_LOAD), Arg.of("w_CL", wConstructionLive, Quantity.LINE_LOAD));
    }

    /** The detailing limits of I3.2c(1) the slab and studs break (empty when none). */
    public List<String> deckProblems() {
        SlabOnDeck slab = beam.slab();
        return StudStrengthI8.deckLimits(beam.ribs(), slab.hr(), slab.wr(), beam.studs().diameter(), slab.topping(), Double.NaN);
    }
}
