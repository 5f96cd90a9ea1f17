package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.baywright.design.Check;
import org.baywright.load.LoadCase;
import org.baywright.plan.MemberKind;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * The Properties panel's rows for the selection, on the demo plan (US units), read back against the
 * run's own numbers: no toolkit.
 */
class PropertiesViewModelTest {
    private static final Pattern CASE_VALUE = Pattern.compile("(\\w+) (-?[0-9.]+) kip");

    private final EditorModel model = new EditorModel(TaskRunner.direct());
    private final PropertiesViewModel vm = new PropertiesViewModel(model);

    PropertiesViewModelTest() {
        assertTrue(model.open(Path.of(BaywrightApp.DEMO)).opened());
    }

    private String row(String label) {
        return vm.value(label).orElseThrow(() -> new AssertionError("no row " + label + " in " + vm.items()));
    }

    /** "D 12.3 kip, L 10.1 kip" as kip by load case symbol. */
    private static Map<String, Double> kips(String text) {
        Map<String, Double> out = new java.util.LinkedHashMap<>();
        Matcher m = CASE_VALUE.matcher(text);
        while (m.find()) {
            out.put(m.group(1), Double.parseDouble(m.group(2)));
        }
        return out;
    }

    /** The run's reactions of a member by case in kip, non-zero cases only. */
    private static Map<String, Double> kips(double[] components) {
        return kipsByCase(Component.byCase(components));
    }

    /** Forces by load case ordinal in kip, non-zero cases only. */
    private static Map<String, Double> kipsByCase(double[] byCase) {
        Map<String, Double> out = new java.util.LinkedHashMap<>();
        for (LoadCase lc : LoadCase.values()) {
            if (byCase[lc.ordinal()] != 0) {
                out.put(lc.symbol(), Units.KIPS.fromSi(byCase[lc.ordinal()]));
            }
        }
        return out;
    }

    private static void assertSameKips(Map<String, Double> expected, Map<String, Double> shown, String what) {
        assertEquals(expected.keySet(), shown.keySet(), what + ": the load cases");
        expected.forEach((c, v) -> assertEquals(v, shown.get(c), 0.05 + 1e-9, what + " " + c));
    }

    @Test
    void nothingSelectedShowsTheLevelAndAHint() {
        List<PropertiesViewModel.Item> items = vm.items();
        PropertiesViewModel.Field name = assertInstanceOf(PropertiesViewModel.Field.class, items.get(0));
        assertEquals(model.levelProperty().get(), name.current());
        PropertiesViewModel.Field height = assertInstanceOf(PropertiesViewModel.Field.class, items.get(1));
        assertEquals(PropertiesViewModel.FieldKind.STOREY_HEIGHT, height.kind());
        assertTrue(height.current().endsWith("ft"), height.current());
        PropertiesViewModel.Note hint = assertInstanceOf(PropertiesViewModel.Note.class, items.get(items.size() - 1));
        assertEquals("prop-hint", hint.id());
        assertTrue(hint.text().startsWith("Click a member"), hint.text());
    }

    private PropertiesViewModel.Field field(String label) {
        return vm.items().stream().filter(i -> i instanceof PropertiesViewModel.Field f && f.label().equals(label))
                .map(i -> (PropertiesViewModel.Field) i).findFirst()
                .orElseThrow(() -> new AssertionError("no field " + label + " in " + vm.items()));
    }

    private PropertiesViewModel.Choice choice(String label) {
        return vm.items().stream().filter(i -> i instanceof PropertiesViewModel.Choice c && c.label().equals(label))
                .map(i -> (PropertiesViewModel.Choice) i).findFirst()
                .orElseThrow(() -> new AssertionError("no choice " + label + " in " + vm.items()));
    }

    /**
     * A deck's slab: switched on it is the typical slab (Slab.typical, common practice: 3 in deck, 4½ in of
     * 145 pcf concrete), each value typed in the plan's units lands in the plan, a bad value is refused with
     * a message naming the deck and the field, and undo restores the plan; the computed weight follows the
     * geometry: w = w_c·(t_c + h_r·w_r/pitch) + w_deck (CHECK-VALUES §10, common practice).
     */
    @Test
    void aDecksSlabIsEditedInItsUnitsAndUndone() {
        var deck = model.currentFloor().orElseThrow().decks().get(0);
        String floor = model.currentFloorId();
        if (deck.slab() != null) {
            // the demo describes its slab: take it away first, so that switching it on gives the typical one
            assertTrue(model.edit(p -> org.baywright.plan.PlanEdits.setSlab(p, floor, deck.id(), null), "no slab"));
        }
        model.select(deck.id());
        var before = model.plan();
        assertEquals("None described", choice("Slab").current());
        assertTrue(vm.setChoice(choice("Slab"), "Concrete on deck"));
        var slab = model.currentFloor().orElseThrow().decks().get(0).slab();
        assertTrue(slab != null, "the slab is on");
        assertAll(() -> assertEquals("Concrete on deck", choice("Slab").current()),
                () -> assertEquals(Units.IN.toSi(3), slab.ribHeight(), 1e-9),
                () -> assertEquals("3in", field("Rib height").current()),
                () -> assertEquals("145pcf", field("Concrete unit weight").current()),
                () -> assertEquals("4ksi", field("f′c").current()));
        // 145 pcf × (4.5 in + 3 in × 6/12) / 12 + 2.5 psf = 145 × 0.5 + 2.5 = 75.0 psf
        assertEquals("75.0 psf", row("Slab weight, computed").split("\n")[0]);
        assertTrue(vm.setField(field("Topping"), "5.5"), "a bare number is in inches");
        assertEquals(Units.IN.toSi(5.5), model.currentFloor().orElseThrow().decks().get(0).slab().topping(), 1e-9);
        // 145 × (5.5 + 1.5)/12 + 2.5 = 87.08 psf
        assertEquals("87.1 psf", row("Slab weight, computed").split("\n")[0]);
        assertTrue(vm.setField(field("Concrete unit weight"), "110pcf"));
        assertEquals(Units.PCF.toSi(110), model.currentFloor().orElseThrow().decks().get(0).slab().density(), 1e-6);
        assertFalse(vm.setField(field("Rib width"), "14in"), "wider than the 12 in pitch");
        assertTrue(model.messageProperty().get().contains(deck.id()) && model.messageProperty().get().contains("rib width"),
                model.messageProperty().get());
        assertFalse(vm.setField(field("f′c"), "strong"), "not a stress");
        assertTrue(model.messageProperty().get().contains("f′c"), model.messageProperty().get());
        assertFalse(vm.setField(field("Studs per rib"), "4"));
        assertTrue(vm.setField(field("Slab weight given"), "80psf"));
        assertEquals(Units.PSF.toSi(80), model.currentFloor().orElseThrow().decks().get(0).slab().weightOverride(), 1e-6);
        assertTrue(vm.setField(field("Slab weight given"), ""), "blank: computed again");
        assertTrue(Double.isNaN(model.currentFloor().orElseThrow().decks().get(0).slab().weightOverride()));
        assertTrue(vm.setChoice(choice("Stud position"), "Strong"));
        assertEquals(org.baywright.plan.StudPlacement.STRONG,
                model.plan().floor(floor).orElseThrow().decks().get(0).slab().studPosition());
        var typed = model.currentFloor().orElseThrow().decks().get(0).slab();
        assertTrue(vm.setChoice(choice("Slab"), "None described"));
        assertTrue(vm.setChoice(choice("Slab"), "Concrete on deck"));
        assertEquals(typed, model.currentFloor().orElseThrow().decks().get(0).slab(), "switched back on, nothing typed is lost");
        // one undo step per edit: slab on, topping, concrete, weight given and cleared, stud position, off, on
        for (int i = 0; i < 8; i++) {
            assertTrue(model.undo(), "undo " + (i + 1));
        }
        assertTrue(before.equals(model.plan()), "every slab edit undone");
    }

    /** In an SI plan the slab's fields are in mm, kPa, kN/m³ and MPa, and what they show reads back unchanged. */
    @Test
    void aSlabInAnSiPlanIsInSiUnits() {
        assertTrue(model.edit(p -> org.baywright.plan.PlanEdits.withUnits(p, "si"), "SI"));
        var deck = model.currentFloor().orElseThrow().decks().get(0);
        model.select(deck.id());
        if (deck.slab() == null) {
            assertTrue(vm.setChoice(choice("Slab"), "Concrete on deck"));
        }
        var slab = model.currentFloor().orElseThrow().decks().get(0).slab();
        assertAll(() -> assertEquals("76.2mm", field("Rib height").current()),
                () -> assertTrue(field("Concrete unit weight").current().endsWith("kN/m³"), field("Concrete unit weight").current()),
                () -> assertTrue(field("f′c").current().endsWith("MPa"), field("f′c").current()));
        assertFalse(vm.setField(field("Concrete unit weight"), field("Concrete unit weight").current()), "the same value: no edit");
        assertEquals(slab, model.currentFloor().orElseThrow().decks().get(0).slab());
        assertTrue(vm.setField(field("Topping"), "115"), "a bare number is in mm");
        assertEquals(0.115, model.currentFloor().orElseThrow().decks().get(0).slab().topping(), 1e-12);
        assertTrue(vm.setField(field("Concrete unit weight"), "18kN/m3"));
        assertEquals(18_000, model.currentFloor().orElseThrow().decks().get(0).slab().density(), 1e-9);
    }

    /** The floor's composite setting is on the level's Properties: mode, shoring, construction live load. */
    @Test
    void aFloorIsSwitchedCompositeFromTheLevel() {
        model.select(null);
        String floor = model.currentFloorId();
        var before = model.plan();
        boolean was = choice("Composite action").current().equals("Composite");
        assertTrue(vm.setChoice(choice("Composite action"), was ? "Per member" : "Composite"));
        assertEquals(was ? org.baywright.plan.CompositeMode.PER_MEMBER : org.baywright.plan.CompositeMode.COMPOSITE,
                model.plan().floor(floor).orElseThrow().composite().mode());
        assertTrue(vm.setChoice(choice("Shoring"), "Shored"));
        assertTrue(model.plan().floor(floor).orElseThrow().composite().shored());
        assertEquals("20psf", field("Construction live").current(), "20 psf default (ASCE/SEI 37, from memory)");
        assertTrue(vm.setField(field("Construction live"), "25"));
        assertEquals(Units.PSF.toSi(25), model.plan().floor(floor).orElseThrow().composite().constructionLive(), 1e-6);
        assertFalse(vm.setField(field("Construction live"), "-5psf"));
        assertTrue(model.messageProperty().get().contains("construction live"), model.messageProperty().get());
        assertTrue(model.undo() && model.undo() && model.undo());
        assertEquals(before, model.plan());
    }

    @Test
    void aLevelsNameAndStoreyHeightAreUndoableEdits() {
        String name = model.levelProperty().get();
        var before = model.plan();
        int at = before.levels().stream().map(l -> l.name()).toList().indexOf(name);
        double h0 = before.levels().get(at).storeyHeight();
        assertTrue(vm.setField(field("Storey height"), "16ft"));
        var after = model.plan();
        assertEquals(Units.FT_.toSi(16), after.levels().get(at).storeyHeight(), 1e-9);
        for (int i = at; i < after.levels().size(); i++) {
            assertEquals(before.levels().get(i).elevation() + Units.FT_.toSi(16) - h0, after.levels().get(i).elevation(), 1e-9,
                    "levels at and above move up by the change of height");
        }
        assertFalse(vm.setField(field("Storey height"), "-3ft"), "a negative height is refused");
        assertTrue(model.messageProperty().get().contains("storey height"), model.messageProperty().get());
        assertTrue(model.undo());
        assertEquals(before, model.plan());
        assertTrue(vm.setField(field("Level"), "Mezzanine"));
        assertTrue(model.plan().levels().stream().anyMatch(l -> l.name().equals("Mezzanine")));
        String other = before.levels().get(at == 0 ? 1 : 0).name();
        model.levelProperty().set("Mezzanine");
        assertFalse(vm.setField(field("Level"), other), "two levels may not share a name");
    }

    @Test
    void aLoadAreasValuesAndUseAreUndoableEditsTheRunFollows() {
        var area = model.currentFloor().orElseThrow().areaLoads().get(0);
        model.select(area.id());
        PropertiesViewModel.Field live = field("Live");
        assertEquals(area.values().live() == 0 ? "" : Math.round(Units.PSF.fromSi(area.values().live())) + "psf",
                live.current());
        var before = model.plan();
        assertTrue(vm.setField(live, "125"), "a bare number is in the plan's unit");
        var now = model.currentFloor().orElseThrow().areaLoads().get(0);
        assertEquals(Units.PSF.toSi(125), now.values().live(), 1e-6);
        assertEquals(area.values().superimposed(), now.values().superimposed(), 1e-9, "other cases kept");
        assertEquals("125psf", field("Live").current());
        PropertiesViewModel.UseChoice use = vm.items().stream().filter(i -> i instanceof PropertiesViewModel.UseChoice)
                .map(i -> (PropertiesViewModel.UseChoice) i).findFirst().orElseThrow();
        assertTrue(vm.setUse(use, org.baywright.plan.LiveLoadUse.STORAGE_LIGHT));
        assertEquals(org.baywright.plan.LiveLoadUse.STORAGE_LIGHT, model.currentFloor().orElseThrow().areaLoads().get(0).use());
        assertFalse(vm.setField(field("Snow"), "lots"), "not a load");
        assertTrue(model.messageProperty().get().contains(area.id()), model.messageProperty().get());
        assertTrue(vm.setField(field("Live"), ""), "an empty field is no load");
        assertEquals(0, model.currentFloor().orElseThrow().areaLoads().get(0).values().live());
        assertTrue(model.undo() && model.undo() && model.undo());
        assertEquals(before, model.plan());
    }

    @Test
    void aGirdersRowsAreTheRunsNumbers() {
        MemberResult g = model.currentMembers().stream().filter(m -> m.kind() == MemberKind.GIRDER && m.design() != null
                && !m.design().rejected().isEmpty() && !m.id().contains("/")).findFirst().orElseThrow();
        model.select(g.id());
        List<Check> checks = g.design().checks();
        assertAll(
                () -> assertEquals(g.id(), row("Member")),
                () -> assertEquals("girder", row("Kind")),
                () -> assertEquals(g.section(), row("Section")),
                () -> assertEquals(g.status().label(), row("Status")),
                () -> assertEquals(Units.FT_.fromSi(g.length()), Double.parseDouble(row("Length").replace(" ft", "")), 0.005),
                () -> assertEquals(Units.FT_.fromSi(Units.FT_.fromSi(g.tributaryArea())),
                        Double.parseDouble(row("Tributary area").replace(" ft²", "")), 0.5),
                () -> assertEquals(g.maxRatio(), Double.parseDouble(row("Highest ratio")), 0.005),
                () -> assertSameKips(kips(g.startReaction()), kips(row("Start reaction, service")), "start reaction"),
                () -> assertSameKips(kips(g.endReaction()), kips(row("End reaction, service")), "end reaction"),
                () -> assertEquals(g.startSupport().isEmpty() ? "none" : g.startSupport(), row("Start support")),
                () -> assertEquals(g.endSupport().isEmpty() ? "none" : g.endSupport(), row("End support")));
        assertFalse(checks.isEmpty());
        for (Check c : checks) {
            String shown = row("  " + c.name());
            assertEquals(c.ratio(), Double.parseDouble(shown.split(" ")[0]), 0.005, c.name());
            assertEquals(c.combination().isEmpty(), !shown.contains("("), c.name() + ": the combination is named");
        }
        // the member's service loads by case, as the design took them: live load reduced, and unreduced beside it
        String loads = row("Span loads, service");
        for (LoadCase lc : g.loads().present()) {
            Matcher m = Pattern.compile("(^|\n)" + Pattern.quote(lc.symbol()) + " ([0-9.]+) kip").matcher(loads);
            assertTrue(m.find(), lc + " in " + loads);
            assertEquals(Units.KIPS.fromSi(g.loads().of(lc).totalLoad()), Double.parseDouble(m.group(2)), 0.05, lc.symbol());
        }
        assertTrue(g.loads().present().contains(LoadCase.L), "a girder of the demo carries live load");
        Matcher reduced = Pattern.compile("\nL [0-9.]+ kip reduced \\(× ([0-9.]+)\\)").matcher(loads);
        assertTrue(reduced.find(), loads);
        assertEquals(g.liveFactor(), Double.parseDouble(reduced.group(1)), 0.005);
        // unreduced: the live load both ends pass on (equilibrium of a simple span)
        Matcher l0 = Pattern.compile("\nL0 ([0-9.]+) kip unreduced").matcher(loads);
        assertTrue(l0.find(), loads);
        double unreduced = Units.KIPS.fromSi(Component.byCase(g.startReaction())[LoadCase.L.ordinal()]
                + Component.byCase(g.endReaction())[LoadCase.L.ordinal()]);
        assertEquals(unreduced, Double.parseDouble(l0.group(1)), 0.05);
        assertTrue(g.liveFactor() < 1, "the demo's girders have reduced live load");
        assertTrue(Double.parseDouble(l0.group(1)) > Units.KIPS.fromSi(g.loads().of(LoadCase.L).totalLoad()),
                "reduced live load is less than unreduced");
        for (String end : List.of("Start", "End")) {
            String service = row(end + " reaction, service");
            assertTrue(service.endsWith("(live load unreduced)"), service);
            // the governing LRFD reaction: max(1.4D, 1.2D + 1.6L) of the service reactions (ASCE 7-16 §2.3.1)
            Map<String, Double> by = kips(end.equals("Start") ? g.startReaction() : g.endReaction());
            double d = by.getOrDefault("D", 0.0);
            double l = by.getOrDefault("L", 0.0);
            String factored = row(end + " reaction, factored");
            Matcher f = Pattern.compile("^([0-9.]+) kip \\((.+)\\)\n\\(live load unreduced\\)$").matcher(factored);
            assertTrue(f.find(), factored);
            assertEquals(Math.max(1.4 * d, 1.2 * d + 1.6 * l), Double.parseDouble(f.group(1)), 0.1, end);
            assertEquals(1.4 * d > 1.2 * d + 1.6 * l ? "1.4D" : "1.2D + 1.6L", f.group(2), end);
        }
        // the heaviest rejected sections first, each with its governing check
        var rejected = g.design().rejected();
        String[] lines = row("Lighter, rejected").split("\n");
        assertTrue(lines[0].startsWith(rejected.get(rejected.size() - 1).section().designation() + ": "), lines[0]);
        assertEquals(Math.min(PropertiesViewModel.REJECTED_SHOWN, rejected.size()) + (rejected.size() > 4 ? 1 : 0), lines.length);
        PropertiesViewModel.FixedSize fixed = vm.items().stream().filter(i -> i instanceof PropertiesViewModel.FixedSize)
                .map(i -> (PropertiesViewModel.FixedSize) i).findFirst().orElseThrow();
        assertEquals(new PropertiesViewModel.FixedSize(model.currentFloorId(), g.id(), ""), fixed);
    }

    @Test
    void aColumnsRowsAreItsTiersAndFoundation() {
        ColumnResult c = model.run().takedown().columns().stream().filter(r -> r.tiers().size() > 1).findFirst()
                .orElseGet(() -> model.run().takedown().columns().get(0));
        model.select(c.id());
        var column = model.plan().columns().stream().filter(x -> x.id().equals(c.id())).findFirst().orElseThrow();
        assertEquals(c.id(), row("Column"));
        assertEquals(column.grid().isEmpty() ? "off grid" : column.grid(), row("Grid"));
        for (ColumnTier t : c.tiers()) {
            List<String> lv = t.levels();
            String label = "Tier " + lv.get(0) + (lv.size() > 1 ? "–" + lv.get(lv.size() - 1) : "");
            String[] shown = row(label).split("\\s+");
            assertEquals(t.section(), shown[0], label);
            assertEquals(t.maxRatio(), Double.parseDouble(shown[1]), 0.005, label);
        }
        long tierRows = vm.items().stream().filter(i -> i instanceof PropertiesViewModel.Row r && r.label().startsWith("Tier "))
                .count();
        assertEquals(c.tiers().size(), tierRows, "one row per tier");
        assertSameKips(kipsByCase(c.foundation()), kips(row("Foundation, service")), "foundation");
        assertTrue(row("Foundation, service").endsWith("(live load unreduced)"));
        assertSameKips(kipsByCase(c.foundationReduced()), kips(row("Foundation, service, live reduced")), "foundation, reduced");
        assertTrue(row("Foundation, factored").endsWith("(live load reduced)"));
        assertTrue(vm.items().get(vm.items().size() - 1) instanceof PropertiesViewModel.FixedSize f && f.objectId().equals(c.id()));
    }

    @Test
    void aLoadAreaShowsItsValuesInThePlansUnits() {
        var area = model.currentFloor().orElseThrow().areaLoads().get(0);
        model.select(area.id());
        Map<String, Double> psf = new java.util.HashMap<>();
        Matcher m = Pattern.compile("(\\w+) ([0-9.]+) psf").matcher(row("Loads"));
        while (m.find()) {
            psf.put(m.group(1), Double.parseDouble(m.group(2)));
        }
        if (area.values().live() != 0) {
            assertEquals(Units.PSF.fromSi(area.values().live()), psf.get("L"), 0.5);
        }
        if (area.values().superimposed() != 0) {
            assertEquals(Units.PSF.fromSi(area.values().superimposed()), psf.get("SD"), 0.5);
        }
        assertFalse(psf.isEmpty(), row("Loads"));
        assertEquals(area.id(), row("Load area"));
    }

    @Test
    void severalSelectedAreNamedAboveThePrimary() {
        List<MemberResult> ms = model.currentMembers();
        model.selectAll(List.of(ms.get(0).id(), ms.get(1).id()), false);
        PropertiesViewModel.Note many = assertInstanceOf(PropertiesViewModel.Note.class, vm.items().get(0));
        assertEquals("prop-many", many.id());
        assertEquals("2 objects selected: " + ms.get(0).id() + ", " + ms.get(1).id(), many.text());
        assertEquals(Optional.of(ms.get(0).id()), vm.value("Member"));
    }

    @Test
    void settingAFixedSizeIsAnUndoableEditTheRunFollows() {
        MemberResult g = model.currentMembers().stream().filter(m -> m.kind() == MemberKind.GIRDER && !m.id().contains("/")
                && m.design() != null && !m.design().rejected().isEmpty()).findFirst().orElseThrow();
        model.select(g.id());
        PropertiesViewModel.FixedSize field = vm.items().stream().filter(i -> i instanceof PropertiesViewModel.FixedSize)
                .map(i -> (PropertiesViewModel.FixedSize) i).findFirst().orElseThrow();
        String heavier = "W27X94";
        assertTrue(vm.setFixedSize(field, " w27x94 "));
        assertEquals(heavier, row("Section"), "the run checks the fixed size");
        assertEquals(g.id() + ": fixed size " + heavier, model.undoLabel());
        PropertiesViewModel.FixedSize now = vm.items().stream().filter(i -> i instanceof PropertiesViewModel.FixedSize)
                .map(i -> (PropertiesViewModel.FixedSize) i).findFirst().orElseThrow();
        assertEquals(heavier, now.current().toUpperCase(java.util.Locale.ROOT));
        assertTrue(vm.setFixedSize(now, ""));
        assertEquals(g.section(), row("Section"), "blank goes back to the lightest adequate size");
    }

    /** The demo's balcony beams run 35 ft from grid 2 to grid 1 and 6 ft past it (the demo, HarbourviewDemo). */
    @Test
    void anOverhangingBeamSaysItsBackspanAndOverhang() {
        MemberResult m = model.currentMembers().stream().filter(MemberResult::overhangs).findFirst()
                .orElseThrow(() -> new AssertionError("the demo's level shown has no overhanging beam"));
        model.select(m.id());
        String text = row("Overhang");
        assertTrue(text.startsWith("backspan 35.00 ft, overhang 6.00 ft past its second support"), text);
        assertTrue(text.contains("K_LL = 1"), text);
        assertEquals("1", String.valueOf((int) m.kll()), "ASCE 7-16 Table 4.7-1: cantilever members");
    }
}
