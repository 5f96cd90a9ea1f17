package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.baywright.calc.Quantity;
import org.baywright.load.DesignMethod;
import org.baywright.load.LiveLoadRules;
import org.baywright.load.LoadCase;
import org.baywright.load.Combinations;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.report.BaySummary;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;
import org.baywright.units.UnitSystem;

/**
 * What a plan checker asks for beside the member sheets: the statements of the design basis (what
 * the design assumes and what it does not check), a block for the engineer of record, and the end
 * reactions of every member for delegated connection design.
 */
final class CheckerPages {
    private CheckerPages() {
    }

    // ---- statements and approval --------------------------------------------------------------

    /** Statements of the design basis and the engineer of record's block. */
    static void statements(Context cx) {
        PageFlow f = cx.flow;
        DesignSettings st = cx.run.plan().settings();
        cx.part("Statements for review");
        f.paragraph(f.body, "What this design assumes, and what it leaves to others. Read with the design basis before it.");
        f.gap(3);
        f.heading2("Scope and assumptions", 40);
        f.bullet(f.body, "Codes: " + FrontMatter.AISC + " (" + (cx.method() == DesignMethod.LRFD ? "LRFD" : "ASD") + ") and "
                + FrontMatter.ASCE + " for loads and combinations; the deflection limits of IBC Table 1604.3 as project"
                + " criteria. The building code edition adopted where the building stands governs; the engineer of record"
                + " confirms that these editions are the ones it adopts.");
        f.bullet(f.body, "Risk category and importance factors are set by the engineer of record. The gravity loads here"
                + " do not depend on them, except snow: the snow load in the plan is taken as the design snow load, with its"
                + " importance and exposure factors already applied.");
        f.bullet(f.body, "Gravity only. The lateral force-resisting system (bracing or moment frames, diaphragm, collectors)"
                + " is by others. Columns are designed as leaning columns in a braced frame, K = 1, the storey height as"
                + " unbraced length about both axes, for axial load and the moments of the beam and girder reactions at "
                + Fmt.n(cx.basis().connectionEccentricity(), Quantity.SECTION_LENGTH, cx.us) + " "
                + Fmt.unit(Quantity.SECTION_LENGTH, cx.us) + " beyond the column face (plan setting; common practice),"
                + " with live load on one side where that governs (ASCE 7-16 §4.3.3), split between the storeys above and"
                + " below by stiffness, by AISC 360-16 H1.1 with B1 of Appendix 8 (part \"Column moments and interaction\").");
        boolean composite = FrontMatter.composite(cx);
        if (composite) {
            f.bullet(f.body, "Beams and girders are simple spans. Members on a floor whose deck carries a described slab act"
                    + " with it (AISC 360-16 Chapter I): effective width by I3.1a from the plan's geometry, headed studs by"
                    + " I8 (Q_n, spacing and the ribs available), positive flexure by the plastic stress distribution of"
                    + " I3.2a, shear on the steel alone; unshored, the bare steel carries the wet concrete, the deck, its own"
                    + " weight and the construction live load, and is cambered for part of that deflection by the rule each"
                    + " sheet states; deflections after the concrete hardens on the lower-bound I_LB (Commentary Eq. C-I3-1)."
                    + " Other members (roofs, overhangs, members on a non-composite floor) are bare steel; no continuity or"
                    + " end restraint is counted. The studs, camber, slab and shoring shown on the framing plans are part of"
                    + " the design.");
        } else {
            f.bullet(f.body, "Beams and girders are simple spans of bare steel, or spans overhanging one support (a cantilever"
                    + " with its backspan, live load patterned by ASCE 7-16 §4.3.3): no composite action with the slab is counted"
                    + " (conservative for strength and stiffness), and no continuity or end restraint.");
        }
        LiveLoadRules ll = cx.basis().liveLoad();
        f.bullet(f.body, "Deflections are computed on the " + (composite ? "bare steel section (composite members: on I_LB"
                + " after the concrete hardens, the pre-composite deflection less the camber added to the total)"
                : "bare steel section") + " under service loads, with the live load "
                + (!ll.reduce() ? "unreduced (live-load reduction is off)"
                        : ll.deflectionReduced() ? "as reduced for the member's strength design (plan setting)"
                                : "unreduced (common practice for serviceability; the strength checks use the reduced live load)")
                + ". Limits: live load " + FrontMatter.limit(st.liveDeflection()) + ", total "
                + FrontMatter.limit(st.totalDeflection()) + (cx.basis().roofDeflection().isEmpty() ? "."
                        : " for floor members; roof members by the roof rows of IBC Table 1604.3: "
                                + FrontMatter.roofDeflection(cx) + "."));
        f.bullet(f.body, "Deck: its span direction is taken from the plan; its clear span between the members that carry it"
                + " and its overhang at edges are measured from the plan and checked against the limits the plan gives for"
                + " each deck (entered from the deck maker's published tables; 15 ft span and 2 ft overhang when none are"
                + " given, common practice for a 3 in deck), and deck cantilevering with no span behind it is refused. The"
                + " deck's strength as a form and as a floor is checked by the engineer of record from those tables.");
        boolean bays = BaySummary.present(cx.run);
        if (bays) {
            f.bullet(f.body, vibrationStatement(cx));
        }
        f.heading2("Not checked in this package", 30);
        f.bullet(f.body, (bays ? "Floor vibration from rhythmic excitation (aerobics, dancing), near sensitive equipment"
                + " (operating rooms, laboratories), from machinery, and of floors above 9 Hz (high-frequency floors,"
                + " listed as outside the method); roofs and floors without a described slab (listed as not checked);"
                + " ponding of roofs," : "Floor vibration from walking, ponding of roofs,") + " wind and seismic loads and drift, fire resistance,"
                + " connections (their design is delegated; the end reactions are in part \"End reactions\"), torsion of"
                + " members carrying a cantilevered slab, web local yielding and crippling at bearings and point loads,"
                + " foundations (their reactions are given), erection stability and construction loads"
                + (composite ? " (other than the construction stage of unshored composite members), the deck as a form under"
                        + " the wet concrete, and the slab's own reinforcement, shrinkage and cracking." : "."));

        f.heading2("Engineer of record", 120);
        f.paragraph(f.small, "To be completed by the licensed professional engineer responsible for the design, after"
                + " checking these calculations and the framing plans.");
        approvalBlock(f);
    }

    /** What the floor-vibration check is, the limit it uses and how to read it (only when the run has bays). */
    static String vibrationStatement(Context cx) {
        String limit = "";
        for (org.baywright.takedown.BayResult b : cx.run.bays()) {
            if (b.checked()) {
                limit = " against a_o/g = " + org.baywright.calc.CalcFormat.sig(b.result().limit() * 100) + " % for "
                        + b.settings().use().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ')
                        + " (DG11 2nd ed. Table 4-1), damping β = "
                        + org.baywright.calc.CalcFormat.sig(b.inputs().vibration().beta());
                break;
            }
        }
        return "Floor vibration from walking is checked for every bay of a floor whose deck carries a described slab, by"
                + " AISC Design Guide 11 (2nd ed., 2016) Chapter 4 for low-frequency floors: the peak acceleration a_p/g"
                + " of the combined beam and girder mode" + limit + ", under realistic loads rather than design loads"
                + " (part \"" + VibrationPages.TITLE + "\"). It is a serviceability check of how the floor feels underfoot."
                + " A bay below 3 Hz is flagged; a bay above 9 Hz is outside the method and is listed as such, not as"
                + " meeting the limit.";
    }

    /** A ruled block with fields to fill by hand. */
    private static void approvalBlock(PageFlow f) {
        String[] fields = {"Name", "Licence number and jurisdiction", "Firm", "Checked pages / members", "Date", "Signature and seal"};
        float rowH = 22;
        float h = rowH * fields.length + 6;
        f.ensure(h);
        float top = f.y();
        float x0 = f.left();
        float w = f.width();
        f.strokeRect(x0, top - h, w, h, 0.8f, PageFlow.Rgb.RULE);
        float y = top - 3;
        for (String field : fields) {
            f.text(f.small, x0 + 6, y - 12, field);
            f.line(x0 + w * 0.32f, y - rowH + 5, x0 + w - 8, y - rowH + 5, 0.5f, PageFlow.Rgb.GREY);
            y -= rowH;
        }
        f.y(top - h);
    }

    // ---- end reactions ------------------------------------------------------------------------

    /** One end of one member: what it bears on and its reactions by case. */
    record EndReaction(String member, String section, String end, String support, double[] byCase, double factored,
            String combination) {
    }

    /**
     * The end reactions of every designed member of a floor layout, by case (service, live load
     * unreduced) and factored under the combination that gives the largest value at that end.
     */
    static List<EndReaction> reactions(List<MemberResult> members, DesignMethod method) {
        List<EndReaction> out = new ArrayList<>();
        List<MemberResult> sorted = new ArrayList<>(members);
        sorted.sort(Comparator.comparing(MemberResult::id));
        for (MemberResult m : sorted) {
            if (m.design() == null || m.design().section() == null) {
                continue;
            }
            out.add(end(m, "start", m.startSupport(), Component.byCase(m.startReaction()), method));
            out.add(end(m, "end", m.endSupport(), Component.byCase(m.endReaction()), method));
        }
        return out;
    }

    private static EndReaction end(MemberResult m, String which, String support, double[] byCase, DesignMethod method) {
        Set<LoadCase> present = EnumSet.noneOf(LoadCase.class);
        for (LoadCase c : LoadCase.values()) {
            if (byCase[c.ordinal()] != 0) {
                present.add(c);
            }
        }
        present.add(LoadCase.D);
        Combinations.Governing g = Combinations.governing(byCase, Combinations.gravity(method, present));
        return new EndReaction(m.id(), m.section(), which, support, byCase, g.value(), g.combination().name());
    }

    /** The part "End reactions": a table per floor layout. */
    static void endReactions(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        TakedownResult t = cx.run.takedown();
        DesignMethod method = cx.method();
        cx.part("End reactions for connection design");
        f.paragraph(f.body, "Every member end: what it bears on, the service reaction by load case with the member's own"
                + " weight in D and the live load unreduced (conservative for the connection), and the largest "
                + (method == DesignMethod.LRFD ? "factored" : "ASD") + " reaction with the combination that gives it ("
                + FrontMatter.ASCE + (method == DesignMethod.LRFD ? " §2.3.1" : " §2.4.1") + "). Forces in "
                + Fmt.unit(Quantity.FORCE, us) + ". Connections are to be designed by the fabricator's engineer for these"
                + " reactions, and checked by the engineer of record.");
        for (Floor fl : cx.run.plan().floors()) {
            List<MemberResult> ms = t.members().getOrDefault(fl.id(), List.of());
            if (ms.isEmpty()) {
                continue;
            }
            f.heading2("Floor layout " + Summaries.floorLabel(cx, fl.id()), 60);
            Table tb = new Table().left("Member", 14).left("Section", 11).left("End", 6).left("Bears on", 17).right("D", 8)
                    .right("L", 8).right("Lr", 8).right("S", 8).right(method == DesignMethod.LRFD ? "Ru" : "Ra", 9)
                    .left("Combination", 17).fontSize(7f);
            for (EndReaction r : reactions(ms, method)) {
                tb.row(r.member(), r.section(), r.end(), r.support().isEmpty() ? "(none)" : r.support(),
                        force(r.byCase()[LoadCase.D.ordinal()], us), force(r.byCase()[LoadCase.L.ordinal()], us),
                        force(r.byCase()[LoadCase.LR.ordinal()], us), force(r.byCase()[LoadCase.S.ordinal()], us),
                        force(r.factored(), us), r.combination());
            }
            tb.draw(f);
        }
    }

    private static String force(double newtons, UnitSystem us) {
        return newtons == 0 ? "–" : us.forceNumber(newtons);
    }
}
