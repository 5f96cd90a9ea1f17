package org.baywright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiFunction;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import javafx.scene.control.CheckMenuItem;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCombination;
import javafx.stage.Window;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;

/** The menu bar: File, Edit, View, Design (units and method, as undoable edits) and Help. */
final class MainMenus {
    private final EditorModel model;
    private final MenuBar bar;

    /**
     * @param showTab shows a tab by its name (View › Plan, View › Study)
     * @param owner the window the Help dialogs belong to
     */
    MainMenus(EditorModel model, FileActions files, PlanCanvas canvas, Consumer<String> showTab, Supplier<Window> owner) {
        this.model = model;
        bar = new MenuBar(file(files), edit(), view(canvas, showTab), design(),
                new Menu("Help", null, item("Tools and keys", "F1", () -> HelpDialogs.keys(owner.get())),
                        item("About Baywright", null, () -> HelpDialogs.about(owner.get()))));
        bar.setId("menu-bar");
    }

    /** The menu bar. */
    MenuBar bar() {
        return bar;
    }

    private Menu file(FileActions files) {
        Menu openRecent = new Menu("Open Recent");
        openRecent.setId("menu-recent");
        openRecent.getItems().add(new MenuItem("(none)"));
        openRecent.setOnShowing(e -> files.fillRecent(openRecent));
        MenuItem save = item("Save", "Shortcut+S", files::save);
        MenuItem saveAs = item("Save As…", "Shortcut+Shift+S", files::saveAs);
        save.disableProperty().bind(model.planProperty().isNull());
        saveAs.disableProperty().bind(model.planProperty().isNull());
        Menu export = new Menu("Export", null,
                item("Framing plan of this level…", null, () -> files.export("Export the framing plan",
                        model.levelProperty().get(), null, ".pdf", new String[] {"*.pdf", "*.svg", "*.png"}, model::exportDrawing)),
                item("Calculation package…", null, () -> files.export("Export the calculation package", null, "calculations",
                        ".pdf", new String[] {"*.pdf"}, model::exportPackage)),
                item("Takeoff…", null, files::exportTakeoff),
                item("Column schedule…", null, () -> files.export("Export the column schedule", null, "columns", ".csv",
                        new String[] {"*.csv"}, model::exportSchedule)));
        export.setId("menu-export");
        export.disableProperty().bind(model.runProperty().isNull());
        return new Menu("File", null, item("New…", "Shortcut+N", files::newPlan), item("Open…", "Shortcut+O", files::chooseAndOpen),
                openRecent, save, saveAs, new SeparatorMenuItem(), export, new SeparatorMenuItem(),
                item("Exit", "Shortcut+Q", files::exit));
    }

    private Menu edit() {
        MenuItem undo = item("Undo", "Shortcut+Z", model::undo);
        undo.setId("menu-undo");
        MenuItem redo = item("Redo", "Shortcut+Shift+Z", model::redo);
        MenuItem redoY = item("Redo (again)", "Shortcut+Y", model::redo);
        redoY.setVisible(false);
        undo.disableProperty().bind(model.canUndoProperty().not());
        redo.disableProperty().bind(model.canRedoProperty().not());
        MenuItem delete = item("Delete selection   (Delete)", null, model::deleteSelection);
        delete.setId("menu-delete");
        return new Menu("Edit", null, undo, redo, redoY, new SeparatorMenuItem(), delete);
    }

    private Menu view(PlanCanvas canvas, Consumer<String> showTab) {
        MenuItem fit = item("Zoom to fit", "Shortcut+0", canvas::zoomToFit);
        fit.setId("menu-zoom-fit");
        CheckMenuItem reactions = new CheckMenuItem("End reactions");
        reactions.setId("menu-reactions");
        reactions.setAccelerator(KeyCombination.keyCombination("Shortcut+R"));
        reactions.selectedProperty().bindBidirectional(model.showReactionsProperty());
        CheckMenuItem tributary = new CheckMenuItem("Tributary areas");
        tributary.setId("menu-tributary");
        tributary.setAccelerator(KeyCombination.keyCombination("Shortcut+T"));
        tributary.selectedProperty().bindBidirectional(model.showTributaryProperty());
        CheckMenuItem vibration = new CheckMenuItem("Floor vibration");
        vibration.setId("menu-vibration");
        vibration.selectedProperty().bindBidirectional(model.showVibrationProperty());
        return new Menu("View", null, item("Plan", "Shortcut+1", () -> showTab.accept("Plan")),
                item("Study", "Shortcut+2", () -> showTab.accept("Study")), new SeparatorMenuItem(), fit,
                new SeparatorMenuItem(), reactions, tributary, vibration, new SeparatorMenuItem(), item("Run again", "F5", model::rerun));
    }

    private Menu design() {
        Menu units = choiceMenu("Units", Plan::units, PlanEdits::withUnits,
                new Choice("US customary (ft, kip, psf)", "menu-units-us", "us", "Units: US customary"),
                new Choice("SI (m, kN, kPa)", "menu-units-si", "si", "Units: SI"));
        Menu method = choiceMenu("Design method", p -> p.settings().method(), PlanEdits::withMethod,
                new Choice("LRFD", "menu-method-lrfd", "lrfd", "Design method: LRFD"),
                new Choice("ASD", "menu-method-asd", "asd", "Design method: ASD"));
        Menu deflection = choiceMenu("Deflection under live load", p -> p.settings().deflectionLiveReduced() ? "reduced" : "unreduced",
                PlanEdits::withDeflectionLiveLoad,
                new Choice("Unreduced live load (serviceability, common practice)", "menu-deflection-unreduced", "unreduced",
                        "Deflection under unreduced live load"),
                new Choice("Live load reduced as for strength", "menu-deflection-reduced", "reduced",
                        "Deflection under reduced live load"));
        Menu ceiling = choiceMenu("Roof members carry", MainMenus::roofCeiling,
                (p, v) -> PlanEdits.withRoofCeiling(p, org.baywright.plan.RoofCeiling.valueOf(v)),
                new Choice("A plaster or stucco ceiling (L/360, L/240)", "menu-roof-plaster", "PLASTER",
                        "Roof members: plaster ceiling"),
                new Choice("A non-plaster ceiling (L/240, L/180)", "menu-roof-non-plaster", "NON_PLASTER",
                        "Roof members: non-plaster ceiling"),
                new Choice("No ceiling (L/180, L/120)", "menu-roof-none", "NONE", "Roof members: no ceiling"));
        Menu design = new Menu("Design", null, units, method, new SeparatorMenuItem(), deflection, ceiling);
        design.setId("menu-design");
        return design;
    }

    /** The ceiling the plan's (first) roof layout carries, as the Roof menu names it. */
    private static String roofCeiling(Plan p) {
        return p.floors().stream().filter(f -> f.roof()).findFirst().map(f -> p.settings().roofCeiling(f.id()))
                .orElse(org.baywright.plan.RoofCeiling.DEFAULT).name();
    }

    /** One choice of a radio menu: its text, node id, the plan value it sets and the edit's label. */
    private record Choice(String text, String id, String value, String label) {
    }

    /** A radio menu whose choices are undoable plan edits, kept in step with the plan shown. */
    private Menu choiceMenu(String title, Function<Plan, String> current, BiFunction<Plan, String, Plan> set,
            Choice... choices) {
        ToggleGroup g = new ToggleGroup();
        List<RadioMenuItem> items = new ArrayList<>();
        for (Choice c : choices) {
            RadioMenuItem item = new RadioMenuItem(c.text());
            item.setId(c.id());
            item.setToggleGroup(g);
            item.setOnAction(e -> model.edit(p -> set.apply(p, c.value()), c.label()));
            items.add(item);
        }
        Runnable sync = () -> {
            String now = model.plan() == null ? choices[0].value() : current.apply(model.plan());
            for (int i = 0; i < choices.length; i++) {
                items.get(i).setSelected(choices[i].value().equalsIgnoreCase(now));
            }
        };
        model.planProperty().addListener((o, a, b) -> sync.run());
        sync.run();
        return new Menu(title, null, items.toArray(new MenuItem[0]));
    }

    private static MenuItem item(String text, String keys, Runnable action) {
        MenuItem m = new MenuItem(text);
        if (keys != null) {
            m.setAccelerator(KeyCombination.keyCombination(keys));
        }
        m.setOnAction(e -> action.run());
        return m;
    }
}
