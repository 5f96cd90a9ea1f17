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
    private static final Map<Steel, Map<Section, IShapeFlexure.Constants>> FLEXURE = new ConcurrentHashMap<>();
    private static final Map<Steel, Map<Section, IShapeShear.Strength>> SHEAR = new ConcurrentHashMap<>();

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
    private final String liveName;
    private final String totalName;

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
        this.liveDeflectionAt = ld.position();
        StringBuilder ln = new StringBuilder();
        for (LoadCase c : new LoadCase[] {LoadCase.L, LoadCase.LR, LoadCase.S}) {
            if (present.contains(c)) {
                ln.append(ln.length() == 0 ? "" : " + ").append(c.symbol());
            }
        }
        this.liveName = ln.length() == 0 ? "L" : ln.toString();
        this.totalName = "D + " + liveName;
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
        Section best = null;
        List<Check> bestChecks = null;
        double bestRatio = Double.POSITIVE_INFINITY;
        int candidates = 0;
        for (Section s : catalog.sections()) {
            if (!filter.allows(s)) {
                continue;
            }
            candidates++;
            List<Check> checks = check(s, null);
            Check g = governing(checks);
            if (g.passes()) {
                return new BeamDesign(MemberStatus.SIZED, s, checks, rejected, candidates);
            }
            rejected.add(new Rejection(s, g));
            if (g.ratio() < bestRatio) {
                bestRatio = g.ratio();
                best = s;
                bestChecks = checks;
            }
        }
        if (best == null) {
            return new BeamDesign(MemberStatus.OVERSTRESSED, null, List.of(), rejected, 0);
        }
        return new BeamDesign(MemberStatus.OVERSTRESSED, best, bestChecks, rejected, candidates);
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

    private double shear(int c, double w, double x) {
        return comboSpans[c].shear(x) + comboDeadFactor[c] * w * (span / 2 - x);
    }

    /** Maximum moment on [a, b] of a concave moment diagram: at the zero-shear point or an end. */
    private double[] maxMoment(int c, double w, double a, double b) {
        if (shear(c, w, a) <= 0) {
            return new double[] {moment(c, w, a), a};
        }
        // shear just left of b: evaluate slightly inside
        double bl = Math.nextDown(b);
        if (shear(c, w, bl) >= 0) {
            return new double[] {moment(c, w, b), b};
        }
        double lo = a;
        double hi = b;
        for (int i = 0; i < 200 && Math.nextUp(lo) < hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (shear(c, w, mid) > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double mLo = moment(c, w, lo);
        double mHi = moment(c, w, hi);
        return mLo >= mHi ? new double[] {mLo, lo} : new double[] {mHi, hi};
    }

    /** Maximum of a concave (unimodal) deflection curve δ(x)·EI including a self-weight w. */
    private double[] maxTotalDeflectionEi(double w) {
        double lo = 0;
        double hi = span;
        final double g = (Math.sqrt(5) - 1) / 2;
        double x1 = hi - g * (hi - lo);
        double x2 = lo + g * (hi - lo);
        double f1 = totalDeflEi(w, x1);
        double f2 = totalDeflEi(w, x2);
        for (int i = 0; i < 80; i++) {
            if (f1 < f2) {
                lo = x1;
                x1 = x2;
                f1 = f2;
                x2 = lo + g * (hi - lo);
                f2 = totalDeflEi(w, x2);
            } else {
                hi = x2;
                x2 = x1;
                f2 = f1;
                x1 = hi - g * (hi - lo);
                f1 = totalDeflEi(w, x1);
            }
        }
        return f1 >= f2 ? new double[] {f1, x1} : new double[] {f2, x2};
    }

    private double totalDeflEi(double w, double x) {
        double udl = w * x * (span * span * span - 2 * span * x * x + x * x * x) / 24;
        return totalSpan.deflection(x, 1.0) + udl;
    }

    private static IShapeFlexure.Constants flexureConstants(Section s, Steel steel) {
        return FLEXURE.computeIfAbsent(steel, k -> new ConcurrentHashMap<>())
                .computeIfAbsent(s, k -> IShapeFlexure.constants(k, steel.fy(), steel.e(), null));
    }

    private static IShapeShear.Strength shearStrength(Section s, Steel steel) {
        return SHEAR.computeIfAbsent(steel, k -> new ConcurrentHashMap<>())
                .computeIfAbsent(s, k -> IShapeShear.strength(k, steel.fy(), steel.e(), null));
    }

    /**
     * Every check of {@code s}. With a recorder, writes the calculation sheet of the section from the
     * same equations.
     */
    public List<Check> check(Section s, Calc calc) {
        Steel steel = criteria.steel();
        DesignMethod method = criteria.method();
        boolean lrfd = method == DesignMethod.LRFD;
        double w = criteria.selfWeight() ? s.weight() : 0;
        List<Check> out = new ArrayList<>(4);

        if (calc != null) {
            calc.heading("Section " + s.designation());
            calc.value("Fy", steel.fy(), Quantity.STRESS, steel.name(), "", Arg.of("E", steel.e(), Quantity.STRESS));
            calc.value("wsw", w, Quantity.LINE_LOAD, "self-weight: nominal weight of " + s.designation(), "");
            if (!criteria.selfWeight()) {
                calc.note("self-weight not added: the dead load is taken to include it", "");
            }
        }

        // Flexure
        IShapeFlexure.Constants k = calc == null ? flexureConstants(s, steel)
                : IShapeFlexure.constants(s, steel.fy(), steel.e(), calc);
        double phiB = ResistanceFactors.PHI_B;
        double omegaB = ResistanceFactors.OMEGA_B;
        Check flex = null;
        for (int c = 0; c < combos.size(); c++) {
            for (int seg = 0; seg + 1 < bounds.length; seg++) {
                double a = bounds[seg];
                double b = bounds[seg + 1];
                double[] mm = maxMoment(c, w, a, b);
                double lb = criteria.bracing().isContinuous() ? 0 : b - a;
                double cb = 1.0;
                if (lb > 0) {
                    double q = (b - a) / 4;
                    cb = BendingCoefficient.cb(mm[0], moment(c, w, a + q), moment(c, w, a + 2 * q),
                            moment(c, w, a + 3 * q), null);
                }
                double mn = IShapeFlexure.mn(k, lb, cb, null);
                double avail = method.available(mn, phiB, omegaB);
                double ratio = Double.isNaN(mn) ? Double.POSITIVE_INFINITY : mm[0] / avail;
                if (flex == null || ratio > flex.ratio()) {
                    String note = (bounds.length > 2 ? "segment " + (seg + 1) + " of " + (bounds.length - 1) : "")
                            + (Double.isNaN(mn) ? "noncompact web: AISC 360-16 F4 not implemented" : "");
                    flex = new Check("flexure", mm[0], avail, ratio, combos.get(c).name(),
                            Aisc360.clause(k.flange() == IShapeFlexure.FlangeClass.COMPACT ? "F2" : "F3"),
                            Quantity.MOMENT, mm[1], lb, lb == 0 ? Double.NaN : cb, note);
                    if (calc != null) {
                        recordFlexure(calc, c, seg, a, b, w, mm, lb, cb, k, mn, lrfd);
                    }
                }
            }
        }
        if (calc != null) {
            calc.eq("ratio", "M_req/M_avail", flex.clause(), flex.ratio(), Quantity.NUMBER,
                    Arg.of("M_req", flex.demand(), Quantity.MOMENT), Arg.of("M_avail", flex.capacity(), Quantity.MOMENT));
        }
        out.add(flex);

        // Shear: with downward loads the largest shear is at a support
        IShapeShear.Strength vs = calc == null ? shearStrength(s, steel) : IShapeShear.strength(s, steel.fy(), steel.e(), calc);
        double vAvail = method.available(vs.vn(), vs.phi(), vs.omega());
        Check shear = null;
        for (int c = 0; c < combos.size(); c++) {
            double sw = comboDeadFactor[c] * w * span / 2;
            double r1 = comboSpans[c].leftReaction() + sw;
            double r2 = comboSpans[c].rightReaction() + sw;
            double v = Math.max(Math.abs(r1), Math.abs(r2));
            double ratio = v / vAvail;
            if (shear == null || ratio > shear.ratio()) {
                boolean left = Math.abs(r1) >= Math.abs(r2);
                shear = new Check("shear", v, vAvail, ratio, combos.get(c).name(),
                        Aisc360.clause(vs.caseA() ? "G2.1(a)" : "G2.1(b)"), Quantity.FORCE, left ? 0 : span, Double.NaN,
                        Double.NaN, (left ? "left" : "right") + " support");
            }
        }
        if (calc != null) {
            calc.value(lrfd ? "Vu" : "Va", shear.demand(), Quantity.FORCE, "under " + shear.combination() + ", at the "
                    + shear.note() + " (statics of the simple span)", "");
            String sym = lrfd ? "φv·Vn" : "Vn/Ωv";
            calc.eq(sym, lrfd ? "φv·Vn" : "Vn/Ωv", Aisc360.clause(lrfd ? "G1" : "G1"), vAvail, Quantity.FORCE,
                    Arg.num(lrfd ? "φv" : "Ωv", lrfd ? vs.phi() : vs.omega()), Arg.of("Vn", vs.vn(), Quantity.FORCE));
            calc.eq("ratio", "V_req/V_avail", shear.clause(), shear.ratio(), Quantity.NUMBER,
                    Arg.of("V_req", shear.demand(), Quantity.FORCE), Arg.of("V_avail", vAvail, Quantity.FORCE));
        }
        out.add(shear);

        // Deflection (service loads; project criteria)
        double ei = steel.e() * s.props().ix();
        DeflectionLimits dl = criteria.deflection();
        if (dl.live() > 0) {
            double delta = liveDeflectionEi / ei;
            double allow = span / dl.live();
            out.add(new Check("live-load deflection", delta, allow, delta / allow, liveName,
                    DeflectionLimits.SOURCE, Quantity.SECTION_LENGTH, liveDeflectionAt, Double.NaN, Double.NaN,
                    "limit L/" + CalcFormat.sig(dl.live())));
            if (calc != null) {
                calc.value("Δ_live", delta, Quantity.SECTION_LENGTH, "under " + liveName
                        + " (statics of the simple span with E·Ix)", "", Arg.of("x", liveDeflectionAt, Quantity.SPAN_LENGTH));
                calc.eq("Δ_allow", "L/n", DeflectionLimits.SOURCE, allow, Quantity.SECTION_LENGTH,
                        Arg.of("L", span, Quantity.SPAN_LENGTH), Arg.num("n", dl.live()));
            }
        }
        if (dl.total() > 0) {
            double[] t = maxTotalDeflectionEi(w);
            double delta = t[0] / ei;
            double allow = span / dl.total();
            out.add(new Check("total-load deflection", delta, allow, delta / allow, totalName + (w > 0 ? " + self-weight" : ""),
                    DeflectionLimits.SOURCE, Quantity.SECTION_LENGTH, t[1], Double.NaN, Double.NaN,
                    "limit L/" + CalcFormat.sig(dl.total())));
            if (calc != null) {
                calc.value("Δ_total", delta, Quantity.SECTION_LENGTH, "under " + totalName
                        + (w > 0 ? " + self-weight" : "") + " (statics of the simple span with E·Ix)", "",
                        Arg.of("x", t[1], Quantity.SPAN_LENGTH));
                calc.eq("Δ_allow", "L/n", DeflectionLimits.SOURCE, allow, Quantity.SECTION_LENGTH,
                        Arg.of("L", span, Quantity.SPAN_LENGTH), Arg.num("n", dl.total()));
            }
        }
        return out;
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
        calc.eq(lrfd ? "φb·Mn" : "Mn/Ωb", lrfd ? "φb·Mn" : "Mn/Ωb", Aisc360.clause("F1"),
                criteria.method().available(mn, ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B), Quantity.MOMENT,
                Arg.num(lrfd ? "φb" : "Ωb", lrfd ? ResistanceFactors.PHI_B : ResistanceFactors.OMEGA_B),
                Arg.of("Mn", mn, Quantity.MOMENT));
    }
}
