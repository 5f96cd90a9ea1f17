package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** The window's looks come from baywright.css: the parts carry style classes, not inline styles. */
@ExtendWith(ApplicationExtension.class)
class WindowStylesFxTest {
    private EditorModel model;
    private MainWindow window;

    @Start
    void start(Stage stage) {
        model = new EditorModel(TaskRunner.direct());
        window = new MainWindow(model, stage::close);
        stage.setScene(new Scene(window.root(), 1200, 740));
        stage.show();
        assertTrue(window.open(Path.of(BaywrightApp.DEMO)));
    }

    private boolean inStudy(javafx.scene.Node n) {
        for (javafx.scene.Node p = n; p != null; p = p.getParent()) {
            if (p == window.study()) {
                return true;
            }
        }
        return false;
    }

    @Test
    void theStylesheetStylesThePanels(FxRobot robot) {
        robot.interact(() -> model.select(model.currentMembers().get(0).id()));
        Label member = robot.lookup("#prop-member").queryAs(Label.class);
        Label memberLabel = (Label) member.getParent().getChildrenUnmodifiable().stream()
                .filter(n -> n instanceof Label l && "Member".equals(l.getText())).findFirst().orElseThrow();
        Label caution = robot.lookup("#caution").queryAs(Label.class);
        TextArea sheet = robot.lookup("#calculation").queryAs(TextArea.class);
        Region options = robot.lookup("#tool-options").queryAs(Region.class);
        assertAll(
                () -> assertEquals(Color.web("#4a4d52"), memberLabel.getTextFill()),
                () -> assertEquals(Color.web("#5b4a1e"), caution.getTextFill()),
                () -> assertEquals(11, caution.getFont().getSize(), 1e-9),
                () -> assertEquals("DejaVu Sans Mono", sheet.getFont().getFamily()),
                () -> assertEquals(Color.web("#f1efe8"), options.getBackground().getFills().get(0).getFill()),
                () -> assertTrue(robot.lookup(".label").queryAllAs(Label.class).stream().filter(l -> !inStudy(l))
                        .allMatch(l -> l.getStyle().isEmpty()), "no inline styles on the window's labels (the Study tab aside)"));
    }
}
