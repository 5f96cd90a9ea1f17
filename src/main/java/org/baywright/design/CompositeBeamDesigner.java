package org.baywright.design;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.Extreme;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SimpleSpan;
import org.baywright.analysis.SpanLoad;
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
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;

/**
 * Designs one simple-span composite member, a beam or a girder, under any simple-span gravity loads
 * (AISC 360-16 Chapter I with the bare-steel construction stage of Chapters F and G): checks a section
 * with a number of studs, and searches a catalog for the pair (section, studs) of least cost-equivalent
 * weight, steel weight plus studs × an equivalent weight per stud.
 *
 * <p>The input is a {@link CompositeMember}: the wet loads (before the concrete hardens), the
 * construction live load, and the composite-stage loads by case ({@link BeamLoads}); a
 * {@link CompositeBeam} (uniform loads from area loads and a tributary width) is converted by
 * {@link CompositeBeam#member()}. When every load is a full-span uniform one on D and L (no separate
 * deflection loads) the statics are the closed forms of a uniform load and the sheet prints them
 * (w·L²/8, w·L/2, 5·w·L⁴/(384·E·I)); otherwise they are those of the simple span under the loads as
 * listed ({@link SimpleSpan}: the largest moment of each combination and where it acts, the larger
 * reaction, the largest deflection of each load group), stated as such on the sheet.
 *
 * <p>The checks of a section with n studs per half span:
 * <ul>
 * <li><b>composite flexure</b>: M_u (or M_a) of the strength combinations of the cases present, D = the
 * wet loads + superimposed dead + own weight, against φ_b·M_n (M_n/Ω_b) of the plastic stress
 * distribution with ΣQ_n the studs between the nearer support and the point of maximum moment
 * (I3.2a, I3.2d(1), I8.2a); in an unshored member too, the composite section carries the total moment
 * (I3.2a);</li>
 * <li><b>studs at point loads</b> (when there are point loads; I8.2c): the studs between each point
 * load and the nearer support must develop the moment there: required, the least k with
 * φM_n(k·Q_n) ≥ M_u(x_p); available, ⌊n·d_p/(L/2)⌋ with the studs spaced uniformly over each half
 * span (common practice) and d_p the distance to the nearer support; ratio required/available, the
 * point of the highest ratio reported;</li>
 * <li><b>construction flexure</b> and <b>construction shear</b> (unshored): the bare steel under the wet
 * loads and its own weight as D and the construction live load as L, by {@link BeamDesigner} (F2/F3
 * with the deck bracing the top flange when its ribs are perpendicular, the member's or the criteria's
 * bracing otherwise; G2.1);</li>
 * <li><b>shear</b>: the steel section alone (I4.2 → G2.1) under the composite-stage combinations, at the
 * supports;</li>
 * <li><b>live-load deflection</b> on I_LB (Commentary C-I3-1) under the live cases (L, Lr, S; the
 * deflection loads when given); <b>total-load deflection</b>: the pre-composite deflection (wet loads and
 * own weight on the bare steel's I_x) less the camber, plus the composite-stage loads on I_LB, each
 * group's maximum along the span (their sum bounds the maximum of the total); shored: everything on
 * I_LB.</li>
 * </ul>
 * The studs per half span range from the least the rules require (the minimum degree of composite
 * action, and the maximum spacing of I8.2d) to the most that fit (one rib per pitch with the ribs
 * perpendicular, the minimum spacing of I8.2d otherwise) or the number that gives full composite
 * action at the point of maximum moment and at every point load, whichever is less. Flexural strength,
 * the studs reaching each point and I_LB rise with n, so the least stud count that passes is found by
 * bisection.
 *
 * <p>Ribs per half span (deck perpendicular): the ribs crossing the beam are ⌊L/pitch⌋; each half span
 * counts ⌈⌊L/pitch⌋/2⌉ of them, the rib at midspan (odd count) serving both halves, since it sits at the
 * point of maximum moment of a symmetric load. The studs on the member are reported as 2 × the studs
 * per half span.
 *
 * <p>Speed: what does not depend on the section (stud strength, combinations, the statics of each
 * combination and load group, the construction-stage designer) is built once per designer; what does
 * not depend on the stud count (moment demands with the own weight, the pre-composite deflection and
 * camber, the studs each point load needs) once per section; the search builds no check records or
 * words except for its result and its rejections.
 *
 * <p>Known limitations: simple spans with downward loads only; positive moment only; the studs are
 * spaced uniformly over each half span (no denser groups near point loads); the total-load deflection
 * adds the maxima of its groups; short-term stiffness (no creep or shrinkage); no vibration check;
 * ponding of the wet concrete is not added (the user can add it to the wet loads).
 */
public final class CompositeBeamDesigner {
    private static final String CLAUSE_I3_2A = Aisc360.clause("I3.2a");
    private static final String CLAUSE_I4_2 = Aisc360.clause("I4.2 (G2.1)");
    private static final String CLAUSE_I8_2C = Aisc360.clause("I8.2c");
    private static final String CLAUSE_I8_2D = Aisc360.clause("I8.2d");
    private static final String PRACTICE = "common practice";
    private static final String STATICS = "simple span, uniform load (AISC Manual Table 3-23 Case 1)";

    private static final String STATICS_GENERAL = "simple span, loads as listed (statics)";
    private static final String STUD_RULE = "studs spaced uniformly over each half span, common practice";

    private final CompositeMember member;
    /** The uniform-load beam this designer was made from, or null. */
    private final CompositeBeam beam;
    private final CompositeCriteria criteria;
    private final double span;
    private final double bLeft;
    private final double bRight;
    private final double beff;
    private final double slabWeight;
    private final double ec;
    private final double qn;
    private final double sMin;
    private final double sMax;
    private final int maxPerHalf;
    private final int spacingMinPerHalf;
    private final CompositeSlab concrete;
    private final List<LoadCombination> combos;
    private final BeamDesigner construction;
    /**
     * True when every load is a full-span uniform one, on D and L only, with no separate deflection
     * loads: the closed forms of a uniform load (w·L²/8, 5·w·L⁴/(384·E·I)) then give the statics.
     */
    private final boolean uniform;
    // the uniform case: line loads [N/m] (NaN otherwise)
    private final double wSlab;
    private final double wSdl;
    private final double wLive;
    private final double wConstructionLive;
    // the general case (null otherwise): statics of the simple span
    private final SimpleSpan[] comboSpans;
    private final double[] comboDead;
    private final SimpleSpan wetSpan;
    /** E·I × the largest deflection of the wet loads alone (general case, unshored; NaN otherwise). */
    private final double wetEi;
    private final SimpleSpan allSpan;
    private final Extreme liveEi;
    private final Extreme postEi;
    /** Positions of the point loads inside the span (any strength case, wet included), ascending, distinct. */
    private final double[] points;
    private final String liveNote;
    private final String totalNote;

    /** What R_g and R_p depend on (I8.2a); their words are built once per kind of deck and stud. */
    private record FactorKey(DeckRibs ribs, int perRib, org.baywright.design.aisc360.StudPosition position, double wrOverHr) {
    }

    private static final Map<FactorKey, StudStrengthI8.Factors> FACTORS = new ConcurrentHashMap<>();

    /** A designer for a uniform-load beam, through {@link CompositeBeam#member()}. */
    public CompositeBeamDesigner(CompositeBeam beam, CompositeCriteria criteria) {
        this(beam.member(), criteria, beam);
    }

    /** A designer for a composite member under any simple-span loads. */
    public CompositeBeamDesigner(CompositeMember member, CompositeCriteria criteria) {
        this(member, criteria, null);
    }

    private CompositeBeamDesigner(CompositeMember m, CompositeCriteria criteria, CompositeBeam beam) {
        this.member = m;
        this.beam = beam;
        this.criteria = criteria;
        this.span = m.span();
        this.bLeft = EffectiveWidthI3.side(span, m.toNeighbourLeft(), m.toEdgeLeft(), "left", null);
        this.bRight = EffectiveWidthI3.side(span, m.toNeighbourRight(), m.toEdgeRight(), "right", null);
        this.beff = bLeft + bRight;
        SlabOnDeck slab = m.slab();
        this.slabWeight = m.slabWeight();
        Studs st = m.studs();
        this.ec = StudStrengthI8.ec(slab.density(), slab.fc(), null);
        double asa = StudStrengthI8.asa(st.diameter(), null);
        StudStrengthI8.Factors f = FACTORS.computeIfAbsent(new FactorKey(m.ribs(), st.perRib(), st.position(), slab.wrOverHr()),
                k -> StudStrengthI8.factors(k.ribs(), k.perRib(), k.position(), k.wrOverHr(), null));
        this.qn = StudStrengthI8.qn(asa, slab.fc(), ec, f, st.fu(), null);
        this.sMin = StudStrengthI8.minSpacing(st.diameter(), null);
        this.sMax = StudStrengthI8.maxSpacing(slab.thickness(), null);
        double half = span / 2;
        if (m.ribs() == DeckRibs.PERPENDICULAR) {
            int ribs = (int) Math.floor(span / slab.pitch() + 1e-9);
            this.maxPerHalf = ((ribs + 1) / 2) * st.perRib();
        } else {
            this.maxPerHalf = ((int) Math.floor(half / sMin + 1e-9)) * st.perRib();
        }
        this.spacingMinPerHalf = (int) Math.ceil(half / sMax - 1e-9);
        this.concrete = CompositeSlab.of(beff, slab.topping(), slab.hr(), slab.wr(), slab.pitch(), m.ribs(), slab.fc());
        BeamLoads comp = m.composite();
        this.uniform = isUniform(m);
        DeflectionLimits lim = criteria.deflection();
        String unreduced = comp.separateDeflectionLoads() ? ", live load unreduced" : "";
        this.liveNote = "I_LB, limit L/" + (long) lim.live() + unreduced;
        this.totalNote = "limit L/" + (long) lim.total() + unreduced;
        if (uniform) {
            this.wSlab = uniformSum(m.wet());
            this.wSdl = uniformSum(comp.of(LoadCase.D).loads());
            this.wLive = uniformSum(comp.of(LoadCase.L).loads());
            this.wConstructionLive = uniformSum(m.construction());
            this.combos = Combinations.gravity(criteria.method(), Set.of(LoadCase.D, LoadCase.L));
            this.comboSpans = null;
            this.comboDead = null;
            this.wetSpan = null;
            this.wetEi = Double.NaN;
            this.allSpan = null;
            this.liveEi = null;
            this.postEi = null;
            this.points = new double[0];
        } else {
            this.wSlab = Double.NaN;
            this.wSdl = Double.NaN;
            this.wLive = Double.NaN;
            this.wConstructionLive = Double.NaN;
            EnumSet<LoadCase> present = EnumSet.of(LoadCase.D);
            present.addAll(comp.present());
            this.combos = Combinations.gravity(criteria.method(), present);
            LoadCase[] cases = LoadCase.values();
            this.wetSpan = SimpleSpan.of(span, m.wet());
            this.wetEi = criteria.shored() ? Double.NaN : wetSpan.maxDeflection(1.0).value();
            SimpleSpan[] strength = new SimpleSpan[cases.length];
            SimpleSpan[] deflection = new SimpleSpan[cases.length];
            double[] live = new double[cases.length];
            double[] all = new double[cases.length];
            for (int i = 0; i < cases.length; i++) {
                strength[i] = comp.of(cases[i]);
                deflection[i] = comp.forDeflection(cases[i]);
                live[i] = cases[i] == LoadCase.D ? 0 : 1;
                all[i] = 1;
            }
            strength[LoadCase.D.ordinal()] = strength[LoadCase.D.ordinal()].plus(wetSpan);
            this.comboSpans = new SimpleSpan[combos.size()];
            this.comboDead = new double[combos.size()];
            for (int c = 0; c < combos.size(); c++) {
                double[] fc = new double[cases.length];
                for (int i = 0; i < cases.length; i++) {
                    fc[i] = combos.get(c).factor(cases[i]);
                }
                comboSpans[c] = SimpleSpan.combine(fc, strength);
                comboDead[c] = combos.get(c).factor(LoadCase.D);
            }
            this.liveEi = SimpleSpan.combine(live, deflection).maxDeflection(1.0);
            SimpleSpan post = SimpleSpan.combine(all, deflection);
            this.postEi = post.maxDeflection(1.0);
            this.allSpan = post.plus(wetSpan);
            this.points = pointPositions(m);
        }
        Bracing bracing = m.ribs() == DeckRibs.PERPENDICULAR ? Bracing.continuous()
                : m.constructionBracing() != null ? m.constructionBracing() : criteria.constructionBracing();
        BeamLoads cl = BeamLoads.of(span, Map.of(LoadCase.D, m.wet(), LoadCase.L, m.construction()));
        this.construction = new BeamDesigner(cl, new BeamCriteria(criteria.method(), criteria.steel(), bracing,
                new DeflectionLimits(0, 0), criteria.selfWeight()));
    }

    /** True when every load of {@code m} is a full-span uniform load on D or L and the deflection loads are the strength loads. */
    private static boolean isUniform(CompositeMember m) {
        BeamLoads comp = m.composite();
        if (comp.separateDeflectionLoads() || !allFullUniform(m.wet(), m.span()) || !allFullUniform(m.construction(), m.span())) {
            return false;
        }
        for (LoadCase c : LoadCase.values()) {
            List<SpanLoad> l = comp.of(c).loads();
            if (c == LoadCase.D || c == LoadCase.L ? !allFullUniform(l, m.span()) : comp.of(c).totalLoad() != 0) {
                return false;
            }
        }
        return true;
    }

    private static boolean allFullUniform(List<? extends SpanLoad> loads, double span) {
        for (SpanLoad l : loads) {
            if (!(l instanceof DistributedLoad d) || d.start() != 0 || d.end() != span || d.wStart() != d.wEnd()) {
                return false;
            }
        }
        return true;
    }

    private static double uniformSum(List<? extends SpanLoad> loads) {
        double w = 0;
        for (SpanLoad l : loads) {
            w += ((DistributedLoad) l).wStart();
        }
        return w;
    }

    /** Positions of the point loads strictly inside the span, of the wet loads and every composite-stage case. */
    private static double[] pointPositions(CompositeMember m) {
        List<SpanLoad> all = new ArrayList<>(m.wet());
        for (LoadCase c : LoadCase.values()) {
            all.addAll(m.composite().of(c).loads());
        }
        double[] x = new double[all.size()];
        int n = 0;
        for (SpanLoad l : all) {
            if (l instanceof PointLoad p && p.position() > 0 && p.position() < m.span() && p.force() != 0) {
                x[n++] = p.position();
            }
        }
        x = Arrays.copyOf(x, n);
        Arrays.sort(x);
        int k = 0;
        for (int i = 0; i < n; i++) {
            if (k == 0 || x[i] != x[k - 1]) {
                x[k++] = x[i];
            }
        }
        return Arrays.copyOf(x, k);
    }

    /** The member designed (for a designer made from a {@link CompositeBeam}, its {@link CompositeBeam#member()}). */
    public CompositeMember member() {
        return member;
    }

    /** The uniform-load beam this designer was made from; null when it was made from a {@link CompositeMember}. */
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

    /**
     * The least studs per half span the rules allow on {@code s}: the minimum degree of composite action
     * and the maximum spacing of I8.2d (at least one).
     */
    public int minStudsPerHalf(Section s) {
        return new SectionState(s, null).minPerHalf;
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
     * the composite-stage moment demand (own weight in D), the moments at the point loads and the studs
     * they need, and (by {@link #stages}, which the search runs only for a section that passes at its
     * most studs) the construction stage and the shear check.
     */
    private final class SectionState {
        final Section s;
        final double w;
        /** The pre-composite deflection, where, and the camber: see {@link #pre()} (general loads, no sheet: on demand). */
        private double pre;
        private double preAt;
        private double camber;
        private boolean preKnown;
        /**
         * An upper bound of the pre-composite deflection (general loads, unshored): the maximum of the wet
         * loads' deflection plus that of the own weight, each on E·I_s, which bounds the maximum of their sum.
         */
        final double preBound;
        final double full;
        final int minPerHalf;
        final int hiPerHalf;
        final boolean limitedByRibs;
        /** The governing combination of the composite-stage maximum moment and that moment. */
        final Combinations.Governing mu;
        /** Where that moment acts. */
        final double muAt;
        /** E·I × the total-load deflection of a shored member (wet, composite and own weight), and where (general case). */
        final double allEi;
        final double allAt;
        /** The moment at each point load (governing combination) and the studs it needs (−1 until computed). */
        final double[] pointMu;
        final LoadCombination[] pointCombo;
        final int[] pointRequired;
        List<Check> constructionChecks = List.of();
        double constructionRatio;
        Check shear;
        /** True once {@link #stages} has run (the construction checks are there). */
        boolean staged;

        SectionState(Section s, Calc calc) {
            this.s = s;
            this.w = criteria.selfWeight() ? s.weight() : 0;
            double[] out = new double[2];
            this.preBound = uniform || criteria.shored() ? Double.NaN
                    : (wetEi + w * 5 * span * span * span * span / 384) / (criteria.steel().e() * s.props().ix());
            if (uniform || criteria.shored() || calc != null) {
                computePre(calc);
            }
            // the stud range
            this.full = Math.min(0.85 * concrete.fc() * concrete.ac(), s.props().a() * criteria.steel().fy());
            int forDegree = (int) Math.ceil(criteria.minDegree() * full / qn - 1e-9);
            this.minPerHalf = Math.max(Math.max(forDegree, spacingMinPerHalf), 1);
            int forFull = (int) Math.ceil(full / qn - 1e-9);
            // the composite-stage moment demand
            if (uniform) {
                mu = Combinations.governing(byCase((wSlab + wSdl + w) * span * span / 8, wLive * span * span / 8), combos);
                muAt = span / 2;
                allEi = Double.NaN;
                allAt = Double.NaN;
                pointMu = null;
                pointCombo = null;
                pointRequired = null;
            } else {
                int nc = combos.size();
                double[] values = new double[nc];
                double[] at = new double[nc];
                for (int c = 0; c < nc; c++) {
                    comboSpans[c].maxMomentWithUniform(comboDead[c] * w, out);
                    values[c] = out[0];
                    at[c] = out[1];
                }
                int g = Combinations.governing(values);
                mu = new Combinations.Governing(combos.get(g), g, values[g]);
                muAt = at[g];
                if (criteria.shored()) {
                    allSpan.maxEiDeflectionWithUniform(w, out);
                    allEi = out[0];
                    allAt = out[1];
                } else {
                    allEi = Double.NaN;
                    allAt = Double.NaN;
                }
                pointMu = new double[points.length];
                pointCombo = new LoadCombination[points.length];
                pointRequired = new int[points.length];
                for (int p = 0; p < points.length; p++) {
                    double x = points[p];
                    for (int c = 0; c < nc; c++) {
                        values[c] = comboSpans[c].moment(x) + comboDead[c] * w * x * (span - x) / 2;
                    }
                    int gp = Combinations.governing(values);
                    pointMu[p] = values[gp];
                    pointCombo[p] = combos.get(gp);
                    pointRequired[p] = -1;
                }
            }
            // the most studs worth having: full composite action at every point that needs it
            int needed = forFull;
            if (!uniform) {
                if (mu.value() > 0) {
                    needed = Math.max(needed, perHalfFor(forFull, muAt));
                }
                for (double x : points) {
                    needed = Math.max(needed, perHalfFor(forFull, x));
                }
            }
            this.hiPerHalf = Math.min(needed, maxPerHalf);
            this.limitedByRibs = needed > maxPerHalf;
        }

        /** The pre-composite deflection (0 when shored), computed once. */
        double pre() {
            if (!preKnown) {
                computePre(null);
            }
            return pre;
        }

        /** The camber (0 when shored), with {@link #pre()}. */
        double camber() {
            if (!preKnown) {
                computePre(null);
            }
            return camber;
        }

        /** True when the pre-composite deflection has been computed. */
        boolean preKnown() {
            return preKnown;
        }

        private void computePre(Calc calc) {
            preKnown = true;
            if (criteria.shored()) {
                pre = 0;
                preAt = span / 2;
                camber = 0;
                return;
            }
            if (calc != null) {
                calc.heading("Deflection of the bare steel under the wet slab and camber");
            }
            if (uniform) {
                pre = deflection("Δ_pre", wSlab + w, s.props().ix(), "wet slab and steel on the bare steel", calc);
                preAt = span / 2;
            } else {
                double[] out = new double[2];
                wetSpan.maxEiDeflectionWithUniform(w, out);
                preAt = out[1];
                pre = deflection("Δ_pre", out[0], preAt, s.props().ix(), "I_s", "wet loads and steel on the bare steel", calc);
            }
            camber = criteria.camber().camber(pre, span, calc);
        }

        /**
         * The least stud count k (from the support) whose φM_n(k·Q_n) carries the moment at point load
         * {@code p} (I8.2c), or {@link Integer#MAX_VALUE} when even full composite action does not.
         */
        int required(int p) {
            int r = pointRequired[p];
            if (r < 0) {
                r = leastStudsFor(this, pointMu[p]);
                pointRequired[p] = r;
            }
            return r;
        }

        /**
         * The search's part of {@link #stages}: the construction stage's governing ratio only (the same
         * number) and the shear check.
         */
        void stageRatios() {
            constructionRatio = criteria.shored() ? 0 : Math.max(0, construction.governingRatio(s));
            shear(null);
        }

        /** The construction stage (bare steel, F2/F3 and G2.1 by {@link BeamDesigner}) and the composite-stage shear. */
        void stages(Calc calc) {
            staged = true;
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
            shear(calc);
        }

        /** Shear on the steel section alone (I4.2 → G2.1) under the composite-stage combinations. */
        void shear(Calc calc) {
            if (calc != null) {
                calc.heading("Shear: the steel section alone");
            }
            IShapeShear.Strength vs = shearStrength(s, criteria.steel(), calc);
            Combinations.Governing g;
            double x = 0;
            if (uniform) {
                g = Combinations.governing(byCase((wSlab + wSdl + w) * span / 2, wLive * span / 2), combos);
            } else {
                double[] values = new double[combos.size()];
                double[] at = new double[combos.size()];
                for (int c = 0; c < values.length; c++) {
                    double sw = comboDead[c] * w * span / 2;
                    double r1 = comboSpans[c].leftReaction() + sw;
                    double r2 = comboSpans[c].rightReaction() + sw;
                    values[c] = Math.max(r1, r2);
                    at[c] = r1 >= r2 ? 0 : span;
                }
                int i = Combinations.governing(values);
                g = new Combinations.Governing(combos.get(i), i, values[i]);
                x = at[i];
            }
            double avail = criteria.method().available(vs.vn(), vs.phi(), vs.omega());
            if (calc != null) {
                if (uniform) {
                    calc.eq("Vu", "w·L/2", STATICS, g.value(), Quantity.FORCE,
                            Arg.of("w", g.value() * 2 / span, Quantity.LINE_LOAD), Arg.of("L", span, Quantity.SPAN_LENGTH));
                } else {
                    calc.value("Vu", g.value(), Quantity.FORCE, "the larger reaction, at the " + (x == 0 ? "left" : "right")
                            + " support", STATICS_GENERAL);
                }
                calc.note("governing combination " + g.combination().name(), g.combination().reference());
                calc.eq("ratio", "V_req/V_avail", CLAUSE_I4_2, g.value() / avail, Quantity.NUMBER,
                        Arg.of("V_req", g.value(), Quantity.FORCE), Arg.of("V_avail", avail, Quantity.FORCE));
            }
            this.shear = new Check("shear", g.value(), avail, g.value() / avail, g.combination(), CLAUSE_I4_2, Quantity.FORCE,
                    x, null, Double.NaN, Double.NaN, "steel section alone");
        }
    }

    /**
     * The studs per half span at which the studs between the nearer support and {@code x} reach
     * {@code count}: the inverse of {@link #studsTo}.
     */
    private int perHalfFor(int count, double x) {
        double d = Math.min(x, span - x);
        if (!(d > 0)) {
            return Integer.MAX_VALUE;
        }
        double n = Math.ceil(count * (span / 2) / d - 1e-6);
        if (n >= Integer.MAX_VALUE / 2) {
            return Integer.MAX_VALUE;
        }
        int k = Math.max(count, (int) n);
        while (studsTo(x, k) < count) { // the rounding of the estimate, exactly as studsTo counts
            k++;
        }
        return k;
    }

    /**
     * Studs between the nearer support and {@code x} with {@code perHalf} studs spaced uniformly over
     * each half span: ⌊n·d/(L/2)⌋, d = min(x, L − x) (common practice).
     */
    private int studsTo(double x, int perHalf) {
        double d = Math.min(x, span - x);
        return Math.min(perHalf, (int) Math.floor(perHalf * d / (span / 2) + 1e-9));
    }

    /** The least k ≥ 0 with M/(φM_n(k·Q_n)) passing; {@link Integer#MAX_VALUE} when full composite action does not pass. */
    private int leastStudsFor(SectionState st, double m) {
        int hi = (int) Math.ceil(st.full / qn - 1e-9);
        if (!Check.passes(m / availableMoment(st.s, hi))) {
            return Integer.MAX_VALUE;
        }
        int lo = 0;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (Check.passes(m / availableMoment(st.s, mid))) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return lo;
    }

    private double availableMoment(Section s, int studs) {
        CompositeFlexureI3.Result r = CompositeFlexureI3.strength(s, criteria.steel().fy(), criteria.steel().e(), concrete,
                studs * qn, null);
        return criteria.method().available(r.mn(), CompositeFlexureI3.PHI_B, CompositeFlexureI3.OMEGA_B);
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

    /**
     * A deflection of the general case from E·I × deflection {@code eiDelta} at {@code x}: Δ = EIΔ/(E·I),
     * the maximum along the span of the simple span under the loads as listed.
     */
    private double deflection(String symbol, double eiDelta, double x, double i, String iName, String what, Calc calc) {
        double e = criteria.steel().e();
        double v = eiDelta / (e * i);
        if (calc == null) {
            return v;
        }
        return calc.value(symbol, v, Quantity.SECTION_LENGTH, what + ": maximum along the span with E·" + iName, STATICS_GENERAL,
                Arg.of("x", x, Quantity.SPAN_LENGTH), Arg.of("E", e, Quantity.STRESS), Arg.of(iName, i, Quantity.INERTIA));
    }

    /**
     * The stud-dependent checks of one section with one stud count: composite flexure, the studs at point
     * loads, the two deflections. Plain numbers: the search makes thousands of these and needs only
     * {@link #ratio}; the {@link Check} records are built on demand, for a result or a rejection.
     */
    private final class Trial {
        final SectionState st;
        final int perHalf;
        CompositeFlexureI3.Result flexure;
        int nm;
        double sumQn;
        double ilb;
        double momentAvail;
        double momentRatio;
        /** The governing point load (−1 when none), the studs it needs and has, and the ratio. */
        int point = -1;
        int pointRequired;
        int pointAvailable;
        double pointRatio;
        double live = Double.NaN;
        double liveAllow;
        double liveAt;
        double total = Double.NaN;
        double totalAllow;
        double totalAt;
        /** The governing ratio of the checks above. */
        double ratio;

        Trial(SectionState st, int perHalf) {
            this.st = st;
            this.perHalf = perHalf;
        }

        Check moment() {
            CompositeFlexureI3.Result r = flexure;
            String note = r.pna() == CompositeFlexureI3.Pna.SLAB ? "PNA in the slab"
                    : r.pna() == CompositeFlexureI3.Pna.TOP_FLANGE ? "PNA in the top flange" : "PNA in the web";
            if (nm != perHalf) {
                note = note + "; " + nm + " studs between the nearer support and the point of maximum moment";
            }
            return new Check("composite flexure", st.mu.value(), momentAvail, momentRatio, st.mu.combination(), CLAUSE_I3_2A,
                    Quantity.MOMENT, st.muAt, null, 0, Double.NaN, note);
        }

        Check points() {
            if (point < 0) {
                return null;
            }
            return new Check("studs at point loads", pointRequired == Integer.MAX_VALUE ? Double.POSITIVE_INFINITY : pointRequired,
                    pointAvailable, pointRatio, st.pointCombo[point], CLAUSE_I8_2C, Quantity.NUMBER, points[point], null, Double.NaN,
                    Double.NaN, "point load " + (point + 1) + " of " + points.length + " from the left governs: studs required "
                            + "over studs between it and the nearer support");
        }

        Check live() {
            return Double.isNaN(live) ? null : new Check("live-load deflection", live, liveAllow, live / liveAllow, null,
                    DeflectionLimits.SOURCE, Quantity.SECTION_LENGTH, liveAt, null, Double.NaN, Double.NaN, liveNote);
        }

        Check total() {
            if (Double.isNaN(total)) {
                return null;
            }
            String note = criteria.shored() ? "shored: all loads on I_LB" : "pre-composite less camber, plus SDL and L on I_LB";
            return new Check("total-load deflection", total, totalAllow, total / totalAllow, null, DeflectionLimits.SOURCE,
                    Quantity.SECTION_LENGTH, totalAt, null, Double.NaN, Double.NaN, note + ", " + totalNote);
        }
    }

    private Trial trial(SectionState st, int perHalf, Calc calc) {
        return trial(st, perHalf, calc, false);
    }

    /**
     * The checks of {@code st} with {@code perHalf} studs per half span. With {@code search} (no sheet),
     * the total-load deflection of an unshored member under general loads is left out when even its
     * upper bound (the bound of the pre-composite deflection, no camber) stays below another check's
     * ratio: it could not govern, and the search needs only the governing ratio and check.
     */
    private Trial trial(SectionState st, int perHalf, Calc calc, boolean search) {
        Trial t = new Trial(st, perHalf);
        Section s = st.s;
        double fy = criteria.steel().fy();
        int nm = uniform ? perHalf : studsTo(st.muAt, perHalf);
        double sumQn = nm * qn;
        if (calc != null) {
            if (uniform) {
                calc.eq("ΣQn", "n_h·Qn", CLAUSE_I8_2C, sumQn, Quantity.FORCE, Arg.num("n_h", perHalf), Arg.of("Qn", qn, Quantity.FORCE));
            } else {
                calc.value("n_m", nm, Quantity.NUMBER, "studs between the nearer support and the point of maximum moment, "
                        + "⌊n_h·d/(L/2)⌋ with d = min(x, L − x)", STUD_RULE, Arg.num("n_h", perHalf),
                        Arg.of("x", st.muAt, Quantity.SPAN_LENGTH), Arg.of("L", span, Quantity.SPAN_LENGTH));
                calc.eq("ΣQn", "n_m·Qn", CLAUSE_I8_2C, sumQn, Quantity.FORCE, Arg.num("n_m", nm), Arg.of("Qn", qn, Quantity.FORCE));
            }
        }
        CompositeFlexureI3.Result r = CompositeFlexureI3.strength(s, fy, criteria.steel().e(), concrete, sumQn, calc);
        Combinations.Governing g = st.mu;
        double avail = criteria.method().available(r.mn(), CompositeFlexureI3.PHI_B, CompositeFlexureI3.OMEGA_B);
        double ratio = g.value() / avail;
        if (calc != null) {
            if (uniform) {
                calc.eq("Mu", "w·L²/8", STATICS, g.value(), Quantity.MOMENT, Arg.of("w", g.value() * 8 / (span * span),
                        Quantity.LINE_LOAD), Arg.of("L", span, Quantity.SPAN_LENGTH));
            } else {
                calc.value("Mu", g.value(), Quantity.MOMENT, "largest moment of the combination along the span", STATICS_GENERAL,
                        Arg.of("x", st.muAt, Quantity.SPAN_LENGTH));
            }
            calc.note("governing combination " + g.combination().name(), g.combination().reference());
            calc.eq("ratio", "M_req/M_avail", CLAUSE_I3_2A, ratio, Quantity.NUMBER, Arg.of("M_req", g.value(), Quantity.MOMENT),
                    Arg.of("M_avail", avail, Quantity.MOMENT));
        }
        t.flexure = r;
        t.nm = nm;
        t.sumQn = sumQn;
        t.momentAvail = avail;
        t.momentRatio = ratio;
        double worst = ratio;
        if (points.length > 0) {
            pointCheck(t, calc);
            worst = Math.max(worst, t.pointRatio);
        }
        if (calc != null) {
            calc.heading("Stiffness and deflections");
        }
        double ilb = CompositeStiffness.ilb(s, fy, r, calc);
        t.ilb = ilb;
        DeflectionLimits lim = criteria.deflection();
        if (lim.live() > 0) {
            double d;
            double at;
            if (uniform) {
                d = deflection("Δ_LL", wLive, ilb, "live load on I_LB", calc);
                at = span / 2;
            } else {
                d = deflection("Δ_LL", liveEi.value(), liveEi.position(), ilb, "I_LB", "live loads on I_LB", calc);
                at = liveEi.position();
            }
            t.live = d;
            t.liveAllow = span / lim.live();
            t.liveAt = at;
            worst = Math.max(worst, d / t.liveAllow);
        }
        if (lim.total() > 0) {
            double d;
            double at;
            if (criteria.shored()) {
                if (uniform) {
                    d = deflection("Δ_TL", wSlab + wSdl + st.w + wLive, ilb, "every load on I_LB (shored)", calc);
                    at = span / 2;
                } else {
                    d = deflection("Δ_TL", st.allEi, st.allAt, ilb, "I_LB", "every load and the steel on I_LB (shored)", calc);
                    at = st.allAt;
                }
            } else {
                double post;
                if (uniform) {
                    post = deflection("Δ_post", wSdl + wLive, ilb, "superimposed dead and live load on I_LB", calc);
                    at = span / 2;
                } else {
                    post = deflection("Δ_post", postEi.value(), postEi.position(), ilb, "I_LB",
                            "superimposed dead and live loads on I_LB", calc);
                    at = postEi.position();
                    Calc.branch(calc, "Δ_pre and Δ_post are each the maximum of their loads; their sum bounds the maximum of the total",
                            PRACTICE);
                    if (search && calc == null && !st.preKnown() && (st.preBound + post) / (span / lim.total()) * (1 + 1e-9) < worst) {
                        t.ratio = worst;
                        return t;
                    }
                }
                if (calc == null) {
                    d = st.pre() - st.camber() + post;
                } else {
                    d = calc.eq("Δ_TL", "Δ_pre − camber + Δ_post", PRACTICE, st.pre() - st.camber() + post,
                            Quantity.SECTION_LENGTH, Arg.of("Δ_pre", st.pre(), Quantity.SECTION_LENGTH),
                            Arg.of("camber", st.camber(), Quantity.SECTION_LENGTH), Arg.of("Δ_post", post, Quantity.SECTION_LENGTH));
                }
            }
            t.total = d;
            t.totalAllow = span / lim.total();
            t.totalAt = at;
            worst = Math.max(worst, d / t.totalAllow);
        }
        t.ratio = worst;
        return t;
    }

    /**
     * AISC 360-16 I8.2c: the studs between each point load and the nearer support (a point of zero
     * moment of a simple span) must develop the moment at the point load. For each point load x_p the
     * studs required are the least k with φM_n(k·Q_n) ≥ M_u(x_p); those available, with n_h studs spaced
     * uniformly over each half span, ⌊n_h·d_p/(L/2)⌋, d_p = min(x_p, L − x_p). The ratio is required over
     * available; the point with the highest ratio governs. Writes the governing point into {@code t}.
     */
    private void pointCheck(Trial t, Calc calc) {
        SectionState st = t.st;
        int perHalf = t.perHalf;
        int gov = 0;
        double worst = Double.NEGATIVE_INFINITY;
        for (int p = 0; p < points.length; p++) {
            double rp = pointRatio(st.required(p), studsTo(points[p], perHalf));
            if (rp > worst) {
                worst = rp;
                gov = p;
            }
        }
        if (calc != null) {
            calc.heading("Studs at point loads: between each point load and the nearer support (I8.2c)");
            Calc.branch(calc, perHalf + " studs per half span, spaced uniformly over each half span", STUD_RULE);
            boolean lrfd = criteria.method() == DesignMethod.LRFD;
            for (int p = 0; p < points.length; p++) {
                double x = points[p];
                int req = st.required(p);
                int avail = studsTo(x, perHalf);
                calc.value("Mu", st.pointMu[p], Quantity.MOMENT, "at point load " + (p + 1) + " of " + points.length + ", "
                        + st.pointCombo[p].name(), STATICS_GENERAL, Arg.of("x", x, Quantity.SPAN_LENGTH));
                if (req == Integer.MAX_VALUE) {
                    Calc.branch(calc, "φMn at full composite action is below Mu → the moment cannot be developed", CLAUSE_I8_2C);
                } else {
                    calc.value("n_req", req, Quantity.NUMBER, "least studs k with " + (lrfd ? "φb·Mn" : "Mn/Ωb")
                            + "(k·Qn) ≥ Mu", CLAUSE_I8_2C, Arg.of(lrfd ? "φb·Mn" : "Mn/Ωb", availableMoment(st.s, req), Quantity.MOMENT));
                }
                calc.value("n_p", avail, Quantity.NUMBER, "studs between the nearer support and the point, ⌊n_h·d/(L/2)⌋ with d = min(x, L − x)",
                        STUD_RULE, Arg.num("n_h", perHalf), Arg.of("x", x, Quantity.SPAN_LENGTH), Arg.of("L", span, Quantity.SPAN_LENGTH));
                if (req != Integer.MAX_VALUE && avail > 0) {
                    calc.eq("ratio", "n_req/n_p", CLAUSE_I8_2C, (double) req / avail, Quantity.NUMBER, Arg.num("n_req", req),
                            Arg.num("n_p", avail));
                } else {
                    calc.value("ratio", pointRatio(req, avail), Quantity.NUMBER, req == 0 ? "no studs needed" : "no studs to develop it",
                            CLAUSE_I8_2C);
                }
            }
            calc.note("point load " + (gov + 1) + " governs", CLAUSE_I8_2C);
        }
        t.point = gov;
        t.pointRequired = st.required(gov);
        t.pointAvailable = studsTo(points[gov], perHalf);
        t.pointRatio = worst;
    }

    /** Required over available studs: 0 when none are required, ∞ when required ones are missing or cannot do. */
    private static double pointRatio(int required, int available) {
        if (required == 0) {
            return 0;
        }
        if (required == Integer.MAX_VALUE || available == 0) {
            return Double.POSITIVE_INFINITY;
        }
        return (double) required / available;
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
            Trial top = trial(st, hi, null, true);
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
            st.stageRatios();
            if (st.constructionRatio > 1 + Check.RATIO_TOLERANCE) {
                st.stages(null);
            }
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
                if (Check.passes(trial(st, mid, null, true).ratio)) {
                    upper = mid;
                } else {
                    lo = mid + 1;
                }
            }
            double cost = steel + 2 * lo * criteria.studWeight()
                    + (criteria.camberAllowance() > 0 && st.camber() > 0 ? criteria.camberAllowance() : 0);
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
        if (!best.staged) {
            best.stages(null);
        }
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
        List<Check> l = new ArrayList<>(4);
        l.add(t.moment());
        addIfAny(l, t.live());
        addIfAny(l, t.total());
        addIfAny(l, t.points());
        return Check.governing(l);
    }

    private List<Check> checks(SectionState st, Trial t) {
        List<Check> out = new ArrayList<>(7);
        out.add(t.moment());
        addIfAny(out, t.points());
        out.addAll(st.constructionChecks);
        out.add(st.shear);
        addIfAny(out, t.live());
        addIfAny(out, t.total());
        return out;
    }

    private static void addIfAny(List<Check> l, Check c) {
        if (c != null) {
            l.add(c);
        }
    }

    private CompositeDesign result(MemberStatus status, SectionState st, int perHalf, Trial t, double itr,
            List<Rejection> rejected, List<CompositeDesign.Alternative> passing, long evaluations) {
        return new CompositeDesign(status, st.s, perHalf, 2 * perHalf, qn, t.sumQn, beff, bLeft, bRight, slabWeight,
                t.flexure, t.ilb, itr, st.pre(), st.camber(), st.constructionRatio, checks(st, t), rejected, passing,
                st.s.weight() * span + 2 * perHalf * criteria.studWeight()
                        + (criteria.camberAllowance() > 0 && st.camber() > 0 ? criteria.camberAllowance() : 0), evaluations);
    }

    /** The slab, the effective width and the stud strength, recorded once at the head of a sheet. */
    private void recordSlab(Calc calc) {
        SlabOnDeck slab = member.slab();
        calc.heading("Slab, effective width and studs (" + switch (member.ribs()) {
            case NONE -> "solid slab";
            case PERPENDICULAR -> "deck ribs perpendicular to the beam: concrete above the deck only, I3.2c(2)";
            case PARALLEL -> "deck ribs parallel to the beam: the ribs' concrete counts, I3.2c(3)";
        } + ")");
        if (beam != null ? Double.isNaN(beam.slabWeightOverride()) : slabWeight == slab.weight(null)) {
            slab.weight(calc);
        } else {
            calc.value("w_slab", slabWeight, Quantity.AREA_LOAD, beam != null ? "given by the user" : "as given", "");
        }
        double l = EffectiveWidthI3.side(span, member.toNeighbourLeft(), member.toEdgeLeft(), "left", calc);
        double r = EffectiveWidthI3.side(span, member.toNeighbourRight(), member.toEdgeRight(), "right", calc);
        EffectiveWidthI3.total(l, r, calc);
        Studs st = member.studs();
        StudStrengthI8.ec(slab.density(), slab.fc(), calc);
        double asa = StudStrengthI8.asa(st.diameter(), calc);
        StudStrengthI8.Factors f = StudStrengthI8.factors(member.ribs(), st.perRib(), st.position(), slab.wrOverHr(), calc);
        StudStrengthI8.qn(asa, slab.fc(), ec, f, st.fu(), calc);
        StudStrengthI8.minSpacing(st.diameter(), calc);
        StudStrengthI8.maxSpacing(slab.thickness(), calc);
        for (String p : StudStrengthI8.deckLimits(member.ribs(), slab.hr(), slab.wr(), st.diameter(), slab.topping(), Double.NaN)) {
            calc.note("outside the limits: " + p, "");
        }
        if (uniform) {
            calc.value("w_D", wSlab + wSdl, Quantity.LINE_LOAD, "slab and superimposed dead load (own weight added per section)", "",
                    Arg.of("w_L", wLive, Quantity.LINE_LOAD), Arg.of("w_CL", wConstructionLive, Quantity.LINE_LOAD));
        } else {
            calc.heading("Loads (service, own weight added per section)");
            recordLoads(calc, "wet (D; unshored: on the bare steel)", member.wet());
            if (!criteria.shored()) {
                recordLoads(calc, "construction live (L on the bare steel)", member.construction());
            }
            BeamLoads comp = member.composite();
            for (LoadCase c : LoadCase.values()) {
                recordLoads(calc, c.label() + " (" + c.symbol() + ") on the composite section", comp.of(c).loads());
                if (comp.separateDeflectionLoads() && c != LoadCase.D) {
                    recordLoads(calc, c.label() + " (" + c.symbol() + ") for deflection, unreduced", comp.forDeflection(c).loads());
                }
            }
        }
    }

    private static void recordLoads(Calc calc, String group, List<SpanLoad> loads) {
        for (SpanLoad l : loads) {
            if (l instanceof PointLoad p) {
                calc.value("P", p.force(), Quantity.FORCE, group + ": point load", "", Arg.of("x", p.position(), Quantity.SPAN_LENGTH));
            } else if (l instanceof DistributedLoad d) {
                calc.value("w", d.wStart(), Quantity.LINE_LOAD, group + ": line load, w at x1 to w2 at x2", "",
                        Arg.of("x1", d.start(), Quantity.SPAN_LENGTH), Arg.of("w2", d.wEnd(), Quantity.LINE_LOAD),
                        Arg.of("x2", d.end(), Quantity.SPAN_LENGTH));
            }
        }
    }

    /** The detailing limits of I3.2c(1) the slab and studs break (empty when none). */
    public List<String> deckProblems() {
        SlabOnDeck slab = member.slab();
        return StudStrengthI8.deckLimits(member.ribs(), slab.hr(), slab.wr(), member.studs().diameter(), slab.topping(), Double.NaN);
    }
}
