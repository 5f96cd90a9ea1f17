package org.baywright.design;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.calc.Arg;
import org.baywright.calc.Calc;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.design.aisc360.Aisc360;
import org.baywright.design.aisc360.AmplificationA8;
import org.baywright.design.aisc360.CombinedH1;
import org.baywright.design.aisc360.FlexureF6;
import org.baywright.design.aisc360.IShapeCompression;
import org.baywright.design.aisc360.IShapeFlexure;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;

/**
 * Sizes the tiers of one column line, the lightest allowed section per tier: flexural buckling by AISC
 * 360-16 E3 with K = 1 and the storey height as unbraced length about both axes, required strength from
 * the gravity combinations (ASCE 7-16 §2.3.1 / §2.4.1) of the storey's service loads with live load
 * already reduced, each tier's own weight added to D of its storeys and of every storey below. Shapes
 * with slender elements are not candidates.
 *
 * <p>Moments from the reactions (leaning columns of a braced frame, K = 1): each reaction a member
 * delivers to the column at a floor acts at the connection eccentricity from the column's axis, e = d/2 + a
 * for a member framing into a flange and e = tw/2 + a for one framing into the web, with a the distance
 * beyond the column face (a design setting; 3 in by default, common practice). The net moment at a
 * floor about each axis, with live load L removed from one side where that makes it larger (pattern live
 * load, ASCE 7-16 §4.3.3, the axial load reduced to match), is shared between the storeys above and below
 * by their stiffness I/L, amplified by B1 (AISC 360-16 Appendix 8, Eq. A-8-3) and checked with the axial
 * load by AISC 360-16 H1.1 (Eq. H1-1a, H1-1b): Mcx by F2/F3 with Lb = storey height and Cb = 1.0
 * (conservative), Mcy by F6. The strong axis bends under the members on the faces along the web: a line's
 * web is set along the plan axis whose members deliver the larger reactions (girders to the flanges).
 * Moments use live load unreduced (conservative: the reduction of one floor's reaction is its member's,
 * not the column's); the axial load uses the column's reduced live load. Roof live load and snow are on
 * both sides.
 *
 * <p>Immutable and thread-safe: column lines are independent and may be designed in parallel.
 */
public final class ColumnDesigner {

    /**
     * The axial load in one storey from everything above, without the own weight of any column.
     *
     * @param level the level at the top of the storey
     * @param height storey height, m
     * @param unreduced service load by {@link LoadCase} ordinal, N
     * @param reduced the same with live and roof live load reduced, N
     */
    public record StoreyDemand(String level, double height, double[] unreduced, double[] reduced, Joint top, Joint bottom) {
        public StoreyDemand {
            top = top == null ? Joint.NONE : top;
            bottom = bottom == null ? Joint.NONE : bottom;
        }

        /** A storey with no reactions at its ends (axial load only). */
        public StoreyDemand(String level, double height, double[] unreduced, double[] reduced) {
            this(level, height, unreduced, reduced, Joint.NONE, Joint.NONE);
        }

        /** The same storey with {@code weight} (N) added to D. */
        StoreyDemand withDead(double weight) {
            double[] u = unreduced.clone();
            double[] r = reduced.clone();
            u[LoadCase.D.ordinal()] += weight;
            r[LoadCase.D.ordinal()] += weight;
            return new StoreyDemand(level, height, u, r, top, bottom);
        }
    }

    /** The face of a column a member frames into, by the plan direction from the column to the member. */
    public enum Face {
        POS_X("+x", true, 1), NEG_X("−x", true, -1), POS_Y("+y", false, 1), NEG_Y("−y", false, -1);

        private final String label;
        private final boolean alongX;
        private final int sign;

        Face(String label, boolean alongX, int sign) {
            this.label = label;
            this.alongX = alongX;
            this.sign = sign;
        }

        public String label() {
            return label;
        }

        /** True for the faces met by members running along plan x. */
        public boolean alongX() {
            return alongX;
        }

        /** +1 on the positive side of its plan axis, −1 on the negative. */
        public int sign() {
            return sign;
        }

        /** The face a member meets when it leaves the column in plan direction (dx, dy): the larger component decides. */
        public static Face of(double dx, double dy) {
            return Math.abs(dx) >= Math.abs(dy) ? (dx >= 0 ? POS_X : NEG_X) : (dy >= 0 ? POS_Y : NEG_Y);
        }
    }

    /**
     * A reaction a member delivers to the column at a floor.
     *
     * @param member the member's id
     * @param loads service load by {@link LoadCase} ordinal, live unreduced, N
     */
    public record FaceReaction(String member, Face face, double[] loads) {
    }

    /**
     * A floor at one end of a storey.
     *
     * @param level the level's name (empty with no floor)
     * @param reactions what the members at that floor deliver to the column
     * @param farHeight height of the storey on the other side of the floor (above it for the top end of a storey,
     *     below it for the bottom end), m; 0 where there is none (the column stops, or the foundation)
     */
    public record Joint(String level, List<FaceReaction> reactions, double farHeight, double[][] faceSums) {
        /** No floor, no reactions. */
        public static final Joint NONE = new Joint("", List.of(), 0);

        /**
         * @param faceSums the reactions summed per {@link Face} (ordinal) and load case (ordinal), made by the other
         *     constructor: the search reads them for every section, combination and pattern
         */
        public Joint {
            reactions = List.copyOf(reactions);
        }

        public Joint(String level, List<FaceReaction> reactions, double farHeight) {
            this(level, reactions, farHeight, sums(reactions));
        }

        private static double[][] sums(List<FaceReaction> reactions) {
            double[][] out = new double[Face.values().length][LoadCase.values().length];
            for (FaceReaction r : reactions) {
                double[] row = out[r.face().ordinal()];
                for (int k = 0; k < row.length; k++) {
                    row[k] += r.loads()[k];
                }
            }
            return out;
        }
    }

    /** The storeys one section spans between splices, bottom first. */
    public record TierDemand(List<StoreyDemand> storeys) {
        public TierDemand {
            storeys = List.copyOf(storeys);
        }

        /** The tier's length: its storey heights summed from the bottom, m. */
        public double length() {
            double length = 0;
            for (StoreyDemand s : storeys) {
                length += s.height();
            }
            return length;
        }
    }

    /**
     * One storey checked with a tier's section.
     *
     * @param unreduced service load by load case with the own weight of the columns above the storey's base, N
     * @param reduced the same with live load reduced, N
     * @param required required strength (Pu or Pa) of the governing combination, N
     * @param available available strength (φc·Pn or Pn/Ωc), N; NaN with no section
     * @param combination the governing combination
     */
    public record StoreyCheck(double[] unreduced, double[] reduced, double required, double available, double ratio,
            String combination, Interaction interaction) {
    }

    /**
     * The storey's combined check (AISC 360-16 H1.1) in its governing combination and live-load pattern,
     * and what it takes to record that check again on a calculation sheet.
     *
     * @param ratio the interaction ratio (Eq. H1-1a or H1-1b); the storey's ratio is the larger of this and the
     *     axial ratio
     * @param pattern "all spans loaded" or which faces' live load was removed
     * @param pr required axial strength in that case, N
     * @param pc available axial strength, N
     * @param mrx required strong-axis moment, B1 included, N·m
     * @param mry required weak-axis moment, B1 included, N·m
     * @param mcx available strong-axis flexural strength, N·m
     * @param mcy available weak-axis flexural strength, N·m
     * @param demand the storey's loads with the column weight above its base in D, and its end floors
     * @param above the section of the storey above the storey's top floor, or null (none, or the same section)
     * @param webAlongX true when the column's web lies along plan x
     */
    public record Interaction(double ratio, String combination, String pattern, double pr, double pc, double mrx,
            double mry, double mcx, double mcy, double b1x, double b1y, StoreyDemand demand, Section above,
            boolean webAlongX) {
    }

    /**
     * A tier as designed.
     *
     * @param section the section, or null when no section is allowed at all
     * @param storeys bottom first
     * @param rejected lighter sections rejected, with their governing ratio
     */
    public record TierDesign(Section section, MemberStatus status, List<StoreyCheck> storeys, double length,
            List<String> rejected) {
        /** Weight per length of the section, N/m (0 with none). */
        public double weight() {
            return section == null ? 0 : section.weight();
        }

        /** Highest ratio of the tier's storeys. */
        public double maxRatio() {
            return storeys.stream().mapToDouble(StoreyCheck::ratio).max().orElse(Double.NaN);
        }

        /** Highest interaction ratio (AISC 360-16 H1.1) of the tier's storeys; NaN with no section. */
        public double maxInteraction() {
            return storeys.stream().filter(c -> c.interaction() != null).mapToDouble(c -> c.interaction().ratio()).max()
                    .orElse(Double.NaN);
        }

        TierDesign withStatus(MemberStatus s) {
            return new TierDesign(section, s, storeys, length, rejected);
        }
    }

    /** The default distance from the column face to a reaction, 3 in (common practice). */
    public static final double DEFAULT_ECCENTRICITY = 3 * 0.0254;

    private static final String PRACTICE = "common practice";
    private static final String CLAUSE_PATTERN = "ASCE 7-16 §4.3.3";
    private static final String CLAUSE_SPLIT = "distribution by I/L (common practice)";
    private static final String EQ_A_8_1 = Aisc360.eq("A-8-1");
    private static final String CLAUSE_F2 = Aisc360.clause("F2");

    private final Catalog candidates;
    private final Steel steel;
    private final DesignMethod method;
    private final double eccentricity;

    /**
     * @param catalog the run's catalog
     * @param series the series allowed for columns (empty = all)
     */
    public ColumnDesigner(Catalog catalog, Steel steel, DesignMethod method, List<String> series) {
        this(catalog, steel, method, series, DEFAULT_ECCENTRICITY);
    }

    /**
     * @param catalog the run's catalog
     * @param series the series allowed for columns (empty = all)
     * @param eccentricity the distance a reaction acts beyond the column face, m (e = d/2 + a to a flange, tw/2 + a to
     *     the web)
     */
    public ColumnDesigner(Catalog catalog, Steel steel, DesignMethod method, List<String> series, double eccentricity) {
        this.steel = steel;
        this.method = method;
        this.eccentricity = eccentricity;
        List<String> allowed = List.copyOf(series);
        this.candidates = catalog.filter(s -> (allowed.isEmpty() || allowed.contains(s.series()))
                && !IShapeCompression.hasSlenderElement(s, steel.fy(), steel.e(), null));
    }

    /** Whether a section of this designation is among the candidates (allowed series, no slender element). */
    public boolean allows(String designation) {
        return candidates.find(designation).isPresent();
    }

    /**
     * Designs a column line's tiers from the top down, so that each carries the weight of those above.
     * A fixed section that is a candidate is checked instead of searching (status {@link
     * MemberStatus#FIXED_SIZE}); one that is not is ignored and the tier sized. A tier no section passes
     * is {@link MemberStatus#OVERSTRESSED} with the closest section, or with none when there are no
     * candidates (then it still carries its loads down, without its own weight).
     *
     * @param tiers bottom first
     * @return the tiers as designed, bottom first
     */
    public List<TierDesign> design(List<TierDemand> tiers, Optional<String> fixed) {
        return design(tiers, fixed, true);
    }

    /**
     * Designs a column line's tiers as {@link #design(List, Optional)}, the column's web along plan x ({@code
     * webAlongX}) or plan y.
     */
    public List<TierDesign> design(List<TierDemand> tiers, Optional<String> fixed, boolean webAlongX) {
        TierDesign[] out = new TierDesign[tiers.size()];
        double weightAbove = 0;
        Section above = null;
        for (int t = tiers.size() - 1; t >= 0; t--) {
            out[t] = tier(tiers.get(t), weightAbove, above, webAlongX, fixed);
            weightAbove += out[t].weight() * out[t].length();
            above = out[t].section();
        }
        return List.of(out);
    }

    /**
     * The plan axis the column's web should lie along: the one whose members deliver the larger reactions
     * (D + L, every floor), so that they frame into the flanges; plan x on a tie.
     */
    public static boolean webAlongX(List<TierDemand> tiers) {
        double x = 0;
        double y = 0;
        for (TierDemand t : tiers) {
            for (StoreyDemand s : t.storeys()) {
                for (FaceReaction r : s.top().reactions()) {
                    double v = Math.abs(r.loads()[LoadCase.D.ordinal()]) + Math.abs(r.loads()[LoadCase.L.ordinal()]);
                    if (r.face().alongX()) {
                        x += v;
                    } else {
                        y += v;
                    }
                }
            }
        }
        return x >= y;
    }

    private TierDesign tier(TierDemand tier, double weightAbove, Section above, boolean webAlongX, Optional<String> fixed) {
        List<String> rejected = new ArrayList<>();
        TierDesign chosen = null;
        TierDesign best = null;
        for (Section s : candidates.sections()) {
            TierDesign d = check(tier, s, weightAbove, above, webAlongX, rejected);
            if (Check.passes(d.maxRatio())) {
                chosen = d;
                break;
            }
            rejected.add(s.designation() + " " + String.format(Locale.ROOT, "%.2f", d.maxRatio()));
            if (best == null || d.maxRatio() < best.maxRatio()) {
                best = d;
            }
        }
        Optional<Section> given = fixed.flatMap(candidates::find);
        if (given.isPresent()) {
            rejected.clear();
            TierDesign d = check(tier, given.get(), weightAbove, above, webAlongX, rejected);
            chosen = Check.passes(d.maxRatio()) ? d.withStatus(MemberStatus.FIXED_SIZE) : null;
            best = d;
        }
        if (chosen != null) {
            return chosen;
        }
        return best == null ? check(tier, null, weightAbove, above, webAlongX, rejected) : best.withStatus(MemberStatus.OVERSTRESSED);
    }

    /** The tier's storeys with section {@code s}; with none (null), the loads alone (ratios NaN, overstressed). */
    private TierDesign check(TierDemand tier, Section s, double weightAbove, Section above, boolean webAlongX,
            List<String> rejected) {
        List<StoreyCheck> storeys = new ArrayList<>();
        double own = 0;
        Flexure fx = s == null ? null : flexure(s);
        for (int i = tier.storeys().size() - 1; i >= 0; i--) {
            StoreyDemand d = tier.storeys().get(i);
            double h = d.height();
            own += s == null ? 0 : s.weight() * h;
            storeys.add(0, storey(d, s, fx, weightAbove + own, i == tier.storeys().size() - 1 ? above : null, webAlongX));
        }
        return new TierDesign(s, s == null ? MemberStatus.OVERSTRESSED : MemberStatus.SIZED, List.copyOf(storeys),
                tier.length(), List.copyOf(rejected));
    }

    /** One storey with {@code columnWeight} (the columns above its base) added to D. */
    private StoreyCheck storey(StoreyDemand d0, Section s, Flexure fx, double columnWeight, Section above, boolean webAlongX) {
        StoreyDemand d = d0.withDead(columnWeight);
        double[] unreduced = d.unreduced();
        double[] reduced = d.reduced();
        List<LoadCombination> combos = combinations(d);
        Combinations.Governing g = Combinations.governing(reduced, combos);
        double req = g.value();
        String gov = g.combination().name();
        double avail = Double.NaN;
        Interaction in = null;
        if (s != null) {
            IShapeCompression.Strength st = IShapeCompression.strength(s, steel.fy(), steel.e(), d.height(), d.height(), null);
            avail = method.available(st.pn(), ResistanceFactors.PHI_C, ResistanceFactors.OMEGA_C);
            in = governingCase(d, s, fx, above, webAlongX, avail, combos, null);
        }
        double ratio = req / avail;
        if (in != null && !(in.ratio() <= ratio)) {
            ratio = in.ratio();
        }
        return new StoreyCheck(unreduced, reduced, req, avail, ratio, gov, in);
    }

    /** The gravity combinations of the load cases present in a storey. */
    private List<LoadCombination> combinations(StoreyDemand d) {
        Set<LoadCase> present = EnumSet.noneOf(LoadCase.class);
        for (LoadCase lc : LoadCase.values()) {
            if (d.reduced()[lc.ordinal()] != 0) {
                present.add(lc);
            }
        }
        return Combinations.gravity(method, present);
    }

    /** A section's available flexural strengths at one storey height are computed when first needed. */
    private final class Flexure {
        private final Section s;
        private IShapeFlexure.Constants k;
        private double mcy = Double.NaN;
        private double lb = Double.NaN;
        private double mcx = Double.NaN;

        Flexure(Section s) {
            this.s = s;
        }

        double mcx(double height) {
            if (height != lb) {
                if (k == null) {
                    k = IShapeFlexure.constants(s, steel.fy(), steel.e(), null);
                }
                mcx = method.available(IShapeFlexure.mn(k, height, 1.0, null), ResistanceFactors.PHI_B, ResistanceFactors.OMEGA_B);
                lb = height;
            }
            return mcx;
        }

        double mcy() {
            if (Double.isNaN(mcy)) {
                mcy = method.available(FlexureF6.mn(s, steel.fy(), steel.e(), null), ResistanceFactors.PHI_B,
                        ResistanceFactors.OMEGA_B);
            }
            return mcy;
        }
    }

    private Flexure flexure(Section s) {
        return new Flexure(s);
    }

    /** Live-load patterns tried: all spans loaded, L off one side of the x faces, of the y faces, of both. */
    private static final int[] PATTERNS = {0, 1, 2, 3};

    /**
     * The storey's H1.1 interaction in its governing combination and pattern (the largest ratio). With a
     * recorder, the governing case is recorded: the moments from the reactions, their split, B1 and H1-1.
     *
     * @param d the storey's loads with the column weight above its base in D
     * @param pc available axial strength of {@code s} for the storey, N
     */
    private Interaction governingCase(StoreyDemand d, Section s, Flexure fx, Section above, boolean webAlongX, double pc,
            List<LoadCombination> combos, Calc calc) {
        boolean anyMoment = !d.top().reactions().isEmpty() || !d.bottom().reactions().isEmpty();
        Interaction best = null;
        int bestCombo = 0;
        int bestPattern = 0;
        for (int ci = 0; ci < combos.size(); ci++) {
            for (int p : PATTERNS) {
                if (p != 0 && !anyMoment) {
                    break;
                }
                Interaction in = evaluate(d, s, fx, above, webAlongX, pc, combos.get(ci), p, null, false);
                if (best == null || in.ratio() > best.ratio()) {
                    best = in;
                    bestCombo = ci;
                    bestPattern = p;
                }
            }
        }
        if (best != null) {
            // the governing case again, with the words of its pattern (and its sheet when one is recorded)
            best = evaluate(d, s, fx, above, webAlongX, pc, combos.get(bestCombo), bestPattern, calc, true);
        }
        return best;
    }

    /**
     * Records on {@code calc} the governing H1.1 check of a storey as designed: the moment derivation (reactions,
     * eccentricities, live-load pattern, split by stiffness), B1 about each axis, the flexural strengths and
     * the interaction. The same functions the design evaluated, with the same inputs.
     *
     * @param in the interaction a storey check carries
     * @return the interaction recorded (equal to {@code in} in its values)
     */
    public Interaction record(Interaction in, Section s, double pc, Calc calc) {
        StoreyDemand d = in.demand();
        List<LoadCombination> combos = combinations(d);
        return governingCase(d, s, flexure(s), in.above(), in.webAlongX(), pc, combos, calc);
    }

    /** The sums of the reactions on one face, by load case, N. */
    private static double[] faceSum(Joint j, Face f) {
        return j.faceSums()[f.ordinal()];
    }

    /** The net moment at a floor about one plan axis, and the live load a pattern removed there. */
    private record NetMoment(double m, double removedL, String pattern) {
    }

    /**
     * The factored net moment at floor {@code j} from the members along plan x ({@code alongX}) or y: (Rp − Rn)·e,
     * with live load removed from the side that makes it larger when {@code pattern}.
     */
    private NetMoment net(Joint j, boolean alongX, double e, LoadCombination c, boolean pattern, String end, Calc sheet,
            boolean describe) {
        Calc calc = j.reactions().isEmpty() ? null : sheet; // a floor without reactions (or the foundation) prints nothing
        Face pos = alongX ? Face.POS_X : Face.POS_Y;
        Face neg = alongX ? Face.NEG_X : Face.NEG_Y;
        double[] p = faceSum(j, pos);
        double[] n = faceSum(j, neg);
        double gl = c.factor(LoadCase.L);
        double rp = Combinations.combine(c, p);
        double rn = Combinations.combine(c, n);
        int li = LoadCase.L.ordinal();
        double removed = 0;
        Face offFace = null;
        if (pattern && gl != 0 && (p[li] != 0 || n[li] != 0)) {
            double offP = Math.abs(rp - gl * p[li] - rn);
            double offN = Math.abs(rp - (rn - gl * n[li]));
            if (offP > offN) {
                removed = p[li];
                offFace = pos;
            } else if (n[li] != 0) {
                removed = n[li];
                offFace = neg;
            } // else: live load on one side only, where removing it makes the moment smaller (all spans loaded)
        }
        // the pattern's words only where they are read: the sheet, and the governing case's result
        String text = offFace == null || (calc == null && !describe) ? "" : "L off the " + offFace.label() + " face at " + j.level();
        if (calc != null) {
            String axis = alongX ? "x" : "y";
            String[] syms = {"D", "L", "Lr", "S"};
            for (Face f : new Face[] {pos, neg}) {
                double[] sum = f == pos ? p : n;
                boolean off = offFace == f;
                StringBuilder formula = new StringBuilder();
                List<Arg> args = new ArrayList<>();
                for (LoadCase lc : LoadCase.values()) {
                    double fac = c.factor(lc);
                    if (fac == 0 || (off && lc == LoadCase.L)) {
                        continue;
                    }
                    formula.append(formula.length() == 0 ? "" : " + ").append(CalcFormat.sig(fac)).append("·").append(syms[lc.ordinal()]);
                    args.add(Arg.of(syms[lc.ordinal()], sum[lc.ordinal()], Quantity.FORCE));
                }
                double v = Combinations.combine(c, sum) - (off ? gl * sum[li] : 0);
                calc.eq("R_" + end + (f.sign() > 0 ? "p" : "n") + axis, formula.length() == 0 ? "0" : formula.toString(),
                        c.reference() + (off ? ", " + CLAUSE_PATTERN : ""), v, Quantity.FORCE, args.toArray(new Arg[0]));
            }
            if (offFace != null) {
                Calc.branch(calc, "pattern live load: " + text + " makes the net moment about the " + axis
                        + " faces larger", CLAUSE_PATTERN);
            }
        }
        double rpp = rp;
        double rnn = rn;
        if (removed != 0) {
            if (offFace == pos) {
                rpp -= gl * removed;
            } else {
                rnn -= gl * removed;
            }
        }
        double m = (rpp - rnn) * e;
        if (calc != null) {
            String axis = alongX ? "x" : "y";
            calc.eq("M_" + end + axis, "(R_" + end + "p" + axis + " − R_" + end + "n" + axis + ")·e_" + axis, PRACTICE, m,
                    Quantity.MOMENT, Arg.of("R_" + end + "p" + axis, rpp, Quantity.FORCE),
                    Arg.of("R_" + end + "n" + axis, rnn, Quantity.FORCE), Arg.of("e_" + axis, e, Quantity.SECTION_LENGTH));
        }
        return new NetMoment(m, removed, text);
    }

    /** The share of a floor's moment the storey takes: (I/L)/(I/L + I'/L'), 1 with no storey beyond. */
    private static double share(double i, double h, double iFar, double hFar, String symbol, Calc calc) {
        if (!(hFar > 0)) {
            if (calc != null) {
                calc.eq(symbol, "1", CLAUSE_SPLIT, 1, Quantity.NUMBER);
            }
            return 1;
        }
        double v = (i / h) / (i / h + iFar / hFar);
        return Calc.eq(calc, symbol, "(I/L)/(I/L + I2/L2)", CLAUSE_SPLIT, v, Quantity.NUMBER, Arg.of("I", i, Quantity.INERTIA),
                Arg.of("L", h, Quantity.SPAN_LENGTH), Arg.of("I2", iFar, Quantity.INERTIA), Arg.of("L2", hFar, Quantity.SPAN_LENGTH));
    }

    /** The required moment about one section axis: the end moments, Cm, Pe1, B1, Mr = B1·M2. */
    private record Amplified(double mr, double b1) {
    }

    private Amplified amplify(double mTop, double mBottom, double i, double h, double pr, String axis, Calc calc) {
        double m2 = Math.max(Math.abs(mTop), Math.abs(mBottom));
        if (m2 == 0) {
            if (calc != null) {
                calc.branch("no moment about the " + axis + "-axis", EQ_A_8_1);
            }
            return new Amplified(0, 1);
        }
        double m1 = Math.min(Math.abs(mTop), Math.abs(mBottom));
        boolean reverse = mTop * mBottom > 0;
        double m1s = reverse ? m1 : -m1;
        if (calc != null) {
            calc.branch("end moments about the " + axis + "-axis " + (m1 == 0 ? "with one end free of moment"
                    : reverse ? "of the same sense → reverse curvature, M1/M2 > 0" : "of opposite sense → single curvature, M1/M2 < 0"),
                    Aisc360.clause("Appendix 8, 8.2.1"));
        }
        double cm = AmplificationA8.cm(m1s, m2, calc);
        double pe1 = AmplificationA8.pe1(steel.e(), i, h, calc);
        double b1 = AmplificationA8.b1(cm, AmplificationA8.alpha(method), pr, pe1, calc);
        double mr = Calc.eq(calc, "Mr" + axis, "B1·M2", EQ_A_8_1, b1 * m2, Quantity.MOMENT, Arg.num("B1", b1),
                Arg.of("M2", m2, Quantity.MOMENT));
        return new Amplified(mr, b1);
    }

    /** One combination and live-load pattern of a storey (pattern: bit 1 the x faces, bit 2 the y faces). */
    private Interaction evaluate(StoreyDemand d, Section s, Flexure fx, Section above, boolean webAlongX, double pc,
            LoadCombination c, int pattern, Calc calc, boolean describe) {
        double h = d.height();
        double a = eccentricity;
        double ef = s.depth() / 2 + a;
        double ew = s.dims().tw() / 2 + a;
        if (calc != null) {
            calc.heading("Storey below " + d.level() + ": moments from the reactions, " + c.name());
            calc.note("Web along plan " + (webAlongX ? "x" : "y") + ": members along plan " + (webAlongX ? "x" : "y")
                    + " frame into the flanges (strong axis), members along plan " + (webAlongX ? "y" : "x")
                    + " into the web (weak axis). Leaning column in a braced frame, K = 1; live load in the moments unreduced.",
                    PRACTICE);
            for (Joint j : new Joint[] {d.top(), d.bottom()}) {
                for (FaceReaction r : j.reactions()) {
                    calc.value("R_D", r.loads()[LoadCase.D.ordinal()], Quantity.FORCE, "at " + j.level() + ", member " + r.member()
                            + " on the " + r.face().label() + " face (service, unreduced)", "",
                            Arg.of("R_L", r.loads()[LoadCase.L.ordinal()], Quantity.FORCE),
                            Arg.of("R_Lr", r.loads()[LoadCase.LR.ordinal()], Quantity.FORCE),
                            Arg.of("R_S", r.loads()[LoadCase.S.ordinal()], Quantity.FORCE));
                }
            }
            calc.eq("e_f", "d/2 + a", PRACTICE + " (connection to a flange)", ef, Quantity.SECTION_LENGTH,
                    Arg.of("d", s.depth(), Quantity.SECTION_LENGTH), Arg.of("a", a, Quantity.SECTION_LENGTH));
            calc.eq("e_w", "tw/2 + a", PRACTICE + " (connection to the web)", ew, Quantity.SECTION_LENGTH,
                    Arg.of("tw", s.dims().tw(), Quantity.SECTION_LENGTH), Arg.of("a", a, Quantity.SECTION_LENGTH));
        }
        double ex = webAlongX ? ef : ew; // members along plan x
        double ey = webAlongX ? ew : ef;
        boolean px = (pattern & 1) != 0;
        boolean py = (pattern & 2) != 0;
        NetMoment tx = net(d.top(), true, ex, c, px, "t", calc, describe);
        NetMoment ty = net(d.top(), false, ey, c, py, "t", calc, describe);
        NetMoment bx = net(d.bottom(), true, ex, c, px, "b", calc, describe);
        NetMoment by = net(d.bottom(), false, ey, c, py, "b", calc, describe);
        double[] reduced = d.reduced();
        int li = LoadCase.L.ordinal();
        double fl = d.unreduced()[li] > 0 ? reduced[li] / d.unreduced()[li] : 1;
        double removed = tx.removedL() + ty.removedL();
        double pFull = Combinations.combine(c, reduced);
        double pr = pFull - c.factor(LoadCase.L) * fl * removed;
        if (calc != null && removed != 0) {
            pr = calc.eq("Pr", "Pr_all − γL·f_L·L_off", CLAUSE_PATTERN, pr, Quantity.FORCE, Arg.of("Pr_all", pFull, Quantity.FORCE),
                    Arg.num("γL", c.factor(LoadCase.L)), Arg.num("f_L", fl), Arg.of("L_off", removed, Quantity.FORCE));
        } else if (calc != null) {
            calc.value("Pr", pr, Quantity.FORCE, "required axial strength, " + c.name() + " of the reduced loads", c.reference());
        }
        // the section axes: strong (x) bends under the members along the web's plan direction
        double ix = s.props().ix();
        double iy = s.props().iy();
        double iAboveX = above == null ? ix : above.props().ix();
        double iAboveY = above == null ? iy : above.props().iy();
        NetMoment topStrong = webAlongX ? tx : ty;
        NetMoment topWeak = webAlongX ? ty : tx;
        NetMoment botStrong = webAlongX ? bx : by;
        NetMoment botWeak = webAlongX ? by : bx;
        double hUp = d.top().farHeight();
        double hDown = d.bottom().farHeight();
        double ktx = share(ix, h, iAboveX, hUp, "k_tx", topStrong.m() != 0 ? calc : null);
        double kbx = share(ix, h, ix, hDown, "k_bx", botStrong.m() != 0 ? calc : null);
        double kty = share(iy, h, iAboveY, hUp, "k_ty", topWeak.m() != 0 ? calc : null);
        double kby = share(iy, h, iy, hDown, "k_by", botWeak.m() != 0 ? calc : null);
        double mtx = Calc.eq(topStrong.m() != 0 ? calc : null, "M_top,x", "k_tx·M_t", CLAUSE_SPLIT, ktx * topStrong.m(),
                Quantity.MOMENT, Arg.num("k_tx", ktx), Arg.of("M_t", topStrong.m(), Quantity.MOMENT));
        double mbx = Calc.eq(botStrong.m() != 0 ? calc : null, "M_bot,x", "k_bx·M_b", CLAUSE_SPLIT, kbx * botStrong.m(),
                Quantity.MOMENT, Arg.num("k_bx", kbx), Arg.of("M_b", botStrong.m(), Quantity.MOMENT));
        double mty = Calc.eq(topWeak.m() != 0 ? calc : null, "M_top,y", "k_ty·M_t", CLAUSE_SPLIT, kty * topWeak.m(),
                Quantity.MOMENT, Arg.num("k_ty", kty), Arg.of("M_t", topWeak.m(), Quantity.MOMENT));
        double mby = Calc.eq(botWeak.m() != 0 ? calc : null, "M_bot,y", "k_by·M_b", CLAUSE_SPLIT, kby * botWeak.m(),
                Quantity.MOMENT, Arg.num("k_by", kby), Arg.of("M_b", botWeak.m(), Quantity.MOMENT));
        Amplified ax = amplify(mtx, mbx, ix, h, pr, "x", calc);
        Amplified ay = amplify(mty, mby, iy, h, pr, "y", calc);
        if (calc != null) {
            calc.heading("Flexural strength, Lb = storey height, Cb = 1.0 (conservative)");
            IShapeFlexure.mn(IShapeFlexure.constants(s, steel.fy(), steel.e(), calc), h, 1.0, calc);
            calc.note("strong axis by " + CLAUSE_F2 + "/F3 with Lb = " + "the storey height", CLAUSE_F2);
            FlexureF6.mn(s, steel.fy(), steel.e(), calc);
        }
        double mcx = fx.mcx(h);
        double mcy = fx.mcy();
        if (calc != null) {
            calc.value("Mcx", mcx, Quantity.MOMENT, method == DesignMethod.LRFD ? "φb·Mnx, φb = 0.90" : "Mnx/Ωb, Ωb = 1.67",
                    Aisc360.clause("F1"));
            calc.value("Mcy", mcy, Quantity.MOMENT, method == DesignMethod.LRFD ? "φb·Mny, φb = 0.90" : "Mny/Ωb, Ωb = 1.67",
                    Aisc360.clause("F1"));
            calc.value("Pc", pc, Quantity.FORCE, method == DesignMethod.LRFD ? "φc·Pn (E3), φc = 0.90" : "Pn/Ωc (E3), Ωc = 1.67",
                    Aisc360.clause("E1"));
        }
        double ratio = CombinedH1.ratio(pr, pc, ax.mr(), mcx, ay.mr(), mcy, calc);
        List<String> parts = new ArrayList<>();
        for (NetMoment n : new NetMoment[] {tx, ty, bx, by}) {
            if (!n.pattern().isEmpty()) {
                parts.add(n.pattern());
            }
        }
        String pat = parts.isEmpty() ? "all spans loaded" : String.join("; ", parts);
        return new Interaction(ratio, c.name(), pat, pr, pc, ax.mr(), ay.mr(), mcx, mcy, ax.b1(), ay.b1(), d,
                above, webAlongX);
    }
}
