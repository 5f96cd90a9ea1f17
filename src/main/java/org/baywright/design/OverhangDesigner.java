package org.baywright.design;

import java.util.ArrayList;
import java.util.List;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.Extreme;
import org.baywright.analysis.OverhangSpan;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.Aisc360;
import org.baywright.design.aisc360.IShapeFlexure;
import org.baywright.design.aisc360.IShapeShear;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;

/**
 * Designs a rolled I-shape beam that overhangs one (or both) of its two supports: a cantilever with a
 * backspan. The statics are those of {@link OverhangSpan} (the general case of the AISC Manual Table
 * 3-23 overhang diagrams).
 *
 * <p>What it checks, for every strength combination and every live-load pattern:
 * <ul>
 *   <li><b>Patterns</b> (ASCE 7-16 §4.3.3, partial loading): the live loads (L, Lr and S together) on
 *       every non-empty set of the member's parts (backspan, each overhang) — for one overhang: on
 *       both, on the backspan only, on the overhang only; the dead load always everywhere. The pattern
 *       that governs is kept on each check.</li>
 *   <li><b>Flexure, sagging</b> in the backspan: the top flange in compression, braced as the member's
 *       bracing says (continuous: Lb = 0; otherwise Lb = backspan with Cb = 1.0).</li>
 *   <li><b>Flexure, hogging</b> over the support: the bottom flange is in compression on the overhang
 *       and near the support. Assumption (stated on the sheet): the deck braces the top flange only;
 *       the bottom flange is braced at the support and nowhere else, so Lb is the longer of the
 *       overhang and the hogging length of the backspan (support to point of inflection), with
 *       Cb = 1.0 (conservative; common practice for cantilevers and overhangs with an unbraced free
 *       end, AISC 360-16 Commentary F1, from memory). The tip is taken as restrained against twist by
 *       the deck and edge framing (common practice); without such restraint the effective length is
 *       longer than the overhang.</li>
 *   <li><b>Shear</b>, G2.1, the largest |V| anywhere (beside the support carrying the overhang).</li>
 *   <li><b>Deflection</b>, live and total: the backspan against l/n, each tip against 2·c/n (IBC Table
 *       1604.3, footnote: for cantilever members l is twice the length of the cantilever; common
 *       practice applies the same ratios).</li>
 * </ul>
 *
 * <p>Known limitations: gravity loads only (the combinations of {@link Combinations#gravity}); the
 * continuity at the support is assumed (a beam passing over its support, or a connection that carries
 * the support moment, designed by others); web local yielding and crippling at the support are not
 * checked.
 */
public final class OverhangDesigner {
    private static final String CLAUSE_F1 = Aisc360.clause("F1");
    private static final String CLAUSE_F2 = Aisc360.clause("F2");
    private static final String CLAUSE_F3 = Aisc360.clause("F3");
    private static final String CLAUSE_G1 = Aisc360.clause("G1");
    private static final String CLAUSE_G2_1_A = Aisc360.clause("G2.1(a)");
    private static final String CLAUSE_G2_1_B = Aisc360.clause("G2.1(b)");
    /** ASCE 7-16 §4.3.3, partial loading. */
    public static final String PATTERN_SOURCE = "ASCE 7-16 §4.3.3";
    /** IBC Table 1604.3, footnote: l = twice the cantilever length. */
    public static final String TIP_SOURCE = "IBC Table 1604.3 (footnote: for cantilevers l = 2 × cantilever length)";
    /** The statement of the bracing and Cb assumption, printed on the sheet. */
    public static final String BRACING_ASSUMPTION = "Hogging over the support puts the bottom flange in compression on the"
            + " overhang and near the support. The deck braces the top flange only; the bottom flange is taken as braced at"
            + " the support and nowhere else: Lb = the longer of the overhang and the backspan's hogging length (support to"
            + " point of inflection), Cb = 1.0 (conservative, common practice for an overhang with an unbraced free end),"
            + " the tip restrained against twist by the deck and edge framing (common practice).";

    private final BeamLoads loads;
    private final BeamCriteria criteria;
    private final double length;
    private final double a;
    private final double b;
    private final List<LoadCombination> combos;
    /** The parts: [from, to] pairs of the start overhang, backspan, end overhang (only those with length). */
    private final List<double[]> parts = new ArrayList<>();
    private final List<String> partNames = new ArrayList<>();
    /** The patterns: bit i set = live load on part i. */
    private final int[] patterns;
    /** Loads of combination c, pattern p, without own weight: [c][p]. */
    private final List<SpanLoad>[][] comboLoads;
    /** Service live loads and dead loads per pattern, for deflection. */
    private final List<SpanLoad>[] liveLoads;
    private final List<SpanLoad> deadLoads;
    private final LoadCombination liveCombination;
    private final LoadCombination totalCombination;

    @SuppressWarnings("unchecked")
    public OverhangDesigner(BeamLoads loads, BeamCriteria criteria) {
        if (!loads.isOverhanging()) {
            throw new IllegalArgumentException("the member does not overhang a support; use BeamDesigner");
        }
        this.loads = loads;
        this.criteria = criteria;
        this.length = loads.span();
        this.a = loads.supportA();
        this.b = loads.supportB();
        if (a > 0) {
            parts.add(new double[] {0, a});
            partNames.add("start overhang");
        }
        parts.add(new double[] {a, b});
        partNames.add("backspan");
        if (b < length) {
            parts.add(new double[] {b, length});
            partNames.add("overhang");
        }
        int n = parts.size();
        this.patterns = new int[(1 << n) - 1];
        // all parts first, then each subset in order of its bits
        patterns[0] = (1 << n) - 1;
        for (int m = 1, i = 1; m < (1 << n) - 1; m++) {
            patterns[i++] = m;
        }
        java.util.Set<LoadCase> present = loads.present();
        this.combos = Combinations.gravity(criteria.method(), present);
        this.comboLoads = new List[combos.size()][patterns.length];
        for (int c = 0; c < combos.size(); c++) {
            for (int p = 0; p < patterns.length; p++) {
                List<SpanLoad> l = new ArrayList<>();
                for (LoadCase lc : LoadCase.values()) {
                    double f = combos.get(c).factor(lc);
                    if (f == 0) {
                        continue;
                    }
                    for (SpanLoad x : lc == LoadCase.D ? loads.of(lc).loads() : restrict(loads.of(lc).loads(), patterns[p])) {
                        l.add(x.scaled(f));
                    }
                }
                comboLoads[c][p] = l;
            }
        }
        this.liveLoads = new List[patterns.length];
        java.util.Map<LoadCase, Double> live = new java.util.EnumMap<>(LoadCase.class);
        for (int p = 0; p < patterns.length; p++) {
            List<SpanLoad> l = new ArrayList<>();
            for (LoadCase lc : new LoadCase[] {LoadCase.L, LoadCase.LR, LoadCase.S}) {
                List<SpanLoad> all = loads.forDeflection(lc).loads();
                if (!all.isEmpty()) {
                    live.put(lc, 1.0);
                }
                l.addAll(restrict(all, patterns[p]));
            }
            liveLoads[p] = l;
        }
        if (live.isEmpty()) {
            live.put(LoadCase.L, 1.0);
        }
        this.deadLoads = loads.forDeflection(LoadCase.D).loads();
        java.util.Map<LoadCase, Double> total = new java.util.EnumMap<>(live);
        total.put(LoadCase.D, 1.0);
        this.liveCombination = new LoadCombination(name(live), live, Combinations.SERVICE_REFERENCE);
        this.totalCombination = new LoadCombination(name(total) + (criteria.selfWeight() ? " + self-weight" : ""), total,
                Combinations.SERVICE_REFERENCE);
    }

    private static String name(java.util.Map<LoadCase, Double> cases) {
        StringBuilder s = new StringBuilder();
        for (LoadCase c : cases.keySet()) {
            s.append(s.length() == 0 ? "" : " + ").append(c.symbol());
        }
        return s.toString();
    }

    /** The parts of the loads lying on the parts of the member that pattern {@code mask} loads. */
    private List<SpanLoad> restrict(List<SpanLoad> all, int mask) {
        if (mask == patterns[0]) {
            return all;
        }
        List<SpanLoad> out = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            if ((mask & (1 << i)) == 0) {
                continue;
            }
            double lo = parts.get(i)[0];
            double hi = parts.get(i)[1];
            boolean backspan = lo == a && hi == b;
            for (SpanLoad x : all) {
                if (x instanceof PointLoad p) {
                    // a point load on a support belongs to the backspan (it goes straight into the support)
                    boolean in = backspan ? p.position() >= lo && p.position() <= hi : p.position() > lo && p.position() < hi
                            || (lo == 0 && p.position() == 0) || (hi == length && p.position() == length);
                    if (in) {
                        out.add(p);
                    }
                } else if (x instanceof DistributedLoad d) {
                    double s = Math.max(lo, d.start());
                    double e = Math.min(hi, d.end());
                    if (e - s > 1e-9) {
                        out.add(new DistributedLoad(s, e, d.intensityAt(s), d.intensityAt(e)));
                    }
                }
            }
        }
        return out;
    }

    /** "on the backspan only", "on the backspan and overhang" (what pattern p loads). */
    public String patternText(int p) {
        int mask = patterns[p];
        if (mask == patterns[0]) {
            return "live load on the whole member";
        }
        List<String> on = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            if ((mask & (1 << i)) != 0) {
                on.add(partNames.get(i));
            }
        }
        return "live load on the " + String.join(" and ", on) + " only";
    }

    public BeamLoads loads() {
        return loads;
    }

    public BeamCriteria criteria() {
        return criteria;
    }

    /** The number of live-load patterns (3 for a member overhanging one support). */
    public int patternCount() {
        return patterns.length;
    }

    /** The statics of combination {@code c} under pattern {@code p}, with own weight {@code w} (N/m, unfactored). */
    public OverhangSpan statics(int c, int p, double w) {
        List<SpanLoad> l = comboLoads[c][p];
        double f = combos.get(c).factor(LoadCase.D) * w;
        return OverhangSpan.of(length, a, b, f == 0 ? l : plus(l, DistributedLoad.full(length, f)));
    }

    /** The service statics of pattern p: live loads only ({@code dead = false}) or with the dead load and own weight w. */
    public OverhangSpan service(int p, boolean dead, double w) {
        List<SpanLoad> l = new ArrayList<>(liveLoads[p]);
        if (dead) {
            l.addAll(deadLoads);
            if (w != 0) {
                l.add(DistributedLoad.full(length, w));
            }
        }
        return OverhangSpan.of(length, a, b, l);
    }

    private static List<SpanLoad> plus(List<SpanLoad> l, SpanLoad x) {
        List<SpanLoad> out = new ArrayList<>(l.size() + 1);
        out.addAll(l);
        out.add(x);
        return out;
    }

    public List<LoadCombination> combinations() {
        return combos;
    }

    private double selfWeight(Section s) {
        return criteria.selfWeight() ? s.weight() : 0;
    }

    /** The lightest section allowed by {@code filter} that passes every check. */
    public BeamDesign search(Catalog catalog, SearchFilter filter) {
        List<Rejection> rejected = new ArrayList<>();
        Section best = null;
        double bestRatio = Double.POSITIVE_INFINITY;
        int candidates = 0;
        for (Section s : catalog.sections()) {
            if (!filter.allows(s)) {
                continue;
            }
            candidates++;
            List<Check> checks = check(s, null);
            Check g = Check.governing(checks);
            if (g.passes()) {
                return new BeamDesign(MemberStatus.SIZED, s, checks, rejected, candidates);
            }
            rejected.add(new Rejection(s, g));
            if (g.ratio() < bestRatio) {
                bestRatio = g.ratio();
                best = s;
            }
        }
        if (best == null) {
            return new BeamDesign(MemberStatus.OVERSTRESSED, null, List.of(), rejected, 0);
        }
        return new BeamDesign(MemberStatus.OVERSTRESSED, best, check(best, null), rejected, candidates);
    }

    /** Checks a section the user chose. */
    public BeamDesign checkFixed(Section s) {
        List<Check> checks = check(s, null);
        return new BeamDesign(Check.governing(checks).passes() ? MemberStatus.FIXED_SIZE : MemberStatus.OVERSTRESSED, s,
                checks, List.of(), 1);
    }

    /**
     * Every check of {@code s}: flexure sagging and hogging, shear, live and total deflection, each for
     * its governing combination and pattern. With a recorder, writes the sheet: the member's geometry,
     * the statics of each governing case and the checks, from the same functions.
     */
    public List<Check> check(Section s, Calc calc) {
        Steel steel = criteria.steel();
        double w = selfWeight(s);
        IShapeFlexure.Constants k = IShapeFlexure.constants(s, steel.fy(), steel.e(), null);
        IShapeShear.Strength vs = IShapeShear.strength(s, steel.fy(), steel.e(), null);
        int nc = combos.size();
        int np = patterns.length;
        double[] sag = new double[2];
        double[] hog = new double[2];
        double[] shear = new double[2];
        sag[0] = -1;
        hog[0] = -1;
        shear[0] = -1;
        for (int c = 0; c < nc; c++) {
            for (int p = 0; p < np; p++) {
                OverhangSpan o = statics(c, p, w);
                double ms = o.extremeMoment(a, b, false).value();
                double mh = -o.extremeMoment(0, length, true).value();
                double v = o.maxShear().value();
                keep(sag, ms, c * np + p);
                keep(hog, mh, c * np + p);
                keep(shear, v, c * np + p);
            }
        }
        List<Check> out = new ArrayList<>(6);
        if (calc != null) {
            recordSection(calc, s, w, k);
        }
        out.add(sagging(calc, k, w, (int) sag[1] / np, (int) sag[1] % np));
        out.add(hogging(calc, k, w, (int) hog[1] / np, (int) hog[1] % np));
        out.add(shear(calc, s, vs, w, (int) shear[1] / np, (int) shear[1] % np));
        double ei = steel.e() * s.props().ix();
        Check live = deflection(calc, s, ei, false, 0);
        if (live != null) {
            out.add(live);
        }
        Check total = deflection(calc, s, ei, true, w);
        if (total != null) {
            out.add(total);
        }
        return out;
    }

    private static void keep(double[] best, double value, int index) {
        if (value > best[0]) {
            best[0] = value;
            best[1] = index;
        }
    }

    private void recordSection(Calc calc, Section s, double w, IShapeFlexure.Constants k) {
        Steel steel = criteria.steel();
        calc.heading("Overhanging beam " + s.designation() + ": member on two supports with an overhang");
        calc.value("L", length, Quantity.SPAN_LENGTH, "member length", "");
        calc.value("l", b - a, Quantity.SPAN_LENGTH, "backspan, between the supports", "");
        if (a > 0) {
            calc.value("c1", a, Quantity.SPAN_LENGTH, "overhang beyond the first support (at the start)", "");
        }
        if (b < length) {
            calc.value("c", length - b, Quantity.SPAN_LENGTH, "overhang beyond the second support (at the end)", "");
        }
        calc.note("Statics of a beam overhanging its support (AISC Manual Table 3-23, overhang cases, solved for the"
                + " actual loads). Live loads L, Lr and S patterned on the backspan only, the overhang only and both; the"
                + " pattern that governs is named on each check.", PATTERN_SOURCE);
        calc.note(BRACING_ASSUMPTION, CLAUSE_F1);
        calc.value("Fy", steel.fy(), Quantity.STRESS, steel.name(), Aisc360.clause("A3.1"), Arg.of("E", steel.e(), Quantity.STRESS));
        calc.value("wsw", w, Quantity.LINE_LOAD, criteria.selfWeight() ? "self-weight: nominal weight of "
                + s.designation() + ", added to D" : "self-weight not added: the dead load is taken to include it", "");
        IShapeFlexure.constants(s, steel.fy(), steel.e(), calc);
    }

    /** Records the reactions of one governing case and the uplift at the far support when there is any. */
    private void recordStatics(Calc calc, OverhangSpan o, int c, int p) {
        boolean lrfd = criteria.method() == DesignMethod.LRFD;
        String f = lrfd ? "u" : "a";
        calc.value("R" + f + "1", o.reactionA(), Quantity.FORCE, "reaction at the first support"
                + (o.reactionA() < 0 ? ": uplift, the support must hold the member down" : ""), "");
        calc.value("R" + f + "2", o.reactionB(), Quantity.FORCE, "reaction at the second support", "");
        calc.value("ΣP", o.totalLoad(), Quantity.FORCE, "total load on the member (R1 + R2; a reaction beside an overhang"
                + " exceeds the load between the supports)", "");
    }

    private String flexureClause(IShapeFlexure.Constants k) {
        return k.flange() == IShapeFlexure.FlangeClass.COMPACT ? CLAUSE_F2 : CLAUSE_F3;
    }

    /** Sagging moment in the backspan under combination c and pattern p. */
    private Check sagging(Calc calc, IShapeFlexure.Constants k, double w, int c, int p) {
        OverhangSpan o = statics(c, p, w);
        Extreme m = o.extremeMoment(a, b, false);
        double mu = Math.max(0, m.value());
        boolean continuous = criteria.bracing().isContinuous();
        double lb = continuous ? 0 : b - a;
        if (calc != null) {
            calc.heading("Flexure, sagging in the backspan, under " + combos.get(c).name() + ", " + patternText(p));
            recordStatics(calc, o, c, p);
            calc.value(criteria.method() == DesignMethod.LRFD ? "Mu" : "Ma", mu, Quantity.MOMENT,
                    "largest sagging moment in the backspan (top flange in compression)", "", Arg.of("x", m.position(), Quantity.SPAN_LENGTH));
            calc.value("Lb", lb, Quantity.SPAN_LENGTH, continuous ? "top flange braced continuously by the deck"
                    : "top flange braced at the supports only; Cb = 1.0 (conservative)", "");
        }
        return flexure("flexure", k, mu, lb, 1.0, c, p, m.position(), calc,
                "sagging in the backspan, " + patternText(p) + " (" + PATTERN_SOURCE + ")");
    }

    /** Hogging moment over the support under combination c and pattern p. */
    private Check hogging(Calc calc, IShapeFlexure.Constants k, double w, int c, int p) {
        OverhangSpan o = statics(c, p, w);
        Extreme m = o.extremeMoment(0, length, true);
        double mu = -Math.min(0, m.value());
        double lb = Math.max(Math.max(a, length - b), hoggingLength(o));
        if (calc != null) {
            calc.heading("Flexure, hogging over the support, under " + combos.get(c).name() + ", " + patternText(p));
            recordStatics(calc, o, c, p);
            calc.value(criteria.method() == DesignMethod.LRFD ? "Mu" : "Ma", mu, Quantity.MOMENT,
                    "largest hogging moment (over the support; bottom flange in compression)", "",
                    Arg.of("x", m.position(), Quantity.SPAN_LENGTH));
            calc.value("Lb", lb, Quantity.SPAN_LENGTH, "bottom flange braced at the support only: the longer of the overhang"
                    + " and the backspan's hogging length", "");
            calc.value("Cb", 1.0, Quantity.NUMBER, "taken as 1.0 for the overhang (conservative, common practice)", CLAUSE_F1);
        }
        return flexure("flexure", k, mu, lb, 1.0, c, p, m.position(), calc,
                "hogging over the support, bottom flange Lb = " + CalcFormat.sig(lb) + " m, Cb = 1.0; " + patternText(p)
                        + " (" + PATTERN_SOURCE + ")");
    }

    /** The longest distance from a support into the backspan over which the moment stays hogging. */
    private double hoggingLength(OverhangSpan o) {
        double best = 0;
        int n = 64;
        if (b < length) {
            best = Math.max(best, b - firstSign(o, b, a, n));
        }
        if (a > 0) {
            best = Math.max(best, firstSign(o, a, b, n) - a);
        }
        return Math.abs(best);
    }

    /** From {@code from} towards {@code to}: where the moment first stops being negative (or {@code to}). */
    private static double firstSign(OverhangSpan o, double from, double to, int n) {
        double prev = from;
        for (int i = 1; i <= n; i++) {
            double x = from + (to - from) * i / n;
            if (o.moment(x) >= 0) {
                double lo = prev;
                double hi = x;
                for (int it = 0; it < 50; it++) {
                    double mid = 0.5 * (lo + hi);
                    if (o.moment(mid) < 0) {
                        lo = mid;
                    } else {
                        hi = mid;
                    }
                }
                return 0.5 * (lo + hi);
            }
            prev = x;
        }
        return to;
    }

    private Check flexure(String name, IShapeFlexure.Constants k, double mu, double lb, double cb, int c, int p, double x,
            Calc calc, String note) {
        double mn = IShapeFlexure.mn(k, lb, cb, calc);
        double avail = criteria.method().available(mn, ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B);
        double ratio = Double.isNaN(mn) ? Double.POSITIVE_INFINITY : mu / avail;
        if (calc != null) {
            boolean lrfd = criteria.method() == DesignMethod.LRFD;
            calc.eq(lrfd ? "φb·Mn" : "Mn/Ωb", lrfd ? "φb·Mn" : "Mn/Ωb", CLAUSE_F1, avail, Quantity.MOMENT,
                    Arg.num(lrfd ? "φb" : "Ωb", lrfd ? ResistanceFactors.PHI_B : ResistanceFactors.OMEGA_B),
                    Arg.of("Mn", mn, Quantity.MOMENT));
            calc.eq("ratio", "M_req/M_avail", flexureClause(k), ratio, Quantity.NUMBER,
                    Arg.of("M_req", mu, Quantity.MOMENT), Arg.of("M_avail", avail, Quantity.MOMENT));
        }
        return new Check(name, mu, avail, ratio, combos.get(c), flexureClause(k), Quantity.MOMENT, x, null, lb,
                lb == 0 ? Double.NaN : cb, !k.webCompact() ? "noncompact web: AISC 360-16 F4 not implemented" : note);
    }

    private Check shear(Calc calc, Section s, IShapeShear.Strength vs, double w, int c, int p) {
        OverhangSpan o = statics(c, p, w);
        Extreme e = o.maxShear();
        if (calc != null) {
            Steel steel = criteria.steel();
            calc.heading("Shear under " + combos.get(c).name() + ", " + patternText(p));
            vs = IShapeShear.strength(s, steel.fy(), steel.e(), calc);
            calc.value(criteria.method() == DesignMethod.LRFD ? "Vu" : "Va", e.value(), Quantity.FORCE,
                    "largest shear, beside a support (statics of the overhanging beam)", "", Arg.of("x", e.position(), Quantity.SPAN_LENGTH));
        }
        double avail = criteria.method().available(vs.vn(), vs.phi(), vs.omega());
        double ratio = e.value() / avail;
        String clause = vs.caseA() ? CLAUSE_G2_1_A : CLAUSE_G2_1_B;
        if (calc != null) {
            boolean lrfd = criteria.method() == DesignMethod.LRFD;
            calc.eq(lrfd ? "φv·Vn" : "Vn/Ωv", lrfd ? "φv·Vn" : "Vn/Ωv", CLAUSE_G1, avail, Quantity.FORCE,
                    Arg.num(lrfd ? "φv" : "Ωv", lrfd ? vs.phi() : vs.omega()), Arg.of("Vn", vs.vn(), Quantity.FORCE));
            calc.eq("ratio", "V_req/V_avail", clause, ratio, Quantity.NUMBER, Arg.of("V_req", e.value(), Quantity.FORCE),
                    Arg.of("V_avail", avail, Quantity.FORCE));
        }
        return new Check("shear", e.value(), avail, ratio, combos.get(c), clause, Quantity.FORCE, e.position(), null, Double.NaN,
                Double.NaN, patternText(p) + " (" + PATTERN_SOURCE + ")");
    }

    /**
     * Live ({@code total = false}) or total deflection: the largest ratio over the patterns of the backspan
     * against l/n and of each tip against 2·c/n (IBC Table 1604.3 and its footnote).
     */
    private Check deflection(Calc calc, Section s, double ei, boolean total, double w) {
        double n = total ? criteria.deflection().total() : criteria.deflection().live();
        if (!(n > 0)) {
            return null;
        }
        double bestRatio = -1;
        double demand = 0;
        double capacity = 0;
        double where = 0;
        int bestP = 0;
        boolean bestTip = false;
        for (int p = 0; p < patterns.length; p++) {
            OverhangSpan o = service(p, total, w);
            Extreme back = o.extremeEiDeflection(a, b);
            double[][] cands = new double[3][];
            cands[0] = new double[] {Math.abs(back.value()) / ei, (b - a) / n, back.position(), 0};
            if (a > 0) {
                cands[1] = new double[] {Math.abs(o.deflection(0, ei)), 2 * a / n, 0, 1};
            }
            if (b < length) {
                cands[2] = new double[] {Math.abs(o.deflection(length, ei)), 2 * (length - b) / n, length, 2};
            }
            for (double[] cd : cands) {
                if (cd != null && cd[0] / cd[1] > bestRatio) {
                    bestRatio = cd[0] / cd[1];
                    demand = cd[0];
                    capacity = cd[1];
                    where = cd[2];
                    bestP = p;
                    bestTip = cd[3] != 0;
                }
            }
        }
        String bestWhat = !bestTip ? "backspan, limit l/" + CalcFormat.sig(n)
                : "tip of the overhang, limit 2·c/" + CalcFormat.sig(n) + " (l = 2 × cantilever length)";
        LoadCombination combo = total ? totalCombination : liveCombination;
        String name = total ? "total-load deflection" : "live-load deflection";
        boolean tip = where == 0 && a > 0 || where == length && b < length;
        if (calc != null) {
            calc.heading("Deflection (" + name + ") under " + combo.name() + ", " + patternText(bestP) + ": " + bestWhat);
            calc.value("Δ", demand, Quantity.SECTION_LENGTH, "statics of the overhanging beam with E·Ix, Ix = design value of "
                    + s.designation(), "", Arg.of("x", where, Quantity.SPAN_LENGTH));
            if (tip) {
                double c = where == 0 ? a : length - b;
                calc.eq("Δ_allow", "2·c/n", TIP_SOURCE, capacity, Quantity.SECTION_LENGTH,
                        Arg.of("c", c, Quantity.SPAN_LENGTH), Arg.num("n", n));
            } else {
                calc.eq("Δ_allow", "l/n", DeflectionLimits.SOURCE, capacity, Quantity.SECTION_LENGTH,
                        Arg.of("l", b - a, Quantity.SPAN_LENGTH), Arg.num("n", n));
            }
            calc.eq("ratio", "Δ/Δ_allow", DeflectionLimits.SOURCE, bestRatio, Quantity.NUMBER,
                    Arg.of("Δ", demand, Quantity.SECTION_LENGTH), Arg.of("Δ_allow", capacity, Quantity.SECTION_LENGTH));
        }
        return new Check(name, demand, capacity, bestRatio, combo, tip ? TIP_SOURCE : DeflectionLimits.SOURCE,
                Quantity.SECTION_LENGTH, where, null, Double.NaN, Double.NaN,
                bestWhat + ", " + patternText(bestP) + (loads.separateDeflectionLoads() ? ", live load unreduced" : ""));
    }

    /**
     * The smallest reaction at each support over every strength combination and pattern (with the
     * section's own weight): a negative value is uplift the support must resist.
     */
    public double[] minimumReactions(Section s) {
        double w = selfWeight(s);
        double[] min = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        for (int c = 0; c < combos.size(); c++) {
            for (int p = 0; p < patterns.length; p++) {
                OverhangSpan o = statics(c, p, w);
                min[0] = Math.min(min[0], o.reactionA());
                min[1] = Math.min(min[1], o.reactionB());
            }
        }
        return min;
    }
}
