package org.baywright.report.pdf;

import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.baywright.calc.Caution;
import org.baywright.calc.Quantity;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.Steel;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.plan.DesignSettings;
import org.baywright.run.DesignBasis;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.report.pdf.PageFlow.Style;
import org.baywright.units.UnitSystem;

/** The cover page and the design-basis part. */
final class FrontMatter {
    static final String AISC = "AISC 360-16";
    static final String AISC_TITLE = "Specification for Structural Steel Buildings (ANSI/AISC 360-16)";
    static final String ASCE = "ASCE 7-16";
    static final String ASCE_TITLE = "Minimum Design Loads and Associated Criteria for Buildings and Other Structures (ASCE/SEI 7-16)";

    private FrontMatter() {
    }

    static String date(Context cx) {
        return cx.options.project().date().format(DateTimeFormatter.ISO_LOCAL_DATE);
    }

    // ---- cover -------------------------------------------------------------------------------

    static void cover(Context cx) {
        PageFlow f = cx.flow;
        f.runningTitle("Cover");
        f.newPage();
        Style kicker = new Style(f.fonts.bold, 9f, Rgb.ACCENT, 12f);
        Style title = new Style(f.fonts.bold, 21f, Rgb.TEXT, 25f);
        f.lineOf(kicker, f.left(), "STRUCTURAL CALCULATION PACKAGE");
        f.gap(2);
        for (String l : f.wrap(title, cx.projectName(), f.width())) {
            f.lineOf(title, f.left(), l);
        }
        f.lineOf(f.body.withColor(Rgb.GREY), f.left(),
                "Steel floor framing: gravity design of beams, girders and columns, with the load takedown");
        f.gap(8);

        List<String[]> p = new ArrayList<>();
        ProjectInfo pi = cx.options.project();
        p.add(new String[] {"Project", cx.projectName()});
        add(p, "Job number", pi.number());
        add(p, "Client", pi.client());
        add(p, "Location", pi.location());
        add(p, "Prepared by", pi.preparedBy());
        add(p, "Checked by", pi.checkedBy());
        add(p, "Revision", pi.revision());
        p.add(new String[] {"Date", date(cx)});
        p.add(new String[] {"Program", "Baywright " + cx.run.version()});
        p.add(new String[] {"Plan", cx.run.plan().name() + " (" + cx.run.plan().levels().size() + " levels, "
                + cx.run.plan().floors().size() + " floor layouts, " + cx.run.plan().columns().size() + " column lines)"});
        p.add(new String[] {"Units", cx.us == UnitSystem.US ? "US customary (ft, in, kip, psf, ksi)"
                : "SI (m, mm, kN, kPa, MPa)"});
        f.pairs(p, 92);
        f.gap(10);

        cautionBox(f);
        f.gap(8);
        if (composite(cx)) {
            org.baywright.report.CompositeTotals ct = org.baywright.report.CompositeTotals.of(cx.run.takedown());
            f.paragraph(f.body, "Composite design: " + ct.members() + " beams and girders act with the concrete slab on"
                    + " steel deck (" + AISC + " Chapter I), with " + Fmt.grouped(ct.studs(), 0) + " headed studs and "
                    + ct.cambered() + " pieces cambered. Their strength relies on the studs being welded as scheduled, the"
                    + " slab being cast as specified and, where unshored, the bare steel carrying the wet concrete and the"
                    + " construction live load: the studs, camber, slab and shoring assumptions must appear on the contract"
                    + " documents and be confirmed by the engineer of record.");
            f.gap(6);
        }

        f.heading2("Design basis", 80);
        basisTable(cx).draw(f);
    }

    private static void add(List<String[]> p, String k, String v) {
        if (!v.isEmpty()) {
            p.add(new String[] {k, v});
        }
    }

    static void cautionBox(PageFlow f) {
        Style s = new Style(f.fonts.bold, 9f, Rgb.TEXT, 12f);
        List<String> lines = f.wrap(s, Caution.TEXT, f.width() - 20);
        float h = lines.size() * s.leading() + 14;
        f.ensure(h);
        float top = f.y();
        f.fillRect(f.left(), top - h, f.width(), h, Rgb.CAUTION_FILL);
        f.strokeRect(f.left(), top - h, f.width(), h, 1.2f, Rgb.CAUTION_EDGE);
        float base = top - 7 - s.size();
        for (String l : lines) {
            f.text(s, f.left() + 10, base, l);
            base -= s.leading();
        }
        f.y(top - h);
    }

    /** The design basis in one table: codes and editions, method, material, loads, criteria, catalog. */
    static Table basisTable(Context cx) {
        DesignBasis b = cx.basis();
        DesignMethod m = cx.method();
        Steel steel = cx.steel();
        Table t = new Table().left("Item", 22).left("Basis", 58).left("Source", 28).fontSize(7.6f);
        t.row("Member strength", AISC + ", " + AISC_TITLE + "; " + (m == DesignMethod.LRFD
                ? "LRFD: required strength ≤ φ·Rn" : "ASD: required strength ≤ Rn/Ω"), AISC + " B3.1, B3.2");
        if (composite(cx)) {
            t.row("Composite beams", "steel section with the slab on deck: effective width, plastic stress distribution,"
                    + " headed studs (least " + org.baywright.calc.CalcFormat.sig(100 * cx.run.plan().settings().composite().minDegree())
                    + " % composite action); unshored members checked as bare steel under the wet concrete and cambered;"
                    + " deflections on the lower-bound moment of inertia", AISC + " I3.1a, I3.2a, I3.2d, I4.2, I8; Commentary"
                    + " Eq. C-I3-1");
        }
        if (org.baywright.report.BaySummary.present(cx.run)) {
            t.row("Floor vibration", "walking excitation of low-frequency floors, every bay with a described slab: a_p/g ≤ a_o/g"
                    + " under realistic loads (part \"" + VibrationPages.TITLE + "\")", "AISC DG11 2nd ed. Ch. 4");
        }
        t.row("Loads and combinations", ASCE + ", " + ASCE_TITLE, ASCE + " Ch. 2, 4");
        t.row("Load cases", "D dead (with the framing's own weight), L floor live, Lr roof live, S snow; gravity only",
                ASCE + " Ch. 2");
        StringBuilder combos = new StringBuilder();
        for (LoadCombination c : Combinations.gravity(m, EnumSet.allOf(LoadCase.class))) {
            combos.append(combos.length() == 0 ? "" : "; ").append(c.name());
        }
        t.row("Strength combinations", combos.toString(), ASCE + (m == DesignMethod.LRFD ? " §2.3.1" : " §2.4.1"));
        t.row("Live-load reduction", liveLoadReduction(b), ASCE + " §4.7, §4.8");
        t.row("Deflection criteria", deflection(b), deflectionSource(b));
        if (!b.roofDeflection().isEmpty()) {
            t.row("Roof deflection criteria", roofDeflection(cx), DeflectionLimits.SOURCE + " (roof rows)");
        }
        t.row("Steel", steel.name() + ", Fy = " + Fmt.v(steel.fy(), Quantity.STRESS, cx.us) + ", E = "
                + Fmt.v(steel.e(), Quantity.STRESS, cx.us), AISC + " A3.1");
        t.row("Section catalog", cx.run.catalogName().isEmpty() ? "(none: the run stopped before sizing)" : cx.run.catalogName(),
                b.catalogFile().isBlank() ? "built into Baywright" : b.catalogFile());
        return t;
    }

    static String liveLoadReduction(DesignBasis b) {
        if (!b.liveLoad().reduce()) {
            return "not applied: every member and column carries the full live load";
        }
        return "applied member by member with its own A_T and K_LL (floor live §4.7, roof live §4.8); partitions carried as "
                + (b.liveLoad().partitionAsDead() ? "dead load" : "reducible live load") + "; girder A_T "
                + (b.liveLoad().girderAreaDelivered() ? "= the area whose load it receives" : "≥ half the bay on each side");
    }

    static String deflection(DesignBasis b) {
        return "live load: " + limit(b.deflection().live()) + "; dead + live (with own weight): " + limit(b.deflection().total())
                + "; bare steel E·Ix; " + deflectionLiveLoad(b);
    }

    /** Which live load the deflection checks take: unreduced (the default, common practice) or as reduced for strength. */
    static String deflectionLiveLoad(DesignBasis b) {
        if (!b.liveLoad().reduce()) {
            return "live load not reduced (reduction off)";
        }
        return b.liveLoad().deflectionReduced() ? "live load reduced as for strength (plan setting)"
                : "live load unreduced (common practice for serviceability)";
    }

    static String deflectionSource(DesignBasis b) {
        boolean defaults = b.deflection().live() == DeflectionLimits.FLOOR.live() && b.deflection().total() == DeflectionLimits.FLOOR.total();
        return defaults ? DeflectionLimits.SOURCE + " (floor members)"
                : "project criteria (" + DeflectionLimits.SOURCE + " gives L/360 and L/240)";
    }

    /**
     * The limits of each roof layout: "layout "roof" (Roof): roof members supporting a non-plaster ceiling
     * (default), L/240 under Lr, S or L, L/180 total".
     */
    static String roofDeflection(Context cx) {
        List<String> parts = new ArrayList<>();
        DesignSettings st = cx.run.plan().settings();
        for (Map.Entry<String, DeflectionLimits> e : cx.basis().roofDeflection().entrySet()) {
            DeflectionLimits d = e.getValue();
            boolean set = st.roofCeilings().containsKey(e.getKey());
            parts.add("layout " + Summaries.floorLabel(cx, e.getKey()) + ": " + d.row() + (set ? " (plan setting)"
                    : " (the default: a suspended non-plaster ceiling is what a roof usually carries, common practice)")
                    + ", live load (Lr, S or L) " + limit(d.live()) + ", dead + live " + limit(d.total()));
        }
        return String.join("; ", parts);
    }

    /**
     * The footnote of IBC Table 1604.3 on the dead load of steel members, as the user's choice. Its text
     * is not quoted: the project's reference gives the table's rows, not that footnote's words.
     */
    static String steelDeadLoadNote(DesignBasis b) {
        return "IBC Table 1604.3 has a footnote on the dead load of steel members in the dead + live check (from memory,"
                + " not quoted: it lets that dead load be taken as zero; confirm the wording in the edition adopted). Applying"
                + " it is the engineer's choice: a total-load limit of 0 in the plan's settings turns the dead + live check"
                + " off for floor and roof members alike. In this run the dead + live check is "
                + (b.deflection().total() == 0 ? "off (the footnote applied)." : "on (the footnote not applied).");
    }

    static String limit(double n) {
        if (n == 0) {
            return "not checked";
        }
        return "L/" + (n == Math.rint(n) ? Long.toString((long) n) : String.format(Locale.ROOT, "%.1f", n));
    }

    // ---- design basis part ------------------------------------------------------------------

    static void basis(Context cx) {
        PageFlow f = cx.flow;
        DesignSettings st = cx.run.plan().settings();
        DesignBasis b = cx.basis();
        DesignMethod m = cx.method();
        cx.part("Design basis");

        f.heading2("Standards and editions", 40);
        Table s = new Table().left("Reference", 20).left("Title", 52).left("Used for", 40);
        s.row(AISC, AISC_TITLE, "flexure F2 and F3, shear G2.1, compression E3, Cb by Eq. F1-1, element slenderness Table B4.1"
                + (composite(cx) ? "; composite beams Chapter I (I3.1a, I3.2a, I3.2d, I4.2, I8)" : ""));
        s.row(ASCE, ASCE_TITLE, "load combinations (" + (m == DesignMethod.LRFD ? "§2.3.1" : "§2.4.1")
                + "), live-load reduction §4.7, roof live load §4.8, partition allowance §4.3.2, K_LL Table 4.7-1");
        s.row("IBC Table 1604.3", "International Building Code, deflection limits (edition adopted for the project)",
                "the default serviceability criteria L/360 and L/240 for floor members; for roof members the roof rows"
                        + " by the ceiling they carry (plaster or stucco L/360 and L/240, non-plaster L/240 and L/180,"
                        + " none L/180 and L/120)");
        s.row("Catalog", cx.run.catalogName(), "section dimensions and properties (tabulated values)");
        s.draw(f);

        f.heading2("Load cases", 40);
        Table lc = new Table().left("Case", 8).left("What it contains", 92);
        lc.row("D", "Dead load: slab and deck, superimposed dead load (finishes, ceilings, services), cladding and other"
                + " dead line and point loads, and the own weight of every beam, girder and column (each candidate section"
                + " is checked under its own nominal weight)" + (b.liveLoad().partitionAsDead() ? ", and the partition allowance" : ""));
        lc.row("L", "Floor live load" + (b.liveLoad().partitionAsDead() ? "" : " including the partition allowance")
                + ", reduced per member and column where §4.7 permits");
        lc.row("Lr", "Ordinary roof live load, reduced by §4.8.2 (R1 from the tributary area, flat roof R2 = 1); the load"
                + " of a roof used for assembly, as a garden or another occupancy is L (§4.8.3)");
        lc.row("S", "Snow load as given in the plan (not reduced)");
        lc.draw(f);
        f.paragraph(f.small, "Wind, earthquake, rain, ponding, vibration, fire and connection design are outside the scope"
                + " of this package.");

        f.heading2("Load combinations", 40);
        Table c = new Table().left("Combination", 40).left("Reference", 30).left("Used for", 50);
        for (LoadCombination combo : Combinations.gravity(m, EnumSet.allOf(LoadCase.class))) {
            c.row(combo.name(), combo.reference(), "strength of members and columns");
        }
        String roofs = b.roofDeflection().isEmpty() ? "" : " (floor members; roof members: their roof row)";
        c.row("L (+ Lr, S where present)", DeflectionLimits.SOURCE, "live-load deflection, limit " + limit(b.deflection().live())
                + roofs);
        c.row("D + L (+ Lr, S) + own weight", DeflectionLimits.SOURCE, "total-load deflection, limit "
                + limit(b.deflection().total()) + roofs);
        c.draw(f);
        f.paragraph(f.small, "Each member is checked only under the combinations that matter for the cases it carries (a"
                + " member with D and L only gets " + (m == DesignMethod.LRFD ? "1.4D and 1.2D + 1.6L" : "D and D + L")
                + "). " + (m == DesignMethod.LRFD ? "In §2.3.1 (3) the factor on L is kept at 1.0; the exception permitting"
                + " 0.5L is not taken." : ""));

        f.heading2("Live-load reduction", 40);
        if (!b.liveLoad().reduce()) {
            f.paragraph(f.body, "Live-load reduction is switched off in the plan: members and columns carry the full live load.");
        } else {
            f.bullet(f.body, "Every member and column reduces its ordinary floor live load with its own influence area:"
                    + " L = L0·(0.25 + 15/√(K_LL·A_T)) (Eq. 4.7-1, A_T in ft²) where K_LL·A_T ≥ 400 ft², but not below"
                    + " 0.50·L0 for members supporting one floor and 0.40·L0 for two or more.");
            f.bullet(f.body, "Live loads over 100 psf and garage loads: no reduction for one floor, at most 20 % for members"
                    + " supporting two floors or more (§4.7.3, §4.7.4). Assembly loads of 100 psf or less and loads marked"
                    + " not reducible are not reduced (§4.7.5).");
            f.bullet(f.body, "K_LL (Table 4.7-1): beams and girders 2, or 1 for an edge member with a cantilever slab beyond"
                    + " it; columns 4 when interior or exterior without a cantilever slab, 3 at an edge with a cantilever"
                    + " slab, 2 at a corner with a cantilever slab.");
            f.bullet(f.body, "A_T of a member is the deck area whose load it actually receives: its own tributary area plus"
                    + " what the members framing into it deliver" + (b.liveLoad().girderAreaDelivered() ? "."
                    : "; for girders at least half the bay on each side (plan setting)."));
            f.bullet(f.body, "A_T of a column accumulates the delivered areas of every floor above it; roof live load"
                    + " uses the roof area alone (§4.8.2, Lr between 12 psf and L0).");
            f.bullet(f.body, "Roofs used for assembly, as gardens or for another occupancy (roof live load given with a use"
                    + " other than ordinary) are reduced as floors (§4.8.3): their load is floor live load L of that use,"
                    + " reduced by §4.7 (assembly loads of 100 psf or less not at all), and such a roof counts as a floor"
                    + " in a column's A_T.");
            f.bullet(f.body, "Partition allowance (§4.3.2): carried as " + (b.liveLoad().partitionAsDead() ? "dead load."
                    : "reducible live load."));
            f.bullet(f.body, "Reactions passed from member to member are always unreduced; each member reduces what it receives.");
        }

        f.heading2("Deflection criteria", 30);
        f.paragraph(f.body, "Live load: " + limit(b.deflection().live()) + ". Dead plus live load, with the member's own weight: "
                + limit(b.deflection().total()) + ". Source: " + deflectionSource(b) + ". These are serviceability criteria of the"
                + " project, not clauses of " + AISC + ". Deflections are those of the bare steel section (E·Ix), simply"
                + " supported, under service loads, with the " + (b.liveLoad().reduce() && b.liveLoad().deflectionReduced()
                        ? "live load reduced as for strength (ASCE 7-16 §4.7, §4.8; plan setting deflectionLiveLoad \"reduced\")."
                        : "live load unreduced (common practice: serviceability is checked under the full live load; plan"
                                + " setting deflectionLiveLoad \"unreduced\", the default)."));
        if (!b.roofDeflection().isEmpty()) {
            f.paragraph(f.body, "Roof members take the roof rows of " + DeflectionLimits.SOURCE + " by the ceiling they carry"
                    + " (a plan setting per roof layout; the limit under Lr and under S is the same, so one live-load check"
                    + " covers both): " + roofDeflection(cx) + ".");
        }
        if (composite(cx)) {
            f.paragraph(f.body, "Composite members: live and superimposed dead load deflect the composite section on the"
                    + " lower-bound moment of inertia I_LB (" + AISC + " Commentary Eqs. C-I3-1, C-I3-2); the total"
                    + " deflection adds the part of the bare steel's deflection under the wet concrete that the camber does"
                    + " not take out. Same limits.");
        }
        f.paragraph(f.small, steelDeadLoadNote(b));

        f.heading2("How members and columns are designed", 40);
        f.bullet(f.body, "Every beam and girder is a simple span. Its statics (reactions, shear, moment, deflection) are"
                + " solved exactly for the actual line and point loads it carries, case by case.");
        f.bullet(f.body, "Beams carrying the deck are braced continuously by it (Lb = 0). Girders are braced where members"
                + " frame into them; each unbraced segment gets its own Cb from its moment diagram (Eq. F1-1).");
        f.bullet(f.body, "The lightest adequate section is chosen from the catalog, in order of nominal weight (shallower"
                + " first among equal weights)" + series(st, cx.us) + ". Each lighter candidate is rejected with the check it failed"
                + " worst; the member sheets list them. A size fixed in the plan is checked, not searched.");
        if (composite(cx)) {
            f.bullet(f.body, "Composite members (" + AISC + " Chapter I): for each candidate section the least number of"
                    + " studs that passes every check; among all sections the least steel weight plus an equivalent"
                    + " weight per stud and per cambered piece. Checked: composite flexure by the plastic stress"
                    + " distribution (I3.2a) with b_eff by I3.1a and Q_n by Eq. I8-1, shear on the steel alone (I4.2),"
                    + " the construction stage on the bare steel (F2, unshored), live and total deflection on I_LB"
                    + " (Commentary Eq. C-I3-1), less the camber. Their sheets add a section sketch and these quantities.");
        }
        f.bullet(f.body, "Members are designed in support order, so each member's reactions (with its own weight) are"
                + " applied to what supports it before that is designed.");
        f.bullet(f.body, "Columns: " + AISC + " E3 flexural buckling about both axes with K = 1 and the storey height as"
                + " unbraced length; shapes with slender elements (E7) are excluded. Column series: "
                + (b.columnSeries().isEmpty() ? "any" : String.join(", ", b.columnSeries())) + "; one section per tier,"
                + " a splice every " + b.spliceEvery() + " level" + (b.spliceEvery() == 1 ? "" : "s") + " from the foundation.");
        f.bullet(f.body, "The run checks equilibrium for every load case: everything applied against the sum of the"
                + " foundation reactions (part \"Takedown summary\").");

        f.heading2("How to read a member sheet", 40);
        f.paragraph(f.body, "One sheet covers every member of a floor layout with the same section, span, criteria and"
                + " loads; its heading lists their ids and it prints the numbers of the first. Each calculation line reads"
                + " symbol = formula = the formula with numbers = result, with the clause on the right. The lines are the"
                + " record the design engine wrote while checking the section, not a retyped summary. Loads are service"
                + " loads by case with live load already reduced; the member's own weight is added by the check itself"
                + " (line wsw). The shear and moment diagrams are those of the combination that governs flexure.");
    }

    /** True when the run has composite members. */
    static boolean composite(Context cx) {
        return org.baywright.report.RunSummary.hasComposite(cx.run.takedown());
    }

    private static String series(DesignSettings st, UnitSystem us) {
        List<String> parts = new ArrayList<>();
        if (!st.beamSeries().isEmpty()) {
            parts.add("beams limited to " + String.join(", ", st.beamSeries()));
        }
        if (!st.girderSeries().isEmpty()) {
            parts.add("girders limited to " + String.join(", ", st.girderSeries()));
        }
        if (st.maxBeamDepth() > 0) {
            parts.add("actual depth at most " + Fmt.v(st.maxBeamDepth(), Quantity.SECTION_LENGTH, us));
        }
        return parts.isEmpty() ? "" : " (" + String.join("; ", parts) + ")";
    }
}
