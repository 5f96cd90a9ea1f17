package org.baywright.report.drawing;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.baywright.calc.Caution;
import org.baywright.design.MemberStatus;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;
import org.baywright.load.LoadCombination;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/** Lays out one level's framing plan sheet. All distances named {@code …Mm} are paper millimetres. */
final class SheetBuilder {
    private static final Rgb CAPTION_INK = new Rgb(90, 90, 90);
    private static final Pen GRID_PEN = PlanPicture.GRID_PEN;
    private static final Pen THIN = PlanPicture.THIN;
    private static final Pen FRAME = Pen.solid(0.7, Rgb.INK);
    private static final Pen SLAB_PEN = PlanPicture.SLAB_PEN;
    private static final Pen OPENING_PEN = PlanPicture.OPENING_PEN;
    private static final Pen AREA_LOAD_PEN = PlanPicture.AREA_LOAD_PEN;
    private static final Hatch OPENING_HATCH = PlanPicture.OPENING_HATCH;
    private static final Hatch AREA_LOAD_HATCH = PlanPicture.AREA_LOAD_HATCH;
    private static final Pen OVER_PEN = PlanPicture.OVER_PEN;
    private static final double GIRDER_WEIGHT = PlanPicture.GIRDER_WEIGHT;
    private static final double BEAM_WEIGHT = PlanPicture.BEAM_WEIGHT;
    private static final double GIRDER_BAND = PlanPicture.GIRDER_BAND;
    private static final double BEAM_BAND = PlanPicture.BEAM_BAND;

    private final RunResult run;
    private final Plan plan;
    private final Level level;
    private final Floor floor;
    private final List<MemberResult> members;
    private final DrawingOptions options;
    private final UnitSystem units;
    private final Paper paper;
    private final DesignMethod method;
    private final double t;
    private final List<Primitive> out = new ArrayList<>();

    private PlanPicture picture;
    private Viewport viewport;
    private DrawingScale scale;

    SheetBuilder(RunResult run, String levelName, DrawingOptions options) {
        this.run = run;
        this.plan = run.plan();
        Optional<Level> lv = plan.levels().stream().filter(l -> l.name().equals(levelName)).findFirst();
        if (lv.isEmpty()) {
            throw new IllegalArgumentException("no level \"" + levelName + "\" in plan \"" + plan.name() + "\"; its levels are: "
                    + String.join(", ", plan.levels().stream().map(Level::name).toList()));
        }
        if (run.takedown() == null) {
            throw new IllegalArgumentException("plan \"" + plan.name() + "\" has problems that prevent a run, so there is no"
                    + " framing to draw; fix them first (baywright check)");
        }
        this.level = lv.get();
        String floorId = run.takedown().levelFloors().getOrDefault(levelName, level.floor());
        this.floor = plan.floor(floorId).orElseThrow(
                () -> new IllegalArgumentException("level \"" + levelName + "\" refers to a floor layout \"" + floorId
                        + "\" that the plan does not have"));
        this.members = run.takedown().members().getOrDefault(floorId, List.of());
        this.options = options;
        this.units = options.units() != null ? options.units() : run.basis().units();
        this.paper = options.paper() != null ? options.paper() : this.units == UnitSystem.SI ? Paper.ISO_A1 : Paper.ARCH_D;
        this.method = run.basis().method();
        this.t = paper.textSize();
    }


    FramingPlanDrawing build() {
        double w = paper.width();
        double h = paper.height();
        double margin = w > 500 ? 12 : 8;
        double panelW = Math.max(95, Math.min(160, 0.19 * w));
        double panelX = w - margin - panelW;
        double viewTitleH = 6 * t;
        double ax0 = margin + 4;
        double ax1 = panelX - 4;
        double ay0 = margin + 4 + viewTitleH;
        double ay1 = h - margin - 4;

        // the plan itself: the same picture the editor's canvas shows
        picture = new PlanPicture(plan, floor, members, List.of(),
                PlanPicture.columnMarks(plan, run.takedown().columns(), level.name()),
                PlanPicture.Style.sheet(units, t, options.reactions(), method));
        double[] e = picture.extents();
        double ann = picture.annotationMm();
        double bw = Math.max(e[2] - e[0], 1e-3);
        double bh = Math.max(e[3] - e[1], 1e-3);
        scale = DrawingScale.fit(units, bw, bh, ax1 - ax0 - 2 * ann, ay1 - ay0 - 2 * ann);
        viewport = new Viewport(scale.denominator(), new Pt((e[0] + e[2]) / 2, (e[1] + e[3]) / 2),
                new Pt((ax0 + ax1) / 2, (ay0 + ay1) / 2));
        out.addAll(picture.build(viewport.metresPerMm()));
        List<org.baywright.takedown.BayResult> bays = options.bays() ? run.bays().stream()
                .filter(b -> b.levels().contains(level.name()) && b.checked()).toList() : List.of();
        out.addAll(BayMarks.of(bays, 0.85 * t, viewport.metresPerMm()));

        sheet(w, h, margin, panelX);
        viewTitle(ax0, margin + 4);
        double y = northAndScale(panelX + 4, w - margin - 4, h - margin - 4);
        y = legend(panelX + 4, w - margin - 4, y - 2 * t);
        double titleTop = titleBlock(panelX, w - margin, margin);
        List<String> slab = SlabNotes.of(floor, members, units);
        if (!slab.isEmpty()) {
            y = block("SLAB AND STUDS", slab, panelX + 4, w - margin - 4, y - 1.5 * t, titleTop);
        }
        if (!bays.isEmpty()) {
            double limit = bays.get(0).result().limit();
            y = block("FLOOR VIBRATION (AISC DG11)", List.of(
                    "At each bay checked for walking (DG11 2nd ed., low-frequency floors): its frequency f_n and peak"
                            + " acceleration a_p/g, limit a_o/g = " + org.baywright.calc.CalcFormat.sig(100 * limit) + " %.",
                    "Bold, after a solid diamond: the bay exceeds the limit. \"above 9 Hz\": outside the method."),
                    panelX + 4, w - margin - 4, y - 1.5 * t, titleTop);
        }
        notes(panelX + 4, w - margin - 4, y - 1.5 * t, titleTop);

        List<Primitive> sorted = new ArrayList<>(out);
        sorted.sort(Comparator.comparingInt(p -> p.layer().ordinal()));
        return new FramingPlanDrawing(plan.name(), level.name(), floor.id(), paper, units, scale, viewport, sorted);
    }

    // ---------------------------------------------------------------- reactions

    /** The largest combined reaction of a set of combinations, N. */
    static double governing(double[] byCase, List<LoadCombination> combos) {
        return Math.max(0, Combinations.governing(byCase, combos).value());
    }

    // ---------------------------------------------------------------- sheet, legend, notes, title block

    private void sheet(double w, double h, double margin, double panelX) {
        out.add(new Primitive.Path(Layer.SHEET, Space.PAPER, List.of(new Pt(margin, margin), new Pt(w - margin, margin),
                new Pt(w - margin, h - margin), new Pt(margin, h - margin)), true, FRAME, null, null));
        out.add(new Primitive.Line(Layer.SHEET, Space.PAPER, new Pt(panelX, margin), new Pt(panelX, h - margin),
                Pen.solid(0.5, Rgb.INK)));
    }

    private void viewTitle(double x, double bottom) {
        String title = level.name().toUpperCase(Locale.ROOT) + " FRAMING PLAN";
        double big = 1.8 * t;
        double baseline = bottom + 2.6 * t;
        text(Layer.SHEET, new Pt(x + 2, baseline), title, big, Anchor.START_BASELINE, true);
        double tw = TextMetrics.width(title, big, true);
        out.add(new Primitive.Line(Layer.SHEET, Space.PAPER, new Pt(x + 2, baseline - 0.5 * t), new Pt(x + 2 + tw,
                baseline - 0.5 * t), Pen.solid(0.5, Rgb.INK)));
        List<String> sharing = plan.levels().stream().filter(l -> floorIdOf(l).equals(floor.id())).map(Level::name).toList();
        String layout = "SCALE " + scale.label() + " — floor layout \"" + floor.id() + "\""
                + (floor.name() == null || floor.name().isBlank() ? "" : " (" + floor.name() + ")")
                + (sharing.size() > 1 ? ", used at " + String.join(", ", sharing) : "");
        text(Layer.SHEET, new Pt(x + 2, baseline - 2.0 * t), layout, 0.9 * t, Anchor.START_BASELINE, false);
    }

    private String floorIdOf(Level l) {
        return run.takedown().levelFloors().getOrDefault(l.name(), l.floor());
    }

    /** North arrow and scale bar at the top of the panel; returns the y below them. */
    private double northAndScale(double x0, double x1, double top) {
        double r = 2.6 * t;
        double cx = x0 + r + 0.5 * t;
        double cy = top - 1.6 * t - r;
        out.add(new Primitive.Circle(Layer.LEGEND, Space.PAPER, new Pt(cx, cy), r, Pen.solid(0.35, Rgb.INK), null));
        Pt tip = new Pt(cx, cy + 0.82 * r);
        Pt notch = new Pt(cx, cy - 0.35 * r);
        out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(tip, new Pt(cx - 0.42 * r, cy - 0.75 * r), notch), true,
                Pen.solid(0.25, Rgb.INK), Rgb.INK, null));
        out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(tip, notch, new Pt(cx + 0.42 * r, cy - 0.75 * r)), true,
                Pen.solid(0.25, Rgb.INK), Rgb.WHITE, null));
        text(Layer.LEGEND, new Pt(cx, cy + r + 0.45 * t), "N", 1.2 * t, Anchor.MIDDLE_BASELINE, true);

        // scale bar: four equal steps
        double bx0 = cx + r + 3 * t;
        double avail = x1 - bx0 - 2 * t;
        double[] steps = units == UnitSystem.SI ? new double[] {0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500}
                : new double[] {1, 2, 5, 10, 20, 25, 50, 100, 200, 500};
        double unitM = units == UnitSystem.SI ? 1 : Units.FT_.toSi(1);
        double step = steps[0];
        for (double s : steps) {
            if (4 * s * unitM * scale.mmPerMetre() <= avail) {
                step = s;
            }
        }
        double segMm = step * unitM * scale.mmPerMetre();
        double barH = 0.6 * t;
        double by = cy - 0.2 * t;
        text(Layer.LEGEND, new Pt(bx0, by + barH + 0.8 * t), "SCALE " + scale.label(), 0.8 * t, Anchor.START_BASELINE, true);
        for (int i = 0; i < 4; i++) {
            double xa = bx0 + i * segMm;
            out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(new Pt(xa, by), new Pt(xa + segMm, by),
                    new Pt(xa + segMm, by + barH), new Pt(xa, by + barH)), true, Pen.solid(0.18, Rgb.INK),
                    i % 2 == 0 ? Rgb.INK : Rgb.WHITE, null));
        }
        String unit = units == UnitSystem.SI ? "m" : "ft";
        for (int i = 0; i <= 4; i++) {
            String label = trim(step * i) + (i == 4 ? " " + unit : "");
            text(Layer.LEGEND, new Pt(bx0 + i * segMm, by - 0.4 * t), label, 0.7 * t, Anchor.MIDDLE_TOP, false);
        }
        return cy - r - 0.8 * t;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%s", v);
    }

    /** The legend; returns the y below it. */
    private double legend(double x0, double x1, double top) {
        double size = 0.8 * t;
        double sampleW = 9 * t;
        double tx = x0 + sampleW + 1.2 * t;
        double textW = x1 - tx;
        double y = top;
        text(Layer.LEGEND, new Pt(x0, y), "LEGEND", t, Anchor.START_TOP, true);
        y -= 2.2 * t;
        String forceUnit = units.force().symbol();
        String reactionSample;
        String reactionText;
        if (options.reactions() == ReactionMode.FACTORED) {
            reactionSample = "R=" + (units == UnitSystem.SI ? "107kN" : "24.1k");
            reactionText = "End reaction, " + forceUnit + ": " + method.name() + ", the largest of the ASCE 7-16 "
                    + (method == DesignMethod.LRFD ? "§2.3.1 combinations (1.2D + 1.6L on a floor)"
                            : "§2.4.1 combinations (D + L on a floor)")
                    + "; self-weight in D, live load unreduced";
        } else {
            reactionSample = "R=8.1D+6.0L";
            reactionText = "End reactions, " + forceUnit + ": service loads by case (D, L, Lr, S); self-weight in D,"
                    + " live load unreduced";
        }
        Object[][] rows = {
            {"girder", "Girder: size along the member, demand/capacity ratio below it"},
            {"beam", "Beam"},
            {"fixed", "Size fixed in the plan (checked, not searched)"},
            {"over", "Overstressed: no size passes, or the fixed size fails; ratio marked \"over\""},
            {"unsupported", "Unsupported member; × at an end with no column or member to bear on"},
            {"column", "Column: mark, and section of the tier below this level"},
            {"reaction", reactionText},
            {"grid", "Grid line"},
            {"slab", "Slab edge"},
            {"opening", "Opening (no deck)"},
            {"areaload", "Area load other than the floor load, tagged with its service loads"},
        };
        for (Object[] row : rows) {
            String key = (String) row[0];
            List<String> lines = TextMetrics.wrap((String) row[1], size, false, textW);
            double rowH = Math.max(1.9 * t, lines.size() * 1.3 * size + 0.6 * t);
            double cy = y - rowH / 2;
            sample(key, x0, x0 + sampleW, cy, reactionSample);
            double ly = cy + (lines.size() - 1) * 1.3 * size / 2;
            for (String l : lines) {
                text(Layer.LEGEND, new Pt(tx, ly), l, size, Anchor.START_CENTRE, false);
                ly -= 1.3 * size;
            }
            y -= rowH;
        }
        // colour ramp
        y -= 0.8 * t;
        text(Layer.LEGEND, new Pt(x0, y), "DEMAND/CAPACITY RATIO (cividis colour map)", size, Anchor.START_TOP, true);
        y -= 1.8 * t;
        double rampW = Math.min(x1 - x0 - 2 * t, 50 * t);
        double rampH = 1.2 * t;
        int n = 40;
        for (int i = 0; i < n; i++) {
            double xa = x0 + rampW * i / n;
            double xb = x0 + rampW * (i + 1) / n + (i + 1 < n ? 0.2 : 0); // overlap the next step: no seams
            out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(new Pt(xa, y - rampH), new Pt(xb, y - rampH),
                    new Pt(xb, y), new Pt(xa, y)), true, null, Cividis.at((i + 0.5) / n), null));
        }
        out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(new Pt(x0, y - rampH), new Pt(x0 + rampW, y - rampH),
                new Pt(x0 + rampW, y), new Pt(x0, y)), true, Pen.solid(0.18, Rgb.INK), null, null));
        for (int i = 0; i <= 5; i++) {
            double xt = x0 + rampW * i / 5;
            out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, new Pt(xt, y - rampH), new Pt(xt, y - rampH - 0.5 * t), THIN));
            text(Layer.LEGEND, new Pt(xt, y - rampH - 0.7 * t), String.format(Locale.ROOT, "%.1f", i / 5.0), 0.7 * t,
                    Anchor.MIDDLE_TOP, false);
        }
        y -= rampH + 2.2 * t;
        for (String l : TextMetrics.wrap("Each member's band takes the colour of its highest ratio; over 1.0 it keeps the"
                + " top colour and gets the dashed heavy outline.", size, false, x1 - x0)) {
            text(Layer.LEGEND, new Pt(x0, y), l, size, Anchor.START_TOP, false);
            y -= 1.3 * size;
        }
        return y;
    }

    private void sample(String key, double x0, double x1, double cy, String reactionSample) {
        Pt a = new Pt(x0, cy);
        Pt b = new Pt(x1, cy);
        switch (key) {
            case "fixed" -> text(Layer.LEGEND, new Pt((x0 + x1) / 2, cy), "[W16X26]", 0.8 * t, Anchor.MIDDLE_CENTRE, false);
            case "girder", "beam", "over" -> {
                boolean g = key.equals("girder");
                double half = g ? GIRDER_BAND : BEAM_BAND;
                double ratio = switch (key) {
                    case "girder" -> 0.92;
                    case "beam" -> 0.55;
                    default -> 1.2;
                };
                List<Pt> band = List.of(new Pt(x0, cy - half), new Pt(x1, cy - half), new Pt(x1, cy + half), new Pt(x0, cy + half));
                out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, band, true, key.equals("over") ? OVER_PEN : null,
                        PlanPicture.ratioColour(ratio), null));
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, Pen.solid(g ? GIRDER_WEIGHT : BEAM_WEIGHT, Rgb.INK)));
            }
            case "unsupported" -> {
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, Pen.dashed(BEAM_WEIGHT, Rgb.INK, 4, 1, 0.8, 1)));
                double c = 0.6 * t;
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, b.plus(-c, -c), b.plus(c, c), Pen.solid(0.35, Rgb.INK)));
                out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, b.plus(-c, c), b.plus(c, -c), Pen.solid(0.35, Rgb.INK)));
            }
            case "column" -> {
                double hs = 0.65 * t;
                Pt c = new Pt((x0 + x1) / 2, cy);
                out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, List.of(c.plus(-hs, -hs), c.plus(hs, -hs), c.plus(hs, hs),
                        c.plus(-hs, hs)), true, null, Rgb.INK, null));
            }
            case "reaction" -> text(Layer.LEGEND, new Pt(x0, cy), reactionSample, 0.8 * t, Anchor.START_CENTRE, false);
            case "grid" -> out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, GRID_PEN));
            case "slab" -> out.add(new Primitive.Line(Layer.LEGEND, Space.PAPER, a, b, SLAB_PEN));
            case "opening", "areaload" -> {
                double hh = 0.8 * t;
                List<Pt> box = List.of(new Pt(x0, cy - hh), new Pt(x1, cy - hh), new Pt(x1, cy + hh), new Pt(x0, cy + hh));
                boolean op = key.equals("opening");
                out.add(new Primitive.Path(Layer.LEGEND, Space.PAPER, box, true, op ? OPENING_PEN : AREA_LOAD_PEN, null,
                        op ? OPENING_HATCH : AREA_LOAD_HATCH));
            }
            default -> throw new IllegalStateException(key);
        }
    }

    private void notes(double x0, double x1, double top, double floorOfNotes) {
        List<String> notes = new ArrayList<>();
        AreaLoad base = picture.floorLoad();
        notes.add(base == null ? "No floor-wide area load on this layout; every area load is outlined and tagged."
                : "Floor load " + base.id() + " (not hatched): " + picture.loadText(base.values()) + ".");
        int[] counts = new int[MemberStatus.values().length];
        for (MemberResult m : members) {
            counts[m.status().ordinal()]++;
        }
        StringBuilder c = new StringBuilder(members.size() + " members on this layout: ");
        List<String> parts = new ArrayList<>();
        for (MemberStatus s : MemberStatus.values()) {
            if (counts[s.ordinal()] > 0) {
                parts.add(counts[s.ordinal()] + " " + s.label());
            }
        }
        c.append(parts.isEmpty() ? "none" : String.join(", ", parts)).append('.');
        notes.add(c.toString());
        notes.add("Sizes: the lightest adequate section for strength (AISC 360-16) and deflection; ratios are the highest"
                + " demand/capacity of all checks.");
        notes.add("Dimensions between grid lines in " + (units == UnitSystem.SI ? "millimetres" : "feet and inches") + ".");
        block("NOTES", notes, x0, x1, top, floorOfNotes);
    }

    /** A titled block of numbered notes from {@code top} down, stopping above {@code floorOfNotes}; returns the y below it. */
    private double block(String title, List<String> notes, double x0, double x1, double top, double floorOfNotes) {
        double size = 0.8 * t;
        double y = top;
        if (y - 3 * t < floorOfNotes) {
            return y;
        }
        text(Layer.NOTES, new Pt(x0, y), title, t, Anchor.START_TOP, true);
        y -= 2.0 * t;
        for (int i = 0; i < notes.size(); i++) {
            List<String> lines = TextMetrics.wrap(notes.get(i), size, false, x1 - x0 - 2.2 * t);
            for (int j = 0; j < lines.size(); j++) {
                if (y - 1.3 * size < floorOfNotes) {
                    return y;
                }
                if (j == 0) {
                    text(Layer.NOTES, new Pt(x0, y), (i + 1) + ".", size, Anchor.START_TOP, false);
                }
                text(Layer.NOTES, new Pt(x0 + 2.2 * t, y), lines.get(j), size, Anchor.START_TOP, false);
                y -= 1.3 * size;
            }
            y -= 0.4 * size;
        }
        return y;
    }

    /** The title block at the bottom of the panel, bottom up; returns its top. */
    private double titleBlock(double x0, double x1, double bottom) {
        double pad = 0.6 * t;
        double inner = x1 - x0 - 2 * pad;
        double small = 0.8 * t;
        double y = bottom;

        // caution
        List<String> caution = TextMetrics.wrap(Caution.TEXT, small, true, inner);
        y = row(x0, x1, y, caution, small, true, null);
        // program
        y = row(x0, x1, y, List.of("Baywright " + run.version()), small, false, "PROGRAM");
        // design basis
        DesignSettings s = plan.settings();
        List<String> basis = new ArrayList<>();
        basis.add("AISC 360-16 " + method.name() + ", ASCE 7-16 load combinations; Fy = " + stressText(s.fy()));
        basis.add("Catalog: " + run.catalogName());
        basis.add("Live-load reduction (ASCE 7-16 §4.7, §4.8): " + (s.liveLoadReduction() ? "applied" : "not applied"));
        basis.add("Deflection limits: " + (s.liveDeflection() > 0 ? "L/" + trim(s.liveDeflection()) + " live" : "live off")
                + ", " + (s.totalDeflection() > 0 ? "L/" + trim(s.totalDeflection()) + " total" : "total off"));
        List<String> wrapped = new ArrayList<>();
        for (String l : basis) {
            wrapped.addAll(TextMetrics.wrap(l, small, false, inner));
        }
        y = row(x0, x1, y, wrapped, small, false, "DESIGN BASIS");
        // date and units; scale and sheet
        String date = options.date() == null || options.date().isBlank() ? " " : options.date().trim();
        y = twoCells(x0, x1, y, "DATE", date, "UNITS", units == UnitSystem.SI ? "SI (m, mm, kN, kPa)"
                : "US customary (ft, in, kip, psf)", small);
        y = twoCells(x0, x1, y, "SCALE", scale.label(), "SHEET", paper.label() + ", landscape", small);
        // drawing
        List<String> drawing = TextMetrics.wrap(level.name() + " — framing plan", 1.2 * t, true, inner);
        y = row(x0, x1, y, drawing, 1.2 * t, true, "DRAWING");
        List<String> project = TextMetrics.wrap(plan.name() == null || plan.name().isBlank() ? "(unnamed project)"
                : plan.name(), 1.5 * t, true, inner);
        y = row(x0, x1, y, project, 1.5 * t, true, "PROJECT");
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0, y), new Pt(x1, y), Pen.solid(0.5, Rgb.INK)));
        return y;
    }

    /** One full-width row of the title block above {@code y}; returns its top. */
    private double row(double x0, double x1, double y, List<String> lines, double size, boolean bold, String caption) {
        double pad = 0.6 * t;
        double cap = 0.6 * t;
        double lineH = 1.3 * size;
        double h = pad + (caption == null ? 0 : cap * 1.4) + lines.size() * lineH + pad - (lineH - Anchor.CAP_HEIGHT * size);
        double top = y + h;
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0, top), new Pt(x1, top), THIN));
        double ty = top - pad;
        if (caption != null) {
            out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), caption, cap, 0, Anchor.START_TOP,
                    CAPTION_INK, false));
            ty -= cap * 1.4;
        }
        for (String l : lines) {
            out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), l, size, 0, Anchor.START_TOP,
                    Rgb.INK, bold));
            ty -= lineH;
        }
        return top;
    }

    private double twoCells(double x0, double x1, double y, String cap1, String v1, String cap2, String v2, double size) {
        double pad = 0.6 * t;
        double cap = 0.6 * t;
        double h = pad + cap * 1.4 + Anchor.CAP_HEIGHT * size + pad;
        double top = y + h;
        double xm = (x0 + x1) / 2;
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0, top), new Pt(x1, top), THIN));
        out.add(new Primitive.Line(Layer.TITLE_BLOCK, Space.PAPER, new Pt(xm, y), new Pt(xm, top), THIN));
        double ty = top - pad;
        out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), cap1, cap, 0, Anchor.START_TOP,
                CAPTION_INK, false));
        out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(xm + pad, ty), cap2, cap, 0, Anchor.START_TOP,
                CAPTION_INK, false));
        ty -= cap * 1.4;
        if (!v1.isBlank()) {
            out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(x0 + pad, ty), v1, size, 0, Anchor.START_TOP,
                    Rgb.INK, false));
        }
        out.add(new Primitive.Text(Layer.TITLE_BLOCK, Space.PAPER, new Pt(xm + pad, ty), v2, size, 0, Anchor.START_TOP,
                Rgb.INK, false));
        return top;
    }

    private String stressText(double pa) {
        double v = units.stress().fromSi(pa);
        return (Math.abs(v - Math.rint(v)) < 0.05 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.1f", v))
                + " " + units.stress().symbol();
    }

    private void text(Layer layer, Pt at, String s, double size, Anchor anchor, boolean bold) {
        out.add(new Primitive.Text(layer, Space.PAPER, at, s, size, 0, anchor, Rgb.INK, bold));
    }
}
