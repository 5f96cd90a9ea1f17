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
import org.baywright.plan.CompositeMode;
import org.baywright.plan.Deck;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.PlanEdits;
import org.baywright.plan.StudPlacement;
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
    public sealed interface Item permits Row, Note, FixedSize, Field, UseChoice, Choice {
    }

    /** What an editable {@link Field} changes. */
    public enum FieldKind {
        LEVEL_NAME, STOREY_HEIGHT, DEAD, SUPERIMPOSED, PARTITION, LIVE, ROOF_LIVE, SNOW,
        /** A deck's slab: deck rib height h_r, average rib width w_r, rib pitch, deck weight. */
        RIB_HEIGHT, RIB_WIDTH, RIB_PITCH, DECK_WEIGHT,
        /** A deck's slab: concrete above the deck, unit weight, f′c. */
        TOPPING, DENSITY, FC,
        /** A deck's slab: stud diameter, studs per rib. */
        STUD_DIAMETER, STUDS_PER_RIB,
        /** A deck's slab weight given instead of the computed one (blank: computed). */
        SLAB_WEIGHT,
        /** A floor layout's construction live load. */
        CONSTRUCTION_LIVE,
        /** A member's fixed stud count (blank: searched). */
        FIXED_STUDS
    }

    /** What a {@link Choice} sets. */
    public enum ChoiceKind {
        /** Whether a deck carries a slab. */
        SLAB(List.of("None described", "Concrete on deck")),
        /** Where the studs sit in the ribs (AISC 360-16 I8.2a). */
        STUD_POSITION(List.of("Weak", "Strong")),
        /** How a floor layout's members act with the slab. */
        COMPOSITE_MODE(List.of("Composite", "Non-composite", "Per member")),
        /** Whether a floor layout is shored while the concrete hardens. */
        SHORING(List.of("Unshored", "Shored")),
        /** A member's own composite choice. */
        MEMBER_COMPOSITE(List.of("As the floor", "Composite", "Not composite"));

        private final List<String> options;

        ChoiceKind(List<String> options) {
            this.options = options;
        }

        /** The options in the order the list shows them. */
        public List<String> options() {
            return options;
        }
    }

    /**
     * One of a few options (a drop-down list): whether a deck carries a slab, the stud position, a floor's
     * composite action and shoring, a member's own composite choice. {@code owner} is the deck's or member's
     * id, or the floor layout's for a floor setting.
     */
    public record Choice(String label, ChoiceKind kind, String floorId, String owner, String current) implements Item {
        /** The list's node id: {@code choose-} and the label in lower case with dashes ("choose-composite-action"). */
        public String id() {
            return "choose-" + label.trim().toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}0-9]+", "-").replaceAll("-$", "");
        }
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
    /** Slabs switched off in this window, by floor/deck, so that switching back on restores what was typed. */
    private final java.util.Map<String, org.baywright.plan.Slab> removedSlabs = new java.util.HashMap<>();
    private final ReadOnlyObjectWrapper<List<Item>> items = new ReadOnlyObjectWrapper<>(this, "items", List.of());

    /** Follows {@code model}: the items change with its plan, run, level and selection. */
    public PropertiesViewModel(EditorModel model) {
        this.model = model;
        model.selectedProperty().addListener((o, a, b) -> refresh());
        model.runProperty().addListener((o, a, b) -> refresh());
        model.levelProperty().addListener((o, a, b) -> refresh());
        model.planProperty().addListener((o, a, b) -> refresh());
        model.selection().addListener((SetChangeListener<String>) c -> refresh());
        model.selectedBayProperty().addListener((o, a, b) -> refresh());
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
        if (text.equals(field.current())) {
            // the value as shown: nothing to do (read back, a rounded value would move by its rounding)
            return false;
        }
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
        switch (field.kind()) {
            case RIB_HEIGHT, RIB_WIDTH, RIB_PITCH, DECK_WEIGHT, TOPPING, DENSITY, FC, STUD_DIAMETER, STUDS_PER_RIB, SLAB_WEIGHT -> {
                return model.edit(p -> PlanEdits.setSlab(p, field.floorId(), field.owner(),
                        slabWith(slabOf(p, field.floorId(), field.owner()), field, text, us)),
                        field.owner() + ": " + field.label().toLowerCase(Locale.ROOT) + (text.isEmpty() ? " computed" : " " + text));
            }
            case CONSTRUCTION_LIVE -> {
                return model.edit(p -> {
                    Floor f = p.floor(field.floorId()).orElseThrow(() -> new IllegalArgumentException("the plan has no floor "
                            + field.floorId()));
                    double q = ToolValues.load("floor " + field.floorId() + " construction live load", text, us.areaLoad());
                    return PlanEdits.setComposite(p, f.id(), f.composite().withConstructionLive(q));
                }, "floor " + field.floorId() + ": construction live load " + (text.isEmpty() ? "none" : text));
            }
            case FIXED_STUDS -> {
                return model.edit(p -> PlanEdits.setFixedStuds(p, field.floorId(), field.owner(), studCount(field.owner(), text)),
                        field.owner() + (text.isEmpty() ? ": studs searched" : ": " + text + " studs"));
            }
            default -> {
                // a load value, below
            }
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

    /** Applies a choice from a drop-down list (one undoable edit); returns whether the plan changed. */
    public boolean setChoice(Choice choice, String option) {
        if (option == null || option.equals(choice.current())) {
            return false;
        }
        int at = choice.kind().options().indexOf(option);
        if (at < 0) {
            model.messageProperty().set("Not done: " + choice.label() + " is one of " + String.join(", ", choice.kind().options())
                    + ", not " + option + ".");
            return false;
        }
        String owner = choice.owner();
        String label = owner + ": " + choice.label().toLowerCase(Locale.ROOT) + " " + option.toLowerCase(Locale.ROOT);
        return switch (choice.kind()) {
            case SLAB -> {
                if (at == 0 && model.plan() != null) {
                    model.plan().floor(choice.floorId()).flatMap(f -> f.decks().stream().filter(d -> d.id().equals(owner)).findFirst())
                            .map(Deck::slab).ifPresent(was -> removedSlabs.put(choice.floorId() + "/" + owner, was));
                }
                yield model.edit(p -> PlanEdits.setSlab(p, choice.floorId(), owner,
                        at == 0 ? null : lastSlab(p, choice.floorId(), owner)), label);
            }
            case STUD_POSITION -> model.edit(p -> {
                org.baywright.plan.Slab s = slabOf(p, choice.floorId(), owner);
                return PlanEdits.setSlab(p, choice.floorId(), owner, new org.baywright.plan.Slab(s.ribHeight(), s.ribWidth(),
                        s.ribPitch(), s.deckWeight(), s.topping(), s.density(), s.fc(), s.studDiameter(), s.studFu(),
                        s.studsPerRib(), at == 0 ? StudPlacement.WEAK : StudPlacement.STRONG, s.weightOverride()));
            }, label);
            case COMPOSITE_MODE -> model.edit(p -> PlanEdits.setComposite(p, choice.floorId(),
                    floorOf(p, choice.floorId()).composite().withMode(CompositeMode.values()[at])), "floor " + label);
            case SHORING -> model.edit(p -> PlanEdits.setComposite(p, choice.floorId(),
                    floorOf(p, choice.floorId()).composite().withShored(at == 1)), "floor " + label);
            case MEMBER_COMPOSITE -> model.edit(p -> PlanEdits.setMemberComposite(p, choice.floorId(), owner,
                    at == 0 ? Optional.empty() : Optional.of(at == 1)), label);
        };
    }

    /** The slab a deck had before it was switched off in this session, or the typical one. */
    private org.baywright.plan.Slab lastSlab(org.baywright.plan.Plan p, String floorId, String deckId) {
        Deck d = deckOf(p, floorId, deckId);
        if (d.slab() != null) {
            return d.slab();
        }
        org.baywright.plan.Slab kept = removedSlabs.get(floorId + "/" + deckId);
        return kept != null ? kept : org.baywright.plan.Slab.typical();
    }

    private static Floor floorOf(org.baywright.plan.Plan p, String floorId) {
        return p.floor(floorId).orElseThrow(() -> new IllegalArgumentException("the plan has no floor " + floorId));
    }

    private static Deck deckOf(org.baywright.plan.Plan p, String floorId, String deckId) {
        return floorOf(p, floorId).decks().stream().filter(d -> d.id().equals(deckId)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("floor " + floorId + " has no deck " + deckId));
    }

    private static org.baywright.plan.Slab slabOf(org.baywright.plan.Plan p, String floorId, String deckId) {
        Deck d = deckOf(p, floorId, deckId);
        if (d.slab() == null) {
            throw new IllegalArgumentException("deck " + deckId + " carries no slab: choose Slab, concrete on deck first");
        }
        return d.slab();
    }

    /** A fixed stud count as typed: blank for searched, else a whole number 0 to 400. */
    private static java.util.OptionalInt studCount(String member, String text) {
        if (text.isEmpty()) {
            return java.util.OptionalInt.empty();
        }
        if (!text.matches("\\d{1,3}") || Integer.parseInt(text) > 400) {
            throw new org.baywright.units.UnitParseException(member + " fixed studs", text, "is not a whole number of studs",
                    "a count such as 16 (0 to 400), or blank for the least that passes");
        }
        return java.util.OptionalInt.of(Integer.parseInt(text));
    }

    /**
     * The slab with one value changed as typed, checked as the design code will take it (rib width not more
     * than the pitch, positive topping, unit weight and f′c): a bad value names the deck, the field and what
     * is accepted.
     */
    static org.baywright.plan.Slab slabWith(org.baywright.plan.Slab s, Field field, String text, UnitSystem us) {
        String name = "deck " + field.owner() + " " + field.label().toLowerCase(Locale.ROOT);
        double hr = s.ribHeight();
        double wr = s.ribWidth();
        double pitch = s.ribPitch();
        double deck = s.deckWeight();
        double tc = s.topping();
        double wc = s.density();
        double fc = s.fc();
        double dsa = s.studDiameter();
        int n = s.studsPerRib();
        double over = s.weightOverride();
        switch (field.kind()) {
            case RIB_HEIGHT -> hr = ToolValues.load(name, text, us.smallLength());
            case RIB_WIDTH -> wr = positive(name, text, us.smallLength());
            case RIB_PITCH -> pitch = positive(name, text, us.smallLength());
            case DECK_WEIGHT -> deck = ToolValues.load(name, text, us.areaLoad());
            case TOPPING -> tc = positive(name, text, us.smallLength());
            case DENSITY -> wc = positive(name, text, us.unitWeight());
            case FC -> fc = positive(name, text, us.stress());
            case STUD_DIAMETER -> dsa = positive(name, text, us.smallLength());
            case STUDS_PER_RIB -> {
                if (!text.matches("[123]")) {
                    throw new org.baywright.units.UnitParseException(name, text, "is not 1, 2 or 3 studs",
                            "1, 2 or 3 (studs in one rib, or in one row where the ribs run along a member)");
                }
                n = Integer.parseInt(text);
            }
            case SLAB_WEIGHT -> over = text.isEmpty() ? Double.NaN : positive(name, text, us.areaLoad());
            default -> throw new IllegalArgumentException(field.label() + " is not a slab value");
        }
        org.baywright.plan.Slab next = new org.baywright.plan.Slab(hr, wr, pitch, deck, tc, wc, fc, dsa, s.studFu(), n,
                s.studPosition(), over);
        try {
            org.baywright.takedown.SlabDesign.slabOnDeck(next);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("deck " + field.owner() + " " + e.getMessage());
        }
        return next;
    }

    /** A positive quantity; a bare number is in {@code unit}; blank is an error. */
    private static double positive(String field, String text, org.baywright.units.Unit unit) {
        return org.baywright.units.Quantities.parsePositive(field, ToolValues.withUnit(text, unit), unit.dimension());
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
        Optional<org.baywright.takedown.BayResult> bay = model.selection().isEmpty() ? model.selectedBayResult() : Optional.empty();
        if (bay.isPresent()) {
            bay(bay.get(), us, out);
        } else if (member.isPresent()) {
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

    /**
     * A bay picked with View › Floor vibration on: its check (AISC DG11 2nd ed., walking) with every
     * intermediate value, the method, and the caution where the bay is outside the method or below 3 Hz.
     */
    private void bay(org.baywright.takedown.BayResult b, UnitSystem us, List<Item> out) {
        out.add(new Row("Bay", b.bay().id()));
        out.add(new Row("Levels", String.join(", ", b.levels())));
        out.add(new Row("Status", b.status()));
        out.add(new Note("prop-bay-method", BayView.METHOD));
        org.baywright.design.dg11.VibrationResult r = b.result();
        if (r == null) {
            out.add(new Note("prop-bay-note", b.note().isEmpty() ? BAY_NOT_CHECKED : b.note()));
            return;
        }
        out.add(new Row("fn", BayView.hz(r.fn())));
        out.add(new Row("ap/g", BayView.percent(r.apg())));
        out.add(new Row("Limit ao/g", BayView.percent(r.limit())));
        out.add(new Row("Ratio", BayView.ratio(r.ratio())));
        org.baywright.units.Unit small = us.smallLength();
        out.add(new Row("Δj, beam mode", UnitSystem.format(r.dj(), small, us == UnitSystem.SI ? 1 : 3)));
        out.add(new Row("Δg, girder mode", UnitSystem.format(r.dg(), small, us == UnitSystem.SI ? 1 : 3)));
        if (r.dgReduced() != r.dg()) {
            out.add(new Row("Δg′, reduced (Lg < Bj)", UnitSystem.format(r.dgReduced(), small, us == UnitSystem.SI ? 1 : 3)));
        }
        out.add(new Row("fj, fg", BayView.hz(r.fj()) + ", " + BayView.hz(r.fg())));
        out.add(new Row("Bj", us.lengthText(r.bj())));
        out.add(new Row("Bg", us.lengthText(r.bg())));
        out.add(new Row("Wj", us.forceText(r.wj())));
        out.add(new Row("Wg", us.forceText(r.wg())));
        out.add(new Row("W", us.forceText(r.w())));
        if (b.inputs() != null) {
            out.add(new Row("β, damping", String.format(Locale.ROOT, "%.3f", b.inputs().vibration().beta())));
        }
        out.add(new Row("Beams, girders", String.join(", ", b.bay().beams()) + "; "
                + b.bay().girders().stream().map(org.baywright.takedown.Bay.BayGirder::id).collect(Collectors.joining(", "))));
        if (r.status() == org.baywright.design.dg11.VibrationStatus.OUTSIDE_METHOD) {
            out.add(new Note("prop-bay-caution", "fn above 9 Hz: the low-frequency walking method does not apply; "
                    + "this bay is reported as outside the check, not as passing it."));
        }
        if (r.belowThreeHz()) {
            out.add(new Note("prop-bay-low", "fn below 3 Hz: DG11 advises that such floors be avoided."));
        }
    }

    private static final String BAY_NOT_CHECKED = org.baywright.takedown.BayResult.NOT_CHECKED;

    private void member(MemberResult m, UnitSystem us, List<Item> out) {
        boolean infill = m.id().contains("/");
        List<Readouts.Row> composite = Readouts.composite(m, us);
        for (Readouts.Row r : Readouts.member(m, us, method())) {
            if (r.label().equals("Start reaction, service")) {
                // the composite design next to its checks, before the reactions
                composite.forEach(c -> out.add(new Row(c.label(), c.value())));
                composite = List.of();
            }
            out.add(new Row(r.label(), r.value()));
            if (r.label().equals("Status") && !infill) {
                // the size field beside the size, not below the loads and reactions
                String fixed = model.currentFloor().flatMap(f -> f.member(m.id())).flatMap(x -> x.fixedSection()).orElse("");
                out.add(new FixedSize(model.currentFloorId(), m.id(), fixed));
                memberComposite(m, out);
            }
        }
        composite.forEach(c -> out.add(new Row(c.label(), c.value())));
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

    /**
     * A member under a slab: its own composite choice and its fixed stud count, beside the fixed size (a floor
     * without a slab has neither).
     */
    private void memberComposite(MemberResult m, List<Item> out) {
        Optional<Floor> f = model.currentFloor();
        Optional<org.baywright.plan.Member> pm = f.flatMap(x -> x.member(m.id()));
        if (f.isEmpty() || pm.isEmpty() || !f.get().hasSlab()) {
            return;
        }
        Optional<Boolean> own = pm.get().composite();
        List<String> options = ChoiceKind.MEMBER_COMPOSITE.options();
        out.add(new Choice("Composite", ChoiceKind.MEMBER_COMPOSITE, f.get().id(), m.id(),
                own.isEmpty() ? options.get(0) : own.get() ? options.get(1) : options.get(2)));
        var studs = pm.get().fixedStuds();
        out.add(new Field("Fixed studs", FieldKind.FIXED_STUDS, f.get().id(), m.id(),
                studs.isPresent() ? String.valueOf(studs.getAsInt()) : ""));
    }

    /**
     * A deck area: its span, whether it carries a slab and, when it does, the slab's profile, concrete and
     * studs, each editable in the plan's units, with the weight worked out from them and the weight given
     * instead (blank: the computed one).
     */
    private static void deck(Floor f, Deck d, UnitSystem us, List<Item> out) {
        out.add(new Row("Deck", d.id()));
        out.add(new Row("Span direction", String.format(Locale.ROOT, "%.0f° from west–east", d.spanAngle())));
        out.add(new Row("Area", UnitSystem.format(Math.abs(d.outline().signedArea()), us.floorArea(), 0)));
        List<String> on = ChoiceKind.SLAB.options();
        out.add(new Choice("Slab", ChoiceKind.SLAB, f.id(), d.id(), d.slab() == null ? on.get(0) : on.get(1)));
        org.baywright.plan.Slab s = d.slab();
        if (s == null) {
            out.add(new Note("prop-slab-hint", "No slab described: the area loads give the slab's weight and no member acts"
                    + " with it. Choose concrete on deck to describe it."));
            return;
        }
        org.baywright.units.Unit small = us.smallLength();
        out.add(new Field("Rib height", FieldKind.RIB_HEIGHT, f.id(), d.id(), fieldText(s.ribHeight(), small)));
        out.add(new Field("Rib width", FieldKind.RIB_WIDTH, f.id(), d.id(), fieldText(s.ribWidth(), small)));
        out.add(new Field("Rib pitch", FieldKind.RIB_PITCH, f.id(), d.id(), fieldText(s.ribPitch(), small)));
        out.add(new Field("Deck weight", FieldKind.DECK_WEIGHT, f.id(), d.id(), fieldText(s.deckWeight(), us.areaLoad())));
        out.add(new Field("Topping", FieldKind.TOPPING, f.id(), d.id(), fieldText(s.topping(), small)));
        out.add(new Field("Concrete unit weight", FieldKind.DENSITY, f.id(), d.id(), fieldText(s.density(), us.unitWeight())));
        out.add(new Field("f′c", FieldKind.FC, f.id(), d.id(), fieldText(s.fc(), us.stress())));
        out.add(new Field("Stud diameter", FieldKind.STUD_DIAMETER, f.id(), d.id(), fieldText(s.studDiameter(), small)));
        out.add(new Field("Studs per rib", FieldKind.STUDS_PER_RIB, f.id(), d.id(), String.valueOf(s.studsPerRib())));
        List<String> pos = ChoiceKind.STUD_POSITION.options();
        out.add(new Choice("Stud position", ChoiceKind.STUD_POSITION, f.id(), d.id(),
                s.studPosition() == StudPlacement.STRONG ? pos.get(1) : pos.get(0)));
        double computed = org.baywright.takedown.SlabDesign.computedWeight(s);
        out.add(new Row("Slab weight, computed", UnitSystem.format(computed, us.areaLoad(), 1) + "\n(topping, filled ribs and deck;"
                + " total thickness " + UnitSystem.format(s.thickness(), small, 2) + ")"));
        out.add(new Field("Slab weight given", FieldKind.SLAB_WEIGHT, f.id(), d.id(),
                s.weightGiven() ? fieldText(s.weightOverride(), us.areaLoad()) : ""));
        out.add(new Note("prop-slab-hint", "Blank slab weight: the computed one is used. Whether members act with the slab is"
                + " the floor's setting (click empty plan to see the level) or each member's."));
    }

    /** The composite setting of a floor layout: its mode, shoring and construction live load. */
    private static void floorComposite(Floor f, UnitSystem us, List<Item> out) {
        var c = f.composite();
        out.add(new Choice("Composite action", ChoiceKind.COMPOSITE_MODE, f.id(), f.id(),
                ChoiceKind.COMPOSITE_MODE.options().get(c.mode().ordinal())));
        out.add(new Choice("Shoring", ChoiceKind.SHORING, f.id(), f.id(), ChoiceKind.SHORING.options().get(c.shored() ? 1 : 0)));
        out.add(new Field("Construction live", FieldKind.CONSTRUCTION_LIVE, f.id(), f.id(),
                fieldText(c.constructionLive(), us.areaLoad())));
        if (!f.hasSlab()) {
            out.add(new Note("prop-composite-hint", "No deck of this layout carries a slab: its members are bare steel"
                    + " whatever the setting (Deck tool: click a deck, then Properties)."));
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
        out.add(new Row("Floor layout", lv.get().floor() + sharedBy(lv.get().floor())));
        model.plan().floor(lv.get().floor()).ifPresent(f -> floorComposite(f, us, out));
        out.add(new Note("prop-hint", "Click a member, column, load or opening on the plan to see it here."));
    }

    /** ", also levels 3–5" when other levels share the layout (its settings are theirs too). */
    private String sharedBy(String floorId) {
        List<String> names = model.plan().levels().stream().filter(l -> l.floor().equals(floorId)).map(Level::name).toList();
        return names.size() > 1 ? "\n(shared by " + String.join(", ", names) + ")" : "";
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
        for (var d : f.decks()) {
            if (d.id().equals(id)) {
                deck(f, d, us, out);
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
