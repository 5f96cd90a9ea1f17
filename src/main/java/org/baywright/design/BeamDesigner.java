package org.baywright.design;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.baywright.analysis.SimpleSpan;
import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.Aisc360;
import org.baywright.design.aisc360.BendingCoefficient;
import org.baywright.design.aisc360.IShapeFlexure;
import org.baywright.design.aisc360.IShapeShear;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;

/**
 * Designs one simple-span, laterally supported or unsupported, rolled I-shape member: checks a
 * section (flexure F2/F3 with LTB per unbraced segment and Cb from the actual moment diagram, shear
 * G2.1, live and total deflection), and searches a catalog for the lightest section that passes,
 * adding each candidate's own weight to the dead load.
 *
 * <p>Demands are exact for the statics of a simple span: the maximum moment of each combination,
 * including the candidate's weight, is found where its shear changes sign; deflections are maximised
 * over the span. All loads must act downward, so that moment diagrams are concave: the maximum
 * moment in an unbraced segment is then at its ends or at the single point of zero shear.
 *
 * <p>One flow computes and records: each check is one function (flexure of one unbraced segment under
 * one combination, shear under one combination, live- and total-load deflection) that takes a
 * {@link Calc} which may be null. The search calls them without a recorder for every candidate; the
 * calculation sheet of the chosen section comes from calling the same functions again with a recorder
 * for the governing combination and segment, so the sheet prints the numbers the decision used. The
 * governing combination is chosen by {@link Combinations#governing(double[])}; pass or fail by
 * {@link Check#passes(double)}.
 *
 * <p>Tie-break: among equal nominal weights the shallower section (smaller d) is tried first, then
 * the designation in alphabetical order ({@link Catalog#SEARCH_ORDER}).
 */
public final class BeamDesigner {
    // the references recorded on calculation sheets, built once (the search evaluates these functions without a sheet)
    private static final String CLAUSE_A3_1 = Aisc360.clause("A3.1");
    private static final String CLAUSE_F1 = Aisc360.clause("F1");
    private static final String CLAUSE_F2 = Aisc360.clause("F2");
    private static final String CLAUSE_F3 = Aisc360.clause("F3");
    private static final String CLAUSE_G1 = Aisc360.clause("G1");
    private static final String CLAUSE_G2_1_A = Aisc360.clause("G2.1(a)");
    private static final String CLAUSE_G2_1_B = Aisc360.clause("G2.1(b)");

    /** Length-independent strengths of a section for one steel, computed once and shared by all designers. */
    private record Strengths(IShapeFlexure.Constants flexure, IShapeShear.Strength shear) {
    }

    private static final Map<Steel, Map<Section, Strengths>> CACHE = new ConcurrentHashMap<>();

    private final BeamLoads loads;
    private final BeamCriteria criteria;
    private final double span;
    private final List<LoadCombination> combos;
    private final SimpleSpan[] comboSpans;
    private final double[] comboDeadFactor;
    private final double[] bounds;
    private final SimpleSpan totalSpan;
    private final double liveDeflectionEi;
    private final double liveDeflectionAt;
    private final double totalDeflectionEi;
    private final LoadCombination liveCombination;
    private final LoadCombination totalCombination;
    private final LoadCombination totalCombinationSw;
    private final String liveNote;
    private final String totalNote;
    private final UnbracedSegment[] segments;

    public BeamDesigner(BeamLoads loads, BeamCriteria criteria) {
        this.loads = loads;
        this.criteria = criteria;
        this.span = loads.span();
        java.util.Set<LoadCase> present = loads.present();
        this.combos = Combinations.gravity(criteria.method(), present);
        this.comboSpans = new SimpleSpan[combos.size()];
        this.comboDeadFactor = new double[combos.size()];
        LoadCase[] cases = LoadCase.values();
        SimpleSpan[] caseSpans = new SimpleSpan[cases.length];
        for (int i = 0; i < cases.length; i++) {
            caseSpans[i] = loads.of(cases[i]);
        }
        for (int c = 0; c < combos.size(); c++) {
            double[] f = new double[cases.length];
            for (int i = 0; i < cases.length; i++) {
                f[i] = combos.get(c).factor(cases[i]);
            }
            comboSpans[c] = SimpleSpan.combine(f, caseSpans);
            comboDeadFactor[c] = combos.get(c).factor(LoadCase.D);
        }
        double[] fr = criteria.bracing().boundaries();
        this.bounds = new double[fr.length];
        for (int i = 0; i < fr.length; i++) {
            bounds[i] = fr[i] * span;
        }
        // the deflection checks take the service loads meant for them (the live load unreduced, when given)
        SimpleSpan[] deflectionSpans = new SimpleSpan[cases.length];
        for (int i = 0; i < cases.length; i++) {
            deflectionSpans[i] = loads.forDeflection(cases[i]);
        }
        this.totalSpan = SimpleSpan.combine(new double[] {1, 1, 1, 1}, deflectionSpans);
        // the extremes only where a limit asks for them (the composite designer's construction stage has none)
        if (criteria.deflection().live() > 0) {
            org.baywright.analysis.Extreme ld = SimpleSpan.combine(new double[] {0, 1, 1, 1}, deflectionSpans).maxDeflection(1.0);
            this.liveDeflectionEi = ld.value();
            this.liveDeflectionAt = ld.position();
        } else {
            this.liveDeflectionEi = Double.NaN;
            this.liveDeflectionAt = Double.NaN;
        }
        this.totalDeflectionEi = criteria.deflection().total() > 0 ? totalSpan.maxDeflection(1.0).value() : Double.NaN;
        // the service combinations of the deflection checks: the live cases present (L when none is), and D with them
        Map<LoadCase, Double> live = new EnumMap<>(LoadCase.class);
        for (LoadCase c : new LoadCase[] {LoadCase.L, LoadCase.LR, LoadCase.S}) {
            if (present.contains(c)) {
                live.put(c, 1.0);
            }
        }
        if (live.isEmpty()) {
            live.put(LoadCase.L, 1.0);
        }
        Map<LoadCase, Double> total = new EnumMap<>(live);
        total.put(LoadCase.D, 1.0);
        this.liveCombination = new LoadCombination(serviceName(live), live, Combinations.SERVICE_REFERENCE);
        this.totalCombination = new LoadCombination(serviceName(total), total, Combinations.SERVICE_REFERENCE);
        this.totalCombinationSw = new LoadCombination(totalCombination.name() + " + self-weight", total,
                Combinations.SERVICE_REFERENCE);
        String which = loads.separateDeflectionLoads() ? ", live load unreduced" : "";
        this.liveNote = limitNote(criteria.deflection().live()) + which;
        this.totalNote = limitNote(criteria.deflection().total()) + which;
        this.segments = new UnbracedSegment[bounds.length - 1];
        for (int i = 0; i < segments.length; i++) {
            segments[i] = new UnbracedSegment(i, segments.length, bounds[i], bounds[i + 1]);
        }
    }

    /** "D + L + Lr": the cases of a service combination, every factor 1. */
    private static String serviceName(Map<LoadCase, Double> cases) {
        StringBuilder b = new StringBuilder();
        for (LoadCase c : cases.keySet()) {
            b.append(b.length() == 0 ? "" : " + ").append(c.symbol());
        }
        return b.toString();
    }

    private static String limitNote(double n) {
        return "limit L/" + (n == Math.rint(n) ? Long.toString((long) n) : CalcFormat.sig(n));
    }

    public BeamLoads loads() {
        return loads;
    }

    public BeamCriteria criteria() {
        return criteria;
    }

    /** The strength combinations used. */
    public List<LoadCombination> combinations() {
        return combos;
    }

    /** The check with the highest ratio; the same as {@link Check#governing(List)}, where it now lives. */
    @Deprecated
    public static Check governing(List<Check> checks) {
        return Check.governing(checks);
    }

    /** Searches {@code catalog} for the lightest section that passes every check. */
    public BeamDesign search(Catalog catalog, SearchFilter filter) {
        List<Rejection> rejected = new ArrayList<>();
        Steel steel = criteria.steel();
        Trial t = new Trial();
        Section best = null;
        double bestRatio = Double.POSITIVE_INFINITY;
        int candidates = 0;
        for (Section s : catalog.sections()) {
            if (!filter.allows(s)) {
                continue;
            }
            candidates++;
            Strengths st = strengths(s, steel);
            Outcome g = evaluate(null, s, st, t, true);
            if (Check.passes(g.ratio)) {
                return new BeamDesign(MemberStatus.SIZED, s, check(s, null), rejected, candidates);
            }
            rejected.add(new Rejection(s, toCheck(g, st, selfWeight(s))));
            if (g.ratio < bestRatio) {
                bestRatio = g.ratio;
                best = s;
            }
        }
        if (best == null) {
            return new BeamDesign(MemberStatus.OVERSTRESSED, null, List.of(), rejected, 0);
        }
        return new BeamDesign(MemberStatus.OVERSTRESSED, best, check(best, null), rejected, candidates);
    }

    /** Checks a section the user chose (fixed size). */
    public BeamDesign checkFixed(Section s) {
        List<Check> checks = check(s, null);
        return new BeamDesign(Check.governing(checks).passes() ? MemberStatus.FIXED_SIZE : MemberStatus.OVERSTRESSED, s,
                checks, List.of(), 1);
    }

    /**
     * Every check of {@code s}: flexure, shear and, where their limits are set, live- and total-load
     * deflection. With a recorder, the same evaluation writes the calculation sheet of the section
     * (for each check, the lines of its governing combination and segment).
     */
    public List<Check> check(Section s, Calc calc) {
        Strengths st = strengths(s, criteria.steel());
        Trial t = new Trial();
        evaluate(calc, s, st, t, false);
        double w = selfWeight(s);
        List<Check> out = new ArrayList<>(4);
        out.add(toCheck(t.flexure, st, w));
        out.add(toCheck(t.shear, st, w));
        if (t.live.active) {
            out.add(toCheck(t.live, st, w));
        }
        if (t.total.active) {
            out.add(toCheck(t.total, st, w));
        }
        return out;
    }

    /**
     * The governing ratio of {@link #check(Section, Calc)}, the same number, without building its check
     * records: for a caller that needs pass or fail only (the composite search's construction stage).
     */
    double governingRatio(Section s) {
        return evaluate(null, s, strengths(s, criteria.steel()), new Trial(), true).ratio;
    }

    // ---- the checks, one function each --------------------------------------------------------
    // Each is called with calc = null by the search, for every candidate, and with a recorder for the
    // sheet of the chosen section: the numbers the sheet prints are the numbers the decision used.

    /**
     * Flexure of unbraced segment {@code segment} under combination {@code combination} (indices into
     * {@link #combinations()} and the bracing's segments, 0 = continuous bracing's single one).
     */
    Check flexure(Section s, int combination, int segment, Calc calc) {
        Strengths st = strengths(s, criteria.steel());
        Outcome o = new Outcome(FLEXURE);
        flexure(calc, st.flexure(), selfWeight(s), combination, segment, new double[2], o);
        return toCheck(o, st, selfWeight(s));
    }

    /** Shear under combination {@code combination}: the larger end reaction. */
    Check shear(Section s, int combination, Calc calc) {
        Strengths st = strengths(s, criteria.steel());
        Outcome o = new Outcome(SHEAR);
        shear(calc, s, st.shear(), selfWeight(s), combination, o);
        return toCheck(o, st, selfWeight(s));
    }

    /** Live-load deflection (null when no live-load limit is set). */
    Check liveDeflection(Section s, Calc calc) {
        Strengths st = strengths(s, criteria.steel());
        Outcome o = new Outcome(LIVE);
        liveDeflection(calc, s, o);
        return o.active ? toCheck(o, st, selfWeight(s)) : null;
    }

    /** Total-load deflection, own weight included when the criteria add it (null when no limit is set). */
    Check totalDeflection(Section s, Calc calc) {
        Strengths st = strengths(s, criteria.steel());
        Outcome o = new Outcome(TOTAL);
        totalDeflection(calc, s, selfWeight(s), Double.NaN, new double[2], o);
        return o.active ? toCheck(o, st, selfWeight(s)) : null;
    }

    private double selfWeight(Section s) {
        return criteria.selfWeight() ? s.weight() : 0;
    }

    private static Strengths strengths(Section s, Steel steel) {
        Map<Section, Strengths> m = CACHE.get(steel);
        if (m == null) {
            m = CACHE.computeIfAbsent(steel, k -> new ConcurrentHashMap<>());
        }
        Strengths t = m.get(s);
        if (t == null) {
            t = new Strengths(IShapeFlexure.constants(s, steel.fy(), steel.e(), null),
                    IShapeShear.strength(s, steel.fy(), steel.e(), null));
            m.put(s, t);
        }
        return t;
    }

    /** What a check is. */
    private static final int FLEXURE = 0;
    private static final int SHEAR = 1;
    private static final int LIVE = 2;
    private static final int TOTAL = 3;

    /**
     * The values of one check as a check function leaves them: plain fields, so that the search, which
     * evaluates every candidate, allocates nothing per candidate.
     */
    private static final class Outcome {
        final int kind;
        boolean active = true;
        double demand;
        double capacity;
        double ratio;
        double position;
        int combination;
        int segment;
        double lb = Double.NaN;
        double cb = Double.NaN;

        Outcome(int kind) {
            this.kind = kind;
        }
    }

    /** The working space of one search or one check: an outcome for each combination (and segment). */
    private final class Trial {
        final Outcome[] flexures = new Outcome[combos.size() * (bounds.length - 1)];
        final double[] flexureRatios = new double[flexures.length];
        final Outcome[] shears = new Outcome[combos.size()];
        final double[] shearRatios = new double[shears.length];
        final Outcome live = new Outcome(LIVE);
        final Outcome total = new Outcome(TOTAL);
        final double[] moment = new double[2];
        Outcome flexure;
        Outcome shear;

        Trial() {
            for (int i = 0; i < flexures.length; i++) {
                flexures[i] = new Outcome(FLEXURE);
            }
            for (int i = 0; i < shears.length; i++) {
                shears[i] = new Outcome(SHEAR);
            }
        }
    }

    /**
     * Evaluates every check of {@code s} into {@code t} and returns the governing one. With a recorder,
     * writes the sheet: the section's data, then each check's governing case through the same check
     * function. With {@code search}, the total-load deflection is only bounded when the bound shows it
     * cannot govern (the search needs the governing check, nothing more).
     */
    private Outcome evaluate(Calc calc, Section s, Strengths st, Trial t, boolean search) {
        double w = selfWeight(s);
        IShapeFlexure.Constants k = calc == null ? st.flexure() : recordSection(calc, s, w);

        // Flexure, every combination and unbraced segment
        int segments = bounds.length - 1;
        for (int c = 0; c < combos.size(); c++) {
            for (int seg = 0; seg < segments; seg++) {
                int i = c * segments + seg;
                flexure(null, k, w, c, seg, t.moment, t.flexures[i]);
                t.flexureRatios[i] = t.flexures[i].ratio;
            }
        }
        t.flexure = t.flexures[Combinations.governing(t.flexureRatios)];
        if (calc != null) {
            flexure(calc, k, w, t.flexure.combination, t.flexure.segment, t.moment, t.flexure);
        }

        // Shear, every combination
        for (int c = 0; c < combos.size(); c++) {
            shear(null, s, st.shear(), w, c, t.shears[c]);
            t.shearRatios[c] = t.shears[c].ratio;
        }
        t.shear = t.shears[Combinations.governing(t.shearRatios)];
        if (calc != null) {
            shear(calc, s, st.shear(), w, t.shear.combination, t.shear);
        }

        // Deflections under service loads (project criteria)
        liveDeflection(calc, s, t.live);
        double others = search ? Math.max(t.flexure.ratio, Math.max(t.shear.ratio, t.live.active ? t.live.ratio : 0))
                : Double.NaN;
        totalDeflection(calc, s, w, others, t.moment, t.total);

        return governs(t.total, governs(t.live, governs(t.shear, t.flexure)));
    }

    /** Records the section's data and its length-independent flexural constants (F2, F3, Table B4.1b). */
    private IShapeFlexure.Constants recordSection(Calc calc, Section s, double w) {
        Steel steel = criteria.steel();
        calc.heading("Section " + s.designation());
        calc.value("Fy", steel.fy(), Quantity.STRESS, steel.name(), CLAUSE_A3_1, Arg.of("E", steel.e(), Quantity.STRESS));
        calc.value("wsw", w, Quantity.LINE_LOAD, criteria.selfWeight() ? "self-weight: nominal weight of "
                + s.designation() + ", added to D" : "self-weight not added: the dead load is taken to include it", "");
        return IShapeFlexure.constants(s, steel.fy(), steel.e(), calc);
    }

    /** The governing of two checks, {@code o} when it is active and its ratio is higher or NaN (the rule of {@link Check#governing}). */
    private static Outcome governs(Outcome o, Outcome g) {
        return o.active && (o.ratio > g.ratio || Double.isNaN(o.ratio)) ? o : g;
    }

    /**
     * Flexure, AISC 360-16 F1–F3, of one unbraced segment under one strength combination: the largest
     * moment in the segment (with the section's own weight in D), Cb from the moment diagram of the
     * segment (F1-1), Mn for Lb and Cb, the available strength and the ratio. {@code m} is scratch for
     * the moment and its position.
     */
    private void flexure(Calc calc, IShapeFlexure.Constants k, double w, int c, int seg, double[] m, Outcome o) {
        boolean continuous = criteria.bracing().isContinuous();
        double a = bounds[seg];
        double b = bounds[seg + 1];
        maxMoment(c, w, a, b, m);
        double mu = Math.abs(m[0]);
        double lb = continuous ? 0 : b - a;
        if (calc != null) {
            recordMoment(calc, c, seg, mu, m[1], lb);
        }
        double cb = 1.0;
        if (!continuous) {
            double q = (b - a) / 4;
            cb = BendingCoefficient.cb(m[0], moment(c, w, a + q), moment(c, w, a + 2 * q), moment(c, w, a + 3 * q), calc);
        }
        double mn = IShapeFlexure.mn(k, lb, cb, calc);
        double avail = criteria.method().available(mn, ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B);
        double ratio = Double.isNaN(mn) ? Double.POSITIVE_INFINITY : mu / avail;
        o.demand = mu;
        o.capacity = avail;
        o.ratio = ratio;
        o.position = m[1];
        o.combination = c;
        o.segment = seg;
        o.lb = lb;
        o.cb = cb;
        if (calc != null) {
            recordFlexureRatio(calc, k, mn, avail, mu, ratio);
        }
    }

    // The recording halves of the flexure and shear functions, apart so that the functions stay small for the compiler.

    private void recordMoment(Calc calc, int c, int seg, double mu, double x, double lb) {
        boolean lrfd = criteria.method() == DesignMethod.LRFD;
        LoadCombination combo = combos.get(c);
        calc.heading("Flexure under " + combo.name() + " (" + combo.reference() + ")"
                + (bounds.length > 2 ? ", unbraced segment " + (seg + 1) + " of " + (bounds.length - 1) : ""));
        calc.value(lrfd ? "Mu" : "Ma", mu, Quantity.MOMENT, "maximum in the segment (statics of the simple span)", "",
                Arg.of("x", x, Quantity.SPAN_LENGTH));
        calc.value("Lb", lb, Quantity.SPAN_LENGTH, lb == 0 ? "compression flange braced continuously" : "unbraced length", "");
    }

    private void recordFlexureRatio(Calc calc, IShapeFlexure.Constants k, double mn, double avail, double mu, double ratio) {
        boolean lrfd = criteria.method() == DesignMethod.LRFD;
        calc.eq(lrfd ? "φb·Mn" : "Mn/Ωb", lrfd ? "φb·Mn" : "Mn/Ωb", CLAUSE_F1, avail, Quantity.MOMENT,
                Arg.num(lrfd ? "φb" : "Ωb", lrfd ? ResistanceFactors.PHI_B : ResistanceFactors.OMEGA_B),
                Arg.of("Mn", mn, Quantity.MOMENT));
        calc.eq("ratio", "M_req/M_avail", flexureClause(k), ratio, Quantity.NUMBER,
                Arg.of("M_req", mu, Quantity.MOMENT), Arg.of("M_avail", avail, Quantity.MOMENT));
    }

    private static String flexureClause(IShapeFlexure.Constants k) {
        return k.flange() == IShapeFlexure.FlangeClass.COMPACT ? CLAUSE_F2 : CLAUSE_F3;
    }

    /**
     * Shear, AISC 360-16 G1 and G2.1, under one strength combination: with downward loads the largest
     * shear is at a support, the larger end reaction (own weight in D).
     */
    private void shear(Calc calc, Section s, IShapeShear.Strength vs, double w, int c, Outcome o) {
        double sw = comboDeadFactor[c] * w * span / 2;
        double r1 = Math.abs(comboSpans[c].leftReaction() + sw);
        double r2 = Math.abs(comboSpans[c].rightReaction() + sw);
        double v = Math.max(r1, r2);
        double x = r1 >= r2 ? 0 : span;
        if (calc != null) {
            vs = recordShear(calc, s, c, v, x);
        }
        double vAvail = criteria.method().available(vs.vn(), vs.phi(), vs.omega());
        o.demand = v;
        o.capacity = vAvail;
        o.ratio = v / vAvail;
        o.position = x;
        o.combination = c;
        if (calc != null) {
            recordShearRatio(calc, vs, vAvail, v, o.ratio);
        }
    }

    /** Records the heading, the shear strength of the section (G2.1) and the demand; returns the strength. */
    private IShapeShear.Strength recordShear(Calc calc, Section s, int c, double v, double x) {
        Steel steel = criteria.steel();
        calc.heading("Shear under " + combos.get(c).name());
        IShapeShear.Strength vs = IShapeShear.strength(s, steel.fy(), steel.e(), calc);
        calc.value(criteria.method() == DesignMethod.LRFD ? "Vu" : "Va", v, Quantity.FORCE, "at the "
                + (x == 0 ? "left" : "right") + " support" + " (statics of the simple span)", "");
        return vs;
    }

    private void recordShearRatio(Calc calc, IShapeShear.Strength vs, double vAvail, double v, double ratio) {
        boolean lrfd = criteria.method() == DesignMethod.LRFD;
        calc.eq(lrfd ? "φv·Vn" : "Vn/Ωv", lrfd ? "φv·Vn" : "Vn/Ωv", CLAUSE_G1, vAvail, Quantity.FORCE,
                Arg.num(lrfd ? "φv" : "Ωv", lrfd ? vs.phi() : vs.omega()), Arg.of("Vn", vs.vn(), Quantity.FORCE));
        calc.eq("ratio", "V_req/V_avail", vs.caseA() ? CLAUSE_G2_1_A : CLAUSE_G2_1_B, ratio, Quantity.NUMBER,
                Arg.of("V_req", v, Quantity.FORCE), Arg.of("V_avail", vAvail, Quantity.FORCE));
    }

    /** Live-load deflection under the service live loads against L/n (project criteria, IBC Table 1604.3). */
    private void liveDeflection(Calc calc, Section s, Outcome o) {
        double n = criteria.deflection().live();
        o.active = n > 0;
        if (!o.active) {
            return;
        }
        o.demand = liveDeflectionEi / (criteria.steel().e() * s.props().ix());
        o.capacity = span / n;
        o.ratio = o.demand / o.capacity;
        o.position = liveDeflectionAt;
        recordDeflection(calc, s, "live-load deflection", liveCombination, liveNote, n, o);
    }

    /**
     * Total-load deflection under the service dead and live loads (own weight included) against L/n.
     * When {@code others} is a number (the search), the sum of the two maxima, which bounds the
     * maximum of the sum, is kept instead of the exact value if even the bound does not exceed
     * {@code others}: the exact value could not govern either.
     */
    private void totalDeflection(Calc calc, Section s, double w, double others, double[] m, Outcome o) {
        double n = criteria.deflection().total();
        o.active = n > 0;
        if (!o.active) {
            return;
        }
        double ei = criteria.steel().e() * s.props().ix();
        o.capacity = span / n;
        double bound = (totalDeflectionEi + w * 5 * span * span * span * span / 384) / ei / o.capacity;
        if (bound <= others) {
            o.ratio = bound;
            o.demand = Double.NaN;
            return;
        }
        totalSpan.maxEiDeflectionWithUniform(w, m);
        o.demand = m[0] / ei;
        o.ratio = o.demand / o.capacity;
        o.position = m[1];
        recordDeflection(calc, s, "total-load deflection", w > 0 ? totalCombinationSw : totalCombination, totalNote, n, o);
    }

    private void recordDeflection(Calc calc, Section s, String name, LoadCombination combo, String note, double n, Outcome o) {
        if (calc == null) {
            return;
        }
        calc.heading("Deflection (" + name + ") under " + combo.name() + ", " + note);
        calc.value("Δ", o.demand, Quantity.SECTION_LENGTH, "statics of the simple span with E·Ix, Ix = "
                + "design value of " + s.designation(), "", Arg.of("x", o.position, Quantity.SPAN_LENGTH));
        calc.eq("Δ_allow", "L/n", DeflectionLimits.SOURCE, o.capacity, Quantity.SECTION_LENGTH,
                Arg.of("L", span, Quantity.SPAN_LENGTH), Arg.num("n", n));
        calc.eq("ratio", "Δ/Δ_allow", DeflectionLimits.SOURCE, o.ratio, Quantity.NUMBER,
                Arg.of("Δ", o.demand, Quantity.SECTION_LENGTH), Arg.of("Δ_allow", o.capacity, Quantity.SECTION_LENGTH));
    }

    /** The check record of an outcome. */
    private Check toCheck(Outcome o, Strengths st, double w) {
        return switch (o.kind) {
            case FLEXURE -> new Check("flexure", o.demand, o.capacity, o.ratio, combos.get(o.combination),
                    flexureClause(st.flexure()), Quantity.MOMENT, o.position,
                    criteria.bracing().isContinuous() ? null : segments[o.segment], o.lb, o.lb == 0 ? Double.NaN : o.cb,
                    !st.flexure().webCompact() ? "noncompact web: AISC 360-16 F4 not implemented"
                            : bounds.length > 2 ? segments[o.segment].label() : "");
            case SHEAR -> new Check("shear", o.demand, o.capacity, o.ratio, combos.get(o.combination),
                    st.shear().caseA() ? CLAUSE_G2_1_A : CLAUSE_G2_1_B, Quantity.FORCE, o.position, null, Double.NaN,
                    Double.NaN, (o.position == 0 ? "left" : "right") + " support");
            case LIVE -> new Check("live-load deflection", o.demand, o.capacity, o.ratio, liveCombination,
                    DeflectionLimits.SOURCE, Quantity.SECTION_LENGTH, o.position, null, Double.NaN, Double.NaN, liveNote);
            default -> new Check("total-load deflection", o.demand, o.capacity, o.ratio,
                    w > 0 ? totalCombinationSw : totalCombination, DeflectionLimits.SOURCE, Quantity.SECTION_LENGTH,
                    o.position, null, Double.NaN, Double.NaN, totalNote);
        };
    }

    /** The moment of combination {@code c} at {@code x} including a self-weight {@code w} (N/m, unfactored). */
    private double moment(int c, double w, double x) {
        return comboSpans[c].moment(x) + comboDeadFactor[c] * w * x * (span - x) / 2;
    }

    /**
     * Maximum moment on [a, b] of a concave moment diagram (all loads downward): at the single point
     * of zero shear when it lies inside, otherwise at the end nearer to it. Writes value and position.
     */
    private void maxMoment(int c, double w, double a, double b, double[] out) {
        double k = comboDeadFactor[c] * w;
        comboSpans[c].maxMomentWithUniform(k, out);
        if (a == 0 && b == span) {
            return;
        }
        double x = out[1];
        if (x < a) {
            out[0] = moment(c, w, a);
            out[1] = a;
        } else if (x > b) {
            out[0] = moment(c, w, b);
            out[1] = b;
        }
    }
}
