package org.baywright.ui;

import javafx.scene.control.Alert;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.stage.Window;
import org.baywright.calc.Caution;
import org.baywright.run.PlanRun;

/** The Help menu's dialogs: the tools and keys, and About (with the caution). */
final class HelpDialogs {
    private HelpDialogs() {
    }

    /** The About text: name, version, what it is, and the caution. */
    static String aboutText() {
        return "Baywright " + PlanRun.version() + "\n\n"
                + "Steel floor framing: tributary areas, load takedown and AISC 360 member sizing.\n"
                + "Open source under the Apache License 2.0.\n\n" + Caution.TEXT;
    }

    /** The tools with their keys and hints, then the other keys. */
    static String keysText() {
        StringBuilder b = new StringBuilder();
        for (Tool t : Tool.values()) {
            b.append(t.key().getName()).append("  ").append(t.label()).append(" — ").append(t.hint()).append("\n");
        }
        return b.append("\nDelete  remove the selection     Esc  cancel / clear selection     Enter  finish an outline or path\n")
                .append("Backspace  take back the last point     F  zoom to fit     Space + drag or middle drag  pan\n")
                .append("Scroll  zoom at the cursor     Ctrl+Z / Ctrl+Shift+Z  undo / redo     Ctrl+R  end reactions\n")
                .append("Ctrl+T  tributary areas     F5  run again     Ctrl+N/O/S  new, open, save").toString();
    }

    static void about(Window owner) {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(owner);
        a.setTitle("About Baywright");
        a.setHeaderText("Baywright");
        Label body = new Label(aboutText());
        body.setWrapText(true);
        body.setMaxWidth(460);
        body.setId("about-text");
        a.getDialogPane().setContent(body);
        a.show();
    }

    static void keys(Window owner) {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.initOwner(owner);
        a.setTitle("Baywright");
        a.setHeaderText("Tools and keys");
        TextArea text = new TextArea(keysText());
        text.setEditable(false);
        text.setWrapText(true);
        text.setPrefColumnCount(80);
        text.setPrefRowCount(18);
        a.getDialogPane().setContent(text);
        a.show();
    }
}
