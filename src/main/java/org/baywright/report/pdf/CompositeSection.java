package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.List;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.IShapeDimensions;
import org.baywright.catalog.Section;
import org.baywright.design.Check;
import org.baywright.design.CompositeMember;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.CompositeDesign;
import org.baywright.design.SlabOnDeck;
import org.baywright.design.aisc360.CompositeFlexureI3;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.load.DesignMethod;
import org.baywright.report.RunSummary;
import org.baywright.report.drawing.MemberLabels;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.report.pdf.PageFlow.Style;
import org.baywright.takedown.CompositeResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * The composite section of a member sheet (AISC 360-16 Chapter I): a sketch of the section to scale
 * (slab with its deck ribs, the steel shape, the studs, the concrete stress block and the plastic
 * neutral axis), then the composite quantities each with its clause: b_eff by side, Q_n, ΣQ_n and the
 * stud layout, the plastic stress distribution, the construction stage, camber, I_LB and the
 * deflections. Every number is the design's; the derivations follow in the sheet's calculation lines.
 */
final class CompositeSection {
    /** Heading of the block, as the contents and the tests find it. */
    static final String HEADING = "Composite section (AISC 360-16 Chapter I)";

    private static final Rgb CONCRETE = new Rgb(0.86f, 0.86f, 0.84f);
    private static final Rgb RIB_CONCRETE = new Rgb(0.93f, 0.93f, 0.91f);
    private static final Rgb STRESS_BLOCK = new Rgb(0.98f, 0.83f, 0.62f);
    private static final Rgb STEEL = new Rgb(0.55f, 0.62f, 0.72f);
    private static final Rgb STEEL_EDGE = new Rgb(0.2f, 0.27f, 0.38f);
    private static final Rgb DECK = new Rgb(0.25f, 0.25f, 0.28f);
    private static final Rgb PNA = new Rgb(0.75f, 0.1f, 0.1f);
    /** Tallest the sketch is drawn, pt. */
    private static final float MAX_HEIGHT = 150;
    /** Room either side of the sketch for its labels, pt. */
    private static final float SIDE = 96;
    /** The stud drawn projects this far above the deck (I8.2d: at least 1½ in), m. */
    private static final double STUD_ABOVE_DECK = Units.IN.toSi(1.5);

    private CompositeSection() {
    }

    /** The block on the sheet of a composite member (nothing for a bare-steel one). */
    static void write(Context cx, MemberResult m) {
        CompositeResult cr = m.composite();
        if (cr == null || cr.design().section() == null) {
            return;
        }
        PageFlow f = cx.flow;
        CompositeDesign d = cr.design();
        f.heading3(HEADING, MAX_HEIGHT + 60);
        f.paragraph(f.small, "Written on the plan as " + MemberLabels.size(d.section().designation(), d.studs(), d.camber(), cx.us)
                + ": " + d.studs() + " studs, " + (d.camber() > 0 ? "camber " + MemberLabels.camber(d.camber(), cx.us) : "no camber")
                + ". Deck ribs " + cr.ribs() + " to the member; " + (cr.shored() ? "shored." : "unshored."));
        f.gap(2);
        sketch(f, cr, cx.us);
        f.gap(4);
        table(cx, m, cr);
    }

    // ---- the sketch ----------------------------------------------------------------------------

    private static void sketch(PageFlow f, CompositeResult cr, UnitSystem us) {
        CompositeDesign d = cr.design();
        CompositeMember beam = cr.designer().member();
        SlabOnDeck slab = beam.slab();
        Section s = d.section();
        IShapeDimensions dim = s.dims();
        CompositeFlexureI3.Result fl = d.flexure();
        double bl = d.beffLeft();
        double br = d.beffRight();
        double tc = slab.topping();
        double hr = slab.hr();
        double depth = tc + hr + dim.d();
        float above = 22;
        float below = 14;
        float room = f.width() - 2 * SIDE;
        // to scale at the height the sheet gives the sketch; a slab wider than the room is cut short each side
        float k = (float) (MAX_HEIGHT / depth); // pt per m
        float h = above + (float) (depth * k) + below;
        f.ensure(h);
        float cxp = f.left() + SIDE + room / 2; // the member's centreline
        boolean cutLeft = bl * k > room / 2;
        boolean cutRight = br * k > room / 2;
        float xl = cxp - (float) Math.min(bl * k, room / 2);
        float xr = cxp + (float) Math.min(br * k, room / 2);
        float yTop = f.y() - above;
        float yDeck = yTop - (float) (tc * k);
        float ySteel = yDeck - (float) (hr * k);
        Style lab = f.small;

        // concrete above the deck, the stress block over its top, then the ribs
        f.fillRect(xl, yDeck, xr - xl, yTop - yDeck, CONCRETE);
        if (fl != null && fl.a() > 0) {
            float ya = yTop - (float) (Math.min(fl.a(), tc + hr) * k);
            f.fillRect(xl, ya, xr - xl, yTop - ya, STRESS_BLOCK);
            f.dashed(true);
            f.line(xl, ya, xr, ya, 0.5f, Rgb.GREY);
            f.dashed(false);
            f.text(lab, xr + 4, ya - 2, "a = " + Fmt.v(fl.a(), Quantity.SECTION_LENGTH, us));
        }
        if (hr > 0) {
            if (beam.ribs() == DeckRibs.PARALLEL) {
                ribsAcross(f, slab, cxp, xl, xr, yDeck, ySteel, k);
            } else {
                // ribs run across the member: this cut is through a rib; their concrete does not count (I3.2c(2))
                f.fillRect(xl, ySteel, xr - xl, yDeck - ySteel, RIB_CONCRETE);
                f.line(xl, ySteel, xr, ySteel, 0.8f, DECK);
                f.dashed(true);
                f.line(xl, yDeck, xr, yDeck, 0.4f, DECK);
                f.dashed(false);
            }
        }
        f.line(xl, yTop, xr, yTop, 0.6f, Rgb.GREY);
        f.line(xl, ySteel, xr, ySteel, 0.6f, Rgb.GREY);
        slabEnd(f, xl, yTop, ySteel, cutLeft);
        slabEnd(f, xr, yTop, ySteel, cutRight);

        // the steel shape to scale
        float bf = (float) (dim.bf() * k);
        float tf = Math.max(0.8f, (float) (dim.tf() * k));
        float tw = Math.max(0.6f, (float) (dim.tw() * k));
        float yBot = ySteel - (float) (dim.d() * k);
        float[] xs = {cxp - bf / 2, cxp + bf / 2, cxp + bf / 2, cxp + tw / 2, cxp + tw / 2, cxp + bf / 2, cxp + bf / 2,
                cxp - bf / 2, cxp - bf / 2, cxp - tw / 2, cxp - tw / 2, cxp - bf / 2};
        float[] ys = {ySteel, ySteel, ySteel - tf, ySteel - tf, yBot + tf, yBot + tf, yBot, yBot, yBot + tf, yBot + tf,
                ySteel - tf, ySteel - tf};
        f.polygon(xs, ys, STEEL, STEEL_EDGE, 0.6f);

        // a stud over the web: shank and head
        var studs = beam.studs();
        float sd = Math.max(1.2f, (float) (studs.diameter() * k));
        float yHead = ySteel + (float) ((hr + STUD_ABOVE_DECK) * k);
        f.line(cxp, ySteel, cxp, yHead, sd, STEEL_EDGE);
        f.fillRect(cxp - sd * 0.8f, yHead - 0.4f, sd * 1.6f, Math.max(1f, sd * 0.45f), STEEL_EDGE);

        // the plastic neutral axis
        if (fl != null) {
            float yp = ySteel - (float) (fl.pnaDepth() * k);
            float half = fl.pna() == CompositeFlexureI3.Pna.SLAB ? (xr - xl) / 2 + 6 : bf / 2 + 26;
            f.dashed(true);
            f.line(cxp - half, yp, cxp + half, yp, 0.9f, PNA);
            f.dashed(false);
            f.textRight(f.small.withColor(PNA), cxp - half - 3, yp - 2, "PNA (" + RunSummary.pnaName(fl.pna()) + ")");
        }

        // widths above the slab: b_eff each side of the centreline
        float yd = yTop + 9;
        // a side without slab (the member on the slab edge) gets no dimension; the sheet's table states 0
        if (bl > 0) {
            dimension(f, xl, cxp, yd);
            f.textCentre(lab, (xl + cxp) / 2, yd + 3, "b_eff,left = " + Fmt.v(bl, Quantity.SECTION_LENGTH, us));
        }
        if (br > 0) {
            dimension(f, cxp, xr, yd);
            f.textCentre(lab, (cxp + xr) / 2, yd + 3, "b_eff,right = " + Fmt.v(br, Quantity.SECTION_LENGTH, us));
        }
        f.dashed(true);
        f.line(cxp, yd + 2, cxp, yBot - 4, 0.3f, Rgb.GREY);
        f.dashed(false);

        // depths on the left
        float xt = xl - 4;
        f.textRight(lab, xt, (yTop + yDeck) / 2 - 2, "t_c = " + Fmt.v(tc, Quantity.SECTION_LENGTH, us));
        if (hr > 0) {
            f.textRight(lab, xt, (yDeck + ySteel) / 2 - 2, "h_r = " + Fmt.v(hr, Quantity.SECTION_LENGTH, us));
        }
        f.text(lab, cxp + bf / 2 + 6, (ySteel + yBot) / 2 - 2, s.designation() + ", d = " + Fmt.v(dim.d(), Quantity.SECTION_LENGTH, us));
        f.textCentre(f.smallGrey, cxp, yBot - below + 3, (beam.ribs() == DeckRibs.PARALLEL
                ? "ribs parallel to the member: the concrete in the ribs counts (I3.2c(3))"
                : beam.ribs() == DeckRibs.PERPENDICULAR ? "ribs perpendicular to the member: concrete above the deck only (I3.2c(2))"
                        : "solid slab") + "; stress block shaded, PNA dashed; to scale" + (cutLeft || cutRight
                                ? ", the slab cut short" : ""));
        f.y(f.y() - h);
    }

    /** The ribs seen in section where they run along the member: one trapezoid per rib, at the pitch. */
    private static void ribsAcross(PageFlow f, SlabOnDeck slab, float cxp, float xl, float xr, float yDeck, float ySteel,
            float k) {
        float pitch = (float) (slab.pitch() * k);
        float wr = (float) (slab.wr() * k);
        if (pitch < 2) {
            f.fillRect(xl, ySteel, xr - xl, yDeck - ySteel, CONCRETE);
            return;
        }
        // a rib over the member (studs sit in it), then every pitch either side, as far as b_eff reaches
        float bottom = Math.max(0.5f, 0.8f * wr);
        float top = Math.min(pitch * 0.95f, 1.2f * wr);
        List<Float> centres = new ArrayList<>();
        for (float c = cxp; c - top / 2 >= xl - 0.01f; c -= pitch) {
            centres.add(0, c);
        }
        for (float c = cxp + pitch; c + top / 2 <= xr + 0.01f; c += pitch) {
            centres.add(c);
        }
        List<Float> dx = new ArrayList<>();
        List<Float> dy = new ArrayList<>();
        dx.add(xl);
        dy.add(yDeck);
        for (float c : centres) {
            f.polygon(new float[] {c - top / 2, c + top / 2, c + bottom / 2, c - bottom / 2},
                    new float[] {yDeck, yDeck, ySteel, ySteel}, CONCRETE, null, 0);
            dx.add(c - top / 2);
            dy.add(yDeck);
            dx.add(c - bottom / 2);
            dy.add(ySteel);
            dx.add(c + bottom / 2);
            dy.add(ySteel);
            dx.add(c + top / 2);
            dy.add(yDeck);
        }
        dx.add(xr);
        dy.add(yDeck);
        float[] px = new float[dx.size()];
        float[] py = new float[dy.size()];
        for (int i = 0; i < px.length; i++) {
            px[i] = dx.get(i);
            py[i] = dy.get(i);
        }
        f.polyline(px, py, DECK, 0.8f);
    }

    /** The end of the drawn slab: its edge, or a break line where b_eff runs on beyond the sketch. */
    private static void slabEnd(PageFlow f, float x, float yTop, float yBot, boolean cut) {
        if (!cut) {
            f.line(x, yTop, x, yBot, 0.6f, Rgb.GREY);
            return;
        }
        float m = (yTop + yBot) / 2;
        f.fillRect(x - 2.5f, yBot - 1, 5, yTop - yBot + 2, Rgb.WHITE_PAGE);
        f.polyline(new float[] {x, x, x - 2.5f, x + 2.5f, x, x}, new float[] {yTop + 2, m + 2.5f, m + 1, m - 1, m - 2.5f, yBot - 2},
                Rgb.GREY, 0.5f);
    }

    private static void dimension(PageFlow f, float x0, float x1, float y) {
        f.line(x0, y, x1, y, 0.4f, Rgb.GREY);
        f.line(x0, y - 2.5f, x0, y + 2.5f, 0.4f, Rgb.GREY);
        f.line(x1, y - 2.5f, x1, y + 2.5f, 0.4f, Rgb.GREY);
    }

    // ---- the quantities ------------------------------------------------------------------------

    /** The floor's construction live load, as the plan gives it. */
    private static String constructionLive(Context cx, MemberResult m) {
        return cx.run.plan().floor(m.floor()).map(fl -> Fmt.v(fl.composite().constructionLive(), Quantity.AREA_LOAD, cx.us))
                .orElse("as the plan gives it");
    }

    private static void table(Context cx, MemberResult m, CompositeResult cr) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        CompositeDesign d = cr.design();
        CompositeMember beam = cr.designer().member();
        CompositeCriteria crit = cr.designer().criteria();
        CompositeFlexureI3.Result fl = d.flexure();
        Table t = new Table().left("Quantity", 30).left("Value", 52).left("Clause", 22).fontSize(7f);
        t.row("Effective width b_eff", Fmt.v(d.beff(), Quantity.SECTION_LENGTH, us) + " = " + Fmt.v(d.beffLeft(),
                Quantity.SECTION_LENGTH, us) + " left + " + Fmt.v(d.beffRight(), Quantity.SECTION_LENGTH, us)
                + " right; each side the least of span/8, half the distance to the next member, the distance to the slab edge",
                "AISC 360-16 I3.1a");
        var st = beam.studs();
        t.row("Stud strength Q_n", Fmt.v(d.qn(), Quantity.FORCE, us) + " per stud: " + Fmt.v(st.diameter(), Quantity.SECTION_LENGTH, us)
                + " stud, Fu = " + Fmt.v(st.fu(), Quantity.STRESS, us) + ", " + st.perRib()
                + (beam.ribs() == DeckRibs.PERPENDICULAR ? " per rib, " + st.position().name().toLowerCase(java.util.Locale.ROOT)
                        + " position" : " per row") + " (R_g, R_p by the deck)", "I8.2a, Eq. I8-1");
        t.row("Studs", d.studsPerHalf() + " between each support and midspan, " + d.studs() + " on the member; ΣQ_n = "
                + d.studsPerHalf() + " × " + Fmt.v(d.qn(), Quantity.FORCE, us) + " = " + Fmt.v(d.sumQn(), Quantity.FORCE, us)
                + "; up to " + cr.designer().maxStudsPerHalf() + " per half span fit", "I8.2c, I8.2d");
        if (fl != null) {
            t.row("Composite action", CalcFormat.sig(100 * fl.degree()) + " % (C = " + Fmt.v(fl.c(), Quantity.FORCE, us)
                    + " of min(V′c, V′s) = " + Fmt.v(fl.full(), Quantity.FORCE, us) + "; least allowed "
                    + CalcFormat.sig(100 * crit.minDegree()) + " %)", "I3.2d(1); Commentary I3.2d");
            t.row("Plastic neutral axis", "in the " + RunSummary.pnaName(fl.pna()) + ", " + (fl.pnaDepth() < 0
                    ? Fmt.v(-fl.pnaDepth(), Quantity.SECTION_LENGTH, us) + " above" : Fmt.v(fl.pnaDepth(), Quantity.SECTION_LENGTH, us)
                    + " below") + " the top of the steel; a = " + Fmt.v(fl.a(), Quantity.SECTION_LENGTH, us) + ", Y2 = "
                    + Fmt.v(fl.d1(), Quantity.SECTION_LENGTH, us), "I3.2a");
            Check flex = d.check("composite flexure");
            t.row(crit.method() == DesignMethod.LRFD ? "Flexural strength φ_b·M_n" : "Flexural strength M_n/Ω_b",
                    "M_n = " + Fmt.v(fl.mn(), Quantity.MOMENT, us) + (flex == null ? "" : "; available "
                            + Fmt.v(flex.capacity(), Quantity.MOMENT, us) + " against " + Fmt.v(flex.demand(), Quantity.MOMENT, us)
                            + ", ratio " + Fmt.ratio(flex.ratio())), "I3.2a");
        }
        Check cons = d.check("construction flexure");
        t.row("Construction stage", cr.shored() ? "shored: every load on the composite section, none on the bare steel"
                : "bare steel under the wet slab (" + Fmt.v(d.slabWeight(), Quantity.AREA_LOAD, us) + ") and the construction live"
                        + " load (" + constructionLive(cx, m) + "): ratio " + Fmt.ratio(d.constructionRatio())
                        + (cons == null ? "" : " (" + Fmt.v(cons.demand(), Quantity.MOMENT, us) + " of " + Fmt.v(cons.capacity(),
                                Quantity.MOMENT, us) + ")"), cons == null ? "" : cons.clause());
        t.row("Camber", cr.shored() ? "none (shored)" : "Δ_pre = " + Fmt.v(d.preDeflection(), Quantity.SECTION_LENGTH, us)
                + " under the wet slab and the steel; camber " + (d.camber() > 0 ? Fmt.v(d.camber(), Quantity.SECTION_LENGTH, us)
                        + " (" + MemberLabels.camber(d.camber(), us) + ")" : "none") + ": " + camberRule(crit, us),
                "common practice");
        t.row("Lower-bound I", "I_LB = " + Fmt.v(d.ilb(), Quantity.INERTIA, us) + " (steel I_x = "
                + Fmt.v(d.section().props().ix(), Quantity.INERTIA, us) + ", full transformed I_tr = "
                + Fmt.v(d.itr(), Quantity.INERTIA, us) + ")", "Commentary Eqs. C-I3-1, C-I3-2");
        for (String name : List.of("live-load deflection", "total-load deflection")) {
            Check c = d.check(name);
            if (c != null) {
                t.row(Character.toUpperCase(name.charAt(0)) + name.substring(1), Fmt.v(c.demand(), Quantity.SECTION_LENGTH, us)
                        + " ≤ " + Fmt.v(c.capacity(), Quantity.SECTION_LENGTH, us) + ", ratio " + Fmt.ratio(c.ratio())
                        + (c.note() == null || c.note().isEmpty() ? "" : "; " + c.note()), c.clause());
            }
        }
        Check shear = d.check("shear");
        if (shear != null) {
            t.row("Shear, steel alone", Fmt.v(shear.demand(), Quantity.FORCE, us) + " of " + Fmt.v(shear.capacity(), Quantity.FORCE, us)
                    + ", ratio " + Fmt.ratio(shear.ratio()), shear.clause());
        }
        if (cr.bare() != null && cr.bare().section() != null) {
            t.row("Without composite action", cr.bare().section().designation() + ", "
                    + Fmt.weightPerLength(cr.bare().section().weight(), us) + " (bare steel under the same loads), against "
                    + Fmt.weightPerLength(d.section().weight(), us) + " here", "");
        }
        t.draw(f);
    }

    private static String camberRule(CompositeCriteria c, UnitSystem us) {
        var r = c.camber();
        if (r.fraction() == 0) {
            return "camber off";
        }
        return CalcFormat.sig(100 * r.fraction()) + " % of Δ_pre, rounded down to steps of " + Fmt.v(r.increment(),
                Quantity.SECTION_LENGTH, us) + ", none below " + Fmt.v(r.minimum(), Quantity.SECTION_LENGTH, us) + " or on spans under "
                + Fmt.v(r.minSpan(), Quantity.SPAN_LENGTH, us);
    }
}
