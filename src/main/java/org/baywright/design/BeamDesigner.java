package org.baywright.design;

import java.util.ArrayList;
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
    private final SimpleSpan liveSpan;
    private final SimpleSpan totalSpan;
    private final double liveDeflectionEi;
    private final double liveDeflectionAt;
    private final double totalDeflectionEi;
    private final String liveName;
    private final String totalName;
    private final String totalNameSw;
    private final String liveNote;
    private final String totalNote;
    private final String[] segmentNotes;

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
        this.liveSpan = SimpleSpan.combine(new double[] {0, 1, 1, 1}, caseSpans);
        this.totalSpan = SimpleSpan.combine(new double[] {1, 1, 1, 1}, caseSpans);
        org.baywright.analysis.Extreme ld = liveSpan.maxDeflection(1.0);
        this.liveDeflectionEi = ld.value();
        this.totalDeflectionEi = totalSpan.maxDeflection(1.0).value();
        this.liveDeflectionAt = ld.position();
        StringBuilder ln = new StringBuilder();
        for (LoadCase c : new LoadCase[] {LoadCase.L, LoadCase.LR, LoadCase.S}) {
            if (present.contains(c)) {
                ln.append(ln.length() == 0 ? "" : " + ").append(c.symbol());
            }
        }
        this.liveName = ln.length() == 0 ? "L" : ln.toString();
        this.totalName = "D + " + liveName;
        this.totalNameSw = totalName + " + self-weight";
        this.liveNote = limitNote(criteria.deflection().live());
        this.totalNote = limitNote(criteria.deflection().total());
        this.segmentNotes = new String[bounds.length - 1];
        for (int i = 0; i < segmentNotes.length; i++) {
            segmentNotes[i] = "segment " + (i + 1) + " of " + segmentNotes.length;
        }
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

    /** The check with the highest ratio. */
    public static Check governing(List<Check> checks) {
        Check g = null;
        for (Check c : checks) {
            if (g == null || c.ratio() > g.ratio() || Double.isNaN(c.ratio())) {
                g = c;
            }
        }
        return g;
    }

    /** Searches {@code catalog} for the lightest section that passes every check. */
    public BeamDesign search(Catalog catalog, SearchFilter filter) {
        List<Rejection> rejected = new ArrayList<>();
        Steel steel = criteria.steel();
        Section best = null;
        double bestRatio = Double.POSITIVE_INFINITY;
        int candidates = 0;
        for (Section s : catalog.sections()) {
            if (!filter.allows(s)) {
                continue;
            }
            candidates++;
            Strengths st = strengths(s, steel);
            IShapeFlexure.Constants k = st.flexure();
            IShapeShear.Strength vs = st.shear();
            int g = evaluate(s, k, vs, false);
            if (ratio[g] <= 1.0 + 1e-9) {
                return new BeamDesign(MemberStatus.SIZED, s, check(s, null), rejected, candidates);
            }
            rejected.add(new Rejection(s, toCheck(g, k, vs, criteria.selfWeight() ? s.weight() : 0)));
            if (ratio[g] < bestRatio) {
                bestRatio = ratio[g];
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
        return new BeamDesign(governing(checks).passes() ? MemberStatus.FIXED_SIZE : MemberStatus.OVERSTRESSED, s,
                checks, List.of(), 1);
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
        if (a == 0 && b == span) {
            comboSpans[c].maxMomentWithUniform(k, out);
            return;
        }
        comboSpans[c].maxMomentWithUniform(k, out);
        double x = out[1];
        if (x < a) {
            out[0] = moment(c, w, a);
            out[1] = a;
        } else if (x > b) {
            out[0] = moment(c, w, b);
            out[1] = b;
        }
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

    // Scratch results of the last evaluation (a designer serves one thread).
    private static final int FLEX = 0;
    private static final int SHEAR = 1;
    private static final int LIVE = 2;
    private static final int TOTAL = 3;
    private final double[] demand = new double[4];
    private final double[] capacity = new double[4];
    private final double[] ratio = new double[4];
    private final double[] position = new double[4];
    private final int[] combo = new int[4];
    private final boolean[] active = new boolean[4];
    private double flexLb;
    private double flexCb;
    private int flexSeg;
    private final double[] tmp = new double[2];

    /**
     * Evaluates every check of {@code s} into the scratch arrays, with plain arithmetic (the hot path
     * of the search). Returns the index of the governing check.
     */
    private int evaluate(Section s, IShapeFlexure.Constants k, IShapeShear.Strength vs, boolean exact) {
        Steel steel = criteria.steel();
        DesignMethod method = criteria.method();
        double w = criteria.selfWeight() ? s.weight() : 0;
        boolean continuous = criteria.bracing().isContinuous();

        // Flexure, every combination and unbraced segment
        ratio[FLEX] = -1;
        active[FLEX] = true;
        double mnBraced = continuous ? IShapeFlexure.mn(k, 0, 1, null) : Double.NaN;
        for (int c = 0; c < combos.size(); c++) {
            for (int seg = 0; seg + 1 < bounds.length; seg++) {
                double a = bounds[seg];
                double b = bounds[seg + 1];
                maxMoment(c, w, a, b, tmp);
                double lb = continuous ? 0 : b - a;
                double cb = 1.0;
                double mn;
                if (continuous) {
                    mn = mnBraced;
                } else {
                    double q = (b - a) / 4;
                    cb = BendingCoefficient.cb(tmp[0], moment(c, w, a + q), moment(c, w, a + 2 * q),
                            moment(c, w, a + 3 * q), null);
                    mn = IShapeFlexure.mn(k, lb, cb, null);
                }
                double avail = method.available(mn, ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B);
                double r = Double.isNaN(mn) ? Double.POSITIVE_INFINITY : Math.abs(tmp[0]) / avail;
                if (r > ratio[FLEX]) {
                    ratio[FLEX] = r;
                    demand[FLEX] = Math.abs(tmp[0]);
                    capacity[FLEX] = avail;
                    position[FLEX] = tmp[1];
                    combo[FLEX] = c;
                    flexLb = lb;
                    flexCb = cb;
                    flexSeg = seg;
                }
            }
        }

        // Shear: with downward loads the largest shear is at a support
        double vAvail = method.available(vs.vn(), vs.phi(), vs.omega());
        ratio[SHEAR] = -1;
        active[SHEAR] = true;
        for (int c = 0; c < combos.size(); c++) {
            double sw = comboDeadFactor[c] * w * span / 2;
            double r1 = Math.abs(comboSpans[c].leftReaction() + sw);
            double r2 = Math.abs(comboSpans[c].rightReaction() + sw);
            double v = Math.max(r1, r2);
            if (v / vAvail > ratio[SHEAR]) {
                ratio[SHEAR] = v / vAvail;
                demand[SHEAR] = v;
                capacity[SHEAR] = vAvail;
                position[SHEAR] = r1 >= r2 ? 0 : span;
                combo[SHEAR] = c;
            }
        }

        // Deflections under service loads (project criteria)
        double ei = steel.e() * s.props().ix();
        DeflectionLimits dl = criteria.deflection();
        active[LIVE] = dl.live() > 0;
        if (active[LIVE]) {
            demand[LIVE] = liveDeflectionEi / ei;
            capacity[LIVE] = span / dl.live();
            ratio[LIVE] = demand[LIVE] / capacity[LIVE];
            position[LIVE] = liveDeflectionAt;
        }
        active[TOTAL] = dl.total() > 0;
        if (active[TOTAL]) {
            capacity[TOTAL] = span / dl.total();
            if (!exact) {
                // The sum of the two maxima bounds the maximum of the sum. When even that bound does
                // not govern, the exact value cannot either, and the search needs only the governing check.
                double bound = (totalDeflectionEi + w * 5 * span * span * span * span / 384) / ei / capacity[TOTAL];
                double others = Math.max(ratio[FLEX], Math.max(ratio[SHEAR], active[LIVE] ? ratio[LIVE] : 0));
                if (bound <= others) {
                    ratio[TOTAL] = bound;
                    demand[TOTAL] = Double.NaN;
                    return governingIndex();
                }
            }
            totalSpan.maxEiDeflectionWithUniform(w, tmp);
            demand[TOTAL] = tmp[0] / ei;
            capacity[TOTAL] = span / dl.total();
            ratio[TOTAL] = demand[TOTAL] / capacity[TOTAL];
            position[TOTAL] = tmp[1];
        }
        return governingIndex();
    }

    private int governingIndex() {
        int g = FLEX;
        for (int i = 1; i < 4; i++) {
            if (active[i] && (ratio[i] > ratio[g] || Double.isNaN(ratio[i]))) {
                g = i;
            }
        }
        return g;
    }

    /** Builds the check record {@code i} of the last evaluation. */
    private Check toCheck(int i, IShapeFlexure.Constants k, IShapeShear.Strength vs, double w) {
        return switch (i) {
            case FLEX -> new Check("flexure", demand[i], capacity[i], ratio[i], combos.get(combo[i]).name(),
                    k.flange() == IShapeFlexure.FlangeClass.COMPACT ? CLAUSE_F2 : CLAUSE_F3, Quantity.MOMENT,
                    position[i], flexLb, flexLb == 0 ? Double.NaN : flexCb,
                    !k.webCompact() ? "noncompact web: AISC 360-16 F4 not implemented"
                            : bounds.length > 2 ? segmentNotes[flexSeg] : "");
            case SHEAR -> new Check("shear", demand[i], capacity[i], ratio[i], combos.get(combo[i]).name(),
                    vs.caseA() ? CLAUSE_G2_1_A : CLAUSE_G2_1_B, Quantity.FORCE, position[i], Double.NaN,
                    Double.NaN, (position[i] == 0 ? "left" : "right") + " support");
            case LIVE -> new Check("live-load deflection", demand[i], capacity[i], ratio[i], liveName,
                    DeflectionLimits.SOURCE, Quantity.SECTION_LENGTH, position[i], Double.NaN, Double.NaN,
                    liveNote);
            default -> new Check("total-load deflection", demand[i], capacity[i], ratio[i],
                    w > 0 ? totalNameSw : totalName, DeflectionLimits.SOURCE, Quantity.SECTION_LENGTH,
                    position[i], Double.NaN, Double.NaN, totalNote);
        };
    }

    /**
     * Every check of {@code s}. With a recorder, also writes the calculation sheet of the section
     * from the same equations.
     */
    public List<Check> check(Section s, Calc calc) {
        Steel steel = criteria.steel();
        Strengths st = strengths(s, steel);
        IShapeFlexure.Constants k = st.flexure();
        IShapeShear.Strength vs = st.shear();
        evaluate(s, k, vs, true);
        double w = criteria.selfWeight() ? s.weight() : 0;
        List<Check> out = new ArrayList<>(4);
        for (int i = 0; i < 4; i++) {
            if (active[i]) {
                out.add(toCheck(i, k, vs, w));
            }
        }
        if (calc != null) {
            record(calc, s, out, w);
        }
        return out;
    }

    /** Writes the calculation sheet of {@code s}, whose checks are {@code checks}. */
    private void record(Calc calc, Section s, List<Check> checks, double w) {
        Steel steel = criteria.steel();
        boolean lrfd = criteria.method() == DesignMethod.LRFD;
        calc.heading("Section " + s.designation());
        calc.value("Fy", steel.fy(), Quantity.STRESS, steel.name(), CLAUSE_A3_1,
                Arg.of("E", steel.e(), Quantity.STRESS));
        calc.value("wsw", w, Quantity.LINE_LOAD, criteria.selfWeight() ? "self-weight: nominal weight of "
                + s.designation() + ", added to D" : "self-weight not added: the dead load is taken to include it", "");
        IShapeFlexure.Constants k = IShapeFlexure.constants(s, steel.fy(), steel.e(), calc);
        Check flex = checks.get(0);
        int c = combos.indexOf(combos.stream().filter(x -> x.name().equals(flex.combination())).findFirst().orElseThrow());
        double lb = Double.isNaN(flex.lb()) ? 0 : flex.lb();
        double a = criteria.bracing().isContinuous() ? 0 : bounds[flexSeg];
        double b = criteria.bracing().isContinuous() ? span : bounds[flexSeg + 1];
        recordFlexure(calc, c, flexSeg, a, b, w, new double[] {flex.demand(), flex.position()}, lb,
                Double.isNaN(flex.cb()) ? 1 : flex.cb(), k, IShapeFlexure.mn(k, lb, Double.isNaN(flex.cb()) ? 1 : flex.cb(), null), lrfd);
        calc.eq("ratio", "M_req/M_avail", flex.clause(), flex.ratio(), Quantity.NUMBER,
                Arg.of("M_req", flex.demand(), Quantity.MOMENT), Arg.of("M_avail", flex.capacity(), Quantity.MOMENT));

        Check shear = checks.get(1);
        calc.heading("Shear under " + shear.combination());
        IShapeShear.Strength vs = IShapeShear.strength(s, steel.fy(), steel.e(), calc);
        calc.value(lrfd ? "Vu" : "Va", shear.demand(), Quantity.FORCE, "at the " + shear.note()
                + " (statics of the simple span)", "");
        calc.eq(lrfd ? "φv·Vn" : "Vn/Ωv", lrfd ? "φv·Vn" : "Vn/Ωv", CLAUSE_G1, shear.capacity(), Quantity.FORCE,
                Arg.num(lrfd ? "φv" : "Ωv", lrfd ? vs.phi() : vs.omega()), Arg.of("Vn", vs.vn(), Quantity.FORCE));
        calc.eq("ratio", "V_req/V_avail", shear.clause(), shear.ratio(), Quantity.NUMBER,
                Arg.of("V_req", shear.demand(), Quantity.FORCE), Arg.of("V_avail", shear.capacity(), Quantity.FORCE));

        for (Check d : checks.subList(2, checks.size())) {
            calc.heading("Deflection (" + d.name() + ") under " + d.combination() + ", " + d.note());
            calc.value("Δ", d.demand(), Quantity.SECTION_LENGTH, "statics of the simple span with E·Ix, Ix = "
                    + "design value of " + s.designation(), "", Arg.of("x", d.position(), Quantity.SPAN_LENGTH));
            double n = d.name().startsWith("live") ? criteria.deflection().live() : criteria.deflection().total();
            calc.eq("Δ_allow", "L/n", DeflectionLimits.SOURCE, d.capacity(), Quantity.SECTION_LENGTH,
                    Arg.of("L", span, Quantity.SPAN_LENGTH), Arg.num("n", n));
            calc.eq("ratio", "Δ/Δ_allow", DeflectionLimits.SOURCE, d.ratio(), Quantity.NUMBER,
                    Arg.of("Δ", d.demand(), Quantity.SECTION_LENGTH), Arg.of("Δ_allow", d.capacity(), Quantity.SECTION_LENGTH));
        }
    }

    private void recordFlexure(Calc calc, int c, int seg, double a, double b, double w, double[] mm, double lb,
            double cb, IShapeFlexure.Constants k, double mn, boolean lrfd) {
        calc.heading("Flexure under " + combos.get(c).name() + " (" + combos.get(c).reference() + ")"
                + (bounds.length > 2 ? ", unbraced segment " + (seg + 1) + " of " + (bounds.length - 1) : ""));
        calc.value(lrfd ? "Mu" : "Ma", mm[0], Quantity.MOMENT, "maximum in the segment (statics of the simple span)", "",
                Arg.of("x", mm[1], Quantity.SPAN_LENGTH));
        calc.value("Lb", lb, Quantity.SPAN_LENGTH, lb == 0 ? "compression flange braced continuously" : "unbraced length", "");
        if (lb > 0) {
            double q = (b - a) / 4;
            BendingCoefficient.cb(mm[0], moment(c, w, a + q), moment(c, w, a + 2 * q), moment(c, w, a + 3 * q), calc);
        }
        IShapeFlexure.mn(k, lb, cb, calc);
        calc.eq(lrfd ? "φb·Mn" : "Mn/Ωb", lrfd ? "φb·Mn" : "Mn/Ωb", CLAUSE_F1,
                criteria.method().available(mn, ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B), Quantity.MOMENT,
                Arg.num(lrfd ? "φb" : "Ωb", lrfd ? ResistanceFactors.PHI_B : ResistanceFactors.OMEGA_B),
                Arg.of("Mn", mn, Quantity.MOMENT));
    }
}
