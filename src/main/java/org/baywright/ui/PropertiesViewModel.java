package org.baywright.ui;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.collections.SetChangeListener;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.PlanEdits;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;

/**
 * What the Properties panel shows for the selection, as plain texts: a member's identity, size, loads,
 * checks, reactions, supports and the lighter sections it rejected; a column's tiers and foundation
 * reactions; a load's values; an opening's area; the fixed-size field of a member or column. The panel
 * ({@link PropertiesPanel}) only lays the items out, in order: a {@link Row} is a label and a value, a
 * {@link Note} spans the panel, a {@link FixedSize} is the field that fixes a size.
 *
 * <p>No toolkit needed: the items follow the {@link EditorModel} (plan, run, level, selection) and are
 * tested with plain JUnit.
 */
public final class PropertiesViewModel {
    /** How many of the heaviest rejected sections are listed (the informative ones). */
    static final int REJECTED_SHOWN = 4;

    /** One item of the panel. */
    public sealed interface Item permits Row, Note, FixedSize, Field, UseChoice {
    }

    /** What an editable {@link Field} changes. */
    public enum FieldKind {
        LEVEL_NAME, STOREY_HEIGHT, DEAD, SUPERIMPOSED, PARTITION, LIVE, ROOF_LIVE, SNOW
    }

    /**
     * An editable value: a level's name or storey height, or one load case of a load area, line load or point
     * load. {@code current} is the value as the field shows it ("" when there is none: a field either holds a
     * value or is plainly empty); {@code owner} is the level's name or the load's id.
     */
    public record Field(String label, FieldKind kind, String floorId, String owner, String current) implements Item {
        /** The field's node id: {@code edit-} and the label in lower case with dashes ("edit-storey-height"). */
        public String id() {
            return "edit-" + label.trim().toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}0-9]+", "-").replaceAll("-$", "");
        }
    }

    /** The use (occupancy) of a load area, chosen from {@link LiveLoadUse}. */
    public record UseChoice(String floorId, String owner, LiveLoadUse current) implements Item {
    }

    /** A labelled value. */
    public record Row(String label, String value) implements Item {
        /** The value's node id: {@code prop-} and the label in lower case with dashes ("prop-start-reaction-service"). */
        public String id() {
            return "prop-" + label.trim().toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}0-9]+", "-").replaceAll("-$", "");
        }
    }

    /** A text across the panel; {@code id} is its node id, or null. */
    public record Note(String id, String text) implements Item {
    }

    /**
     * The fixed-size field of a member or column: its current designation ("" for the lightest
     * adequate size) and where an edit goes.
     */
    public record FixedSize(String floorId, String objectId, String current) implements Item {
    }

    private final EditorModel model;
    private final ReadOnlyObjectWrapper<List<Item>> items = new ReadOnlyObjectWrapper<>(this, "items", List.of());

    /** Follows {@code model}: the items change with its plan, run, level and selection. */
    public PropertiesViewModel(EditorModel model) {
        this.model = model;
        model.selectedProperty().addListener((o, a, b) -> refresh());
        model.runProperty().addListener((o, a, b) -> refresh());
        model.levelProperty().addListener((o, a, b) -> refresh());
        model.planProperty().addListener((o, a, b) -> refresh());
        model.selection().addListener((SetChangeListener<String>) c -> refresh());
        refresh();
    }

    /** The items to show, in order (a new list on every change). */
    public ReadOnlyObjectProperty<List<Item>> itemsProperty() {
        return items.getReadOnlyProperty();
    }

    public List<Item> items() {
        return items.get();
    }

    /** The value of the row labelled {@code label}, if there is one. */
    public Optional<String> value(String label) {
        return items.get().stream().filter(i -> i instanceof Row r && r.label().equals(label)).map(i -> ((Row) i).value())
                .findFirst();
    }

    /**
     * Fixes the size of the field's member or column to the typed designation (one undoable edit); a
     * blank text goes back to the lightest adequate size. Returns whether the plan changed.
     */
    public boolean setFixedSize(FixedSize field, String typed) {
        String text = typed == null ? "" : typed.trim();
        String id = field.objectId();
        return model.edit(p -> PlanEdits.setFixedSection(p, field.floorId(), id, Optional.of(text)),
                text.isEmpty() ? id + ": lightest adequate size" : id + ": fixed size " + text.toUpperCase(Locale.ROOT));
    }

    /**
     * Applies what was typed in an editable field (one undoable edit). A bad value changes nothing and the
     * message says which field and what it accepts. Returns whether the plan changed.
     */
    public boolean setField(Field field, String typed) {
        UnitSystem us = model.units();
        String text = typed == null ? "" : typed.trim();
        if (field.kind() == FieldKind.LEVEL_NAME || field.kind() == FieldKind.STOREY_HEIGHT) {
            return model.edit(p -> {
                Level lv = p.levels().stream().filter(l -> l.name().equals(field.owner())).findFirst()
                        .orElseThrow(() -> new IllegalArgumentException("the plan has no level " + field.owner()));
                String name = field.kind() == FieldKind.LEVEL_NAME ? text : lv.name();
                double h = field.kind() == FieldKind.STOREY_HEIGHT
                        ? ToolValues.length("level " + lv.name() + " storey height", text, us) : lv.storeyHeight();
                return PlanEdits.setLevel(p, lv.name(), name, h);
            }, "level " + field.owner() + ": " + field.label().toLowerCase(Locale.ROOT) + " " + text);
        }
        return model.edit(p -> {
            LoadValues v = loadValues(p, field.floorId(), field.owner());
            org.baywright.units.Unit unit = loadUnit(p, field.floorId(), field.owner(), us);
            double x = ToolValues.load(field.owner() + " " + field.label().toLowerCase(Locale.ROOT), text, unit);
            LoadValues next = switch (field.kind()) {
                case DEAD -> new LoadValues(x, v.superimposed(), v.live(), v.roofLive(), v.snow(), v.partition());
                case SUPERIMPOSED -> new LoadValues(v.dead(), x, v.live(), v.roofLive(), v.snow(), v.partition());
                case PARTITION -> new LoadValues(v.dead(), v.superimposed(), v.live(), v.roofLive(), v.snow(), x);
                case LIVE -> new LoadValues(v.dead(), v.superimposed(), x, v.roofLive(), v.snow(), v.partition());
                case ROOF_LIVE -> new LoadValues(v.dead(), v.superimposed(), v.live(), x, v.snow(), v.partition());
                case SNOW -> new LoadValues(v.dead(), v.superimposed(), v.live(), v.roofLive(), x, v.partition());
                default -> v;
            };
            return PlanEdits.setLoadValues(p, field.floorId(), field.owner(), next, null);
        }, field.owner() + ": " + field.label().toLowerCase(Locale.ROOT) + (text.isEmpty() ? " none" : " " + text));
    }

    /** Sets a load area's use (one undoable edit). */
    public boolean setUse(UseChoice choice, LiveLoadUse use) {
        if (use == null) {
            return false;
        }
        return model.edit(p -> PlanEdits.setLoadValues(p, choice.floorId(), choice.owner(),
                loadValues(p, choice.floorId(), choice.owner()), use), choice.owner() + ": use " + use.words().toLowerCase(Locale.ROOT));
    }

    private static LoadValues loadValues(org.baywright.plan.Plan p, String floorId, String id) {
        Floor f = p.floor(floorId).orElseThrow(() -> new IllegalArgumentException("the plan has no floor " + floorId));
        return f.areaLoads().stream().filter(a -> a.id().equals(id)).map(a -> a.values()).findFirst()
                .or(() -> f.lineLoads().stream().filter(l -> l.id().equals(id)).map(l -> l.values()).findFirst())
                .or(() -> f.pointLoads().stream().filter(q -> q.id().equals(id)).map(q -> q.values()).findFirst())
                .orElseThrow(() -> new IllegalArgumentException("floor " + floorId + " has no load " + id));
    }

    /** psf or kN/m² for a load area, klf or kN/m for a line load, kip or kN for a point load. */
    private static org.baywright.units.Unit loadUnit(org.baywright.plan.Plan p, String floorId, String id, UnitSystem us) {
        Floor f = p.floor(floorId).orElseThrow();
        if (f.lineLoads().stream().anyMatch(l -> l.id().equals(id))) {
            return us.lineLoad();
        }
        return f.pointLoads().stream().anyMatch(q -> q.id().equals(id)) ? us.force() : us.areaLoad();
    }

    /** A value as an editable field shows it: the number and its unit with no space ("15psf"), or "" for none. */
    static String fieldText(double si, org.baywright.units.Unit unit) {
        if (si == 0) {
            return "";
        }
        java.math.BigDecimal d = new java.math.BigDecimal(unit.fromSi(si)).round(new java.math.MathContext(6))
                .stripTrailingZeros();
        return d.toPlainString() + unit.symbol();
    }

    /** Builds the items again from the model. */
    void refresh() {
        items.set(Collections.unmodifiableList(build()));
    }

    private List<Item> build() {
        List<Item> out = new ArrayList<>();
        UnitSystem us = model.units();
        if (model.selection().size() > 1) {
            out.add(new Note("prop-many", model.selection().size() + " objects selected: " + String.join(", ", model.selection())));
        }
        Optional<MemberResult> member = model.selectedResult();
        String id = model.selectedProperty().get();
        if (member.isPresent()) {
            member(member.get(), us, out);
        } else if (id != null && model.plan() != null) {
            Optional<Column> col = model.plan().columns().stream().filter(c -> c.id().equals(id)).findFirst();
            if (col.isPresent()) {
                column(col.get(), us, out);
            } else {
                model.currentFloor().ifPresent(f -> floorObject(f, id, us, out));
            }
        }
        if (out.isEmpty() && model.plan() != null && id == null) {
            level(us, out);
        }
        if (out.isEmpty()) {
            out.add(new Note("prop-hint", model.plan() == null ? "No plan open." : model.run() == null ? "Running…"
                    : "Click a member, column, load or opening on the plan to see it here."));
        }
        return out;
    }

    private void member(MemberResult m, UnitSystem us, List<Item> out) {
        boolean infill = m.id().contains("/");
        for (Readouts.Row r : Readouts.member(m, us, method())) {
            out.add(new Row(r.label(), r.value()));
            if (r.label().equals("Status") && !infill) {
                // the size field beside the size, not below the loads and reactions
                String fixed = model.currentFloor().flatMap(f -> f.member(m.id())).flatMap(x -> x.fixedSection()).orElse("");
                out.add(new FixedSize(model.currentFloorId(), m.id(), fixed));
            }
        }
        if (m.design() != null && !m.design().rejected().isEmpty()) {
            // the heaviest rejected sections are the informative ones: the last before the one chosen
            var rejected = m.design().rejected();
            var near = new ArrayList<>(rejected.subList(Math.max(0, rejected.size() - REJECTED_SHOWN), rejected.size()));
            Collections.reverse(near);
            out.add(new Row("Lighter, rejected", near.stream()
                    .map(x -> x.section().designation() + ": " + x.governing().name() + " " + Readouts.ratio(x.governing().ratio()))
                    .collect(Collectors.joining("\n"))
                    + (rejected.size() > REJECTED_SHOWN ? "\n(" + (rejected.size() - REJECTED_SHOWN) + " lighter)" : "")));
        }
        if (infill) {
            out.add(new Note(null, "An infill beam: its spacing and direction belong to its bay (Infill tool). Delete"
                    + " removes the whole infill."));
        }
    }

    private void column(Column c, UnitSystem us, List<Item> out) {
        out.add(new Row("Column", c.id()));
        out.add(new Row("Grid", c.grid().isEmpty() ? "off grid" : c.grid()));
        out.add(new Row("Top level", c.topLevel().isEmpty() ? "roof (top of building)" : c.topLevel()));
        var run = model.run();
        Optional<ColumnResult> result = run == null || run.takedown() == null ? Optional.empty()
                : run.takedown().columns().stream().filter(r -> r.id().equals(c.id())).findFirst();
        if (result.isPresent()) {
            for (ColumnTier t : result.get().tiers()) {
                List<String> levels = t.levels();
                out.add(new Row("Tier " + levels.get(0) + (levels.size() > 1 ? "–" + levels.get(levels.size() - 1) : ""),
                        t.section() + "  " + Readouts.ratio(t.maxRatio())));
            }
            ColumnResult r = result.get();
            out.add(new Row("Foundation, service", Readouts.byCase(r.foundation(), us) + Readouts.LIVE_UNREDUCED));
            out.add(new Row("Foundation, service, live reduced", Readouts.byCase(r.foundationReduced(), us)));
            out.add(new Row("Foundation, " + Readouts.factoredWord(method()), Readouts.factored(r.foundationReduced(), method(), us)
                    + "\n(live load reduced)"));
        }
        out.add(new FixedSize(model.currentFloorId(), c.id(), c.fixedSection().orElse("")));
    }

    /** The plan's design method (LRFD when there is none). */
    private org.baywright.load.DesignMethod method() {
        try {
            org.baywright.load.DesignMethod m = model.plan() == null ? null
                    : org.baywright.load.DesignMethod.parse(model.plan().settings().method());
            return m == null ? org.baywright.load.DesignMethod.LRFD : m;
        } catch (RuntimeException e) {
            return org.baywright.load.DesignMethod.LRFD;
        }
    }

    /** The level shown, when nothing is selected: its name and storey height are editable. */
    private void level(UnitSystem us, List<Item> out) {
        String name = model.levelProperty().get();
        Optional<Level> lv = model.plan().levels().stream().filter(l -> l.name().equals(name)).findFirst();
        if (lv.isEmpty()) {
            return;
        }
        out.add(new Field("Level", FieldKind.LEVEL_NAME, lv.get().floor(), name, name));
        out.add(new Field("Storey height", FieldKind.STOREY_HEIGHT, lv.get().floor(), name,
                fieldText(lv.get().storeyHeight(), us.length())));
        out.add(new Row("Elevation", UnitSystem.format(lv.get().elevation(), us.length(), 2) + " (top of steel)"));
        out.add(new Row("Floor layout", lv.get().floor()));
        out.add(new Note("prop-hint", "Click a member, column, load or opening on the plan to see it here."));
    }

    /** The editable values of a load: every case, in the load's unit; blank means none. */
    private static void loadFields(Floor f, String id, LoadValues v, org.baywright.units.Unit unit, List<Item> out) {
        out.add(new Field("Dead", FieldKind.DEAD, f.id(), id, fieldText(v.dead(), unit)));
        out.add(new Field("Superimposed dead", FieldKind.SUPERIMPOSED, f.id(), id, fieldText(v.superimposed(), unit)));
        out.add(new Field("Partitions", FieldKind.PARTITION, f.id(), id, fieldText(v.partition(), unit)));
        out.add(new Field("Live", FieldKind.LIVE, f.id(), id, fieldText(v.live(), unit)));
        out.add(new Field("Roof live", FieldKind.ROOF_LIVE, f.id(), id, fieldText(v.roofLive(), unit)));
        out.add(new Field("Snow", FieldKind.SNOW, f.id(), id, fieldText(v.snow(), unit)));
    }

    /** A load area, opening, line load or point load of the floor shown. */
    private static void floorObject(Floor f, String id, UnitSystem us, List<Item> out) {
        for (var a : f.areaLoads()) {
            if (a.id().equals(id)) {
                out.add(new Row("Load area", a.id()));
                out.add(new Row("Loads", Readouts.areaLoad(a.values(), us)));
                loadFields(f, a.id(), a.values(), us.areaLoad(), out);
                out.add(new UseChoice(f.id(), a.id(), a.use()));
                out.add(new Row("Area", UnitSystem.format(Math.abs(a.outline().signedArea()), us.floorArea(), 0)));
                return;
            }
        }
        for (var o : f.openings()) {
            if (o.id().equals(id)) {
                out.add(new Row("Opening", o.id()));
                out.add(new Row("Area", UnitSystem.format(Math.abs(o.outline().signedArea()), us.floorArea(), 0)));
                return;
            }
        }
        for (var l : f.lineLoads()) {
            if (l.id().equals(id)) {
                out.add(new Row("Line load", l.id()));
                out.add(new Row("Loads", Readouts.lineLoad(l.values(), us)));
                loadFields(f, l.id(), l.values(), us.lineLoad(), out);
                return;
            }
        }
        for (var q : f.pointLoads()) {
            if (q.id().equals(id)) {
                out.add(new Row("Point load", q.id()));
                out.add(new Row("Loads", Readouts.force(q.values(), us)));
                loadFields(f, q.id(), q.values(), us.force(), out);
                return;
            }
        }
    }
}
