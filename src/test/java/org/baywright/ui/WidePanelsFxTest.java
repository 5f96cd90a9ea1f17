package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.scene.control.skin.TableColumnHeader;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The side panel at the window's usual start size, 1440 × 900: every column and every calculation line shows whole. */
@ExtendWith(ApplicationExtension.class)
class WidePanelsFxTest {
    private EditorModel model;
    private MainWindow window;
    private UserSettings settings;

    @Start
    void start(Stage stage) throws Exception {
        Path home = Files.createTempDirectory("baywright-wide");
        settings = new UserSettings(home.resolve("settings.properties"));
        model = new EditorModel(TaskRunner.direct());
        window = new MainWindow(model, stage::close, new RecentFiles(home.resolve("recent.txt")), settings);
        stage.setScene(new Scene(window.root(), 1440, 900));
        stage.show();
        assertTrue(window.open(Path.of(BaywrightApp.DEMO)));
    }

    @Test
    void theMembersTableShowsRatioAndStatusWhole(FxRobot robot) {
        robot.interact(() -> window.showTab("Members"));
        WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        TableView<MemberResult> table = robot.lookup("#members-table").queryAs(TableView.class);
        Bounds tableBounds = table.localToScene(table.getLayoutBounds());
        for (String name : new String[] {"Ratio", "Status"}) {
            TableColumn<MemberResult, ?> c = table.getColumns().stream().filter(x -> x.getText().equals(name)).findFirst().orElseThrow();
            TableColumnHeader header = table.lookupAll(".column-header").stream().filter(n -> n instanceof TableColumnHeader h
                    && h.getTableColumn() == c).map(n -> (TableColumnHeader) n).findFirst().orElseThrow();
            Bounds b = header.localToScene(header.getLayoutBounds());
            assertTrue(b.getMaxX() <= tableBounds.getMaxX() + 0.5, name + " ends inside the table: " + b + " in " + tableBounds);
            assertTrue(c.getWidth() >= textWidth(name) + 8, name + " is wide enough for its heading: " + c.getWidth());
        }
        // the widest status text fits its column
        TableColumn<MemberResult, ?> status = table.getColumns().get(table.getColumns().size() - 1);
        double widest = table.getItems().stream().mapToDouble(m -> textWidth(m.status().label())).max().orElse(0);
        assertTrue(status.getWidth() >= widest + 8, "status " + status.getWidth() + " < " + widest);
    }

    @Test
    void theCalculationSheetIsNotCut(FxRobot robot) {
        MemberResult m = model.currentMembers().stream().filter(x -> x.calculation() != null).findFirst().orElseThrow();
        robot.interact(() -> {
            model.select(m.id());
            window.showTab("Calculation");
        });
        WaitForAsyncUtils.waitForFxEvents();
        TextArea text = robot.lookup("#calculation").queryAs(TextArea.class);
        ScrollPane scroll = (ScrollPane) text.lookup(".scroll-pane");
        double viewport = scroll.getViewportBounds().getWidth();
        double longest = text.getText().lines().mapToDouble(l -> {
            Text t = new Text(l);
            t.setFont(text.getFont());
            return t.getLayoutBounds().getWidth();
        }).max().orElse(0);
        assertTrue(longest > viewport, "the sheet has lines longer than the panel (" + longest + " > " + viewport + "), so the test means something");
        Node content = scroll.getContent();
        assertTrue(content.getLayoutBounds().getWidth() <= viewport + 1,
                "the text wraps to the panel: " + content.getLayoutBounds().getWidth() + " > " + viewport);
    }

    @Test
    void theSidePanelStartsWideEnoughAndItsWidthIsRemembered(FxRobot robot) {
        Node side = robot.lookup("#side-tabs").query();
        double w = side.getLayoutBounds().getWidth();
        assertTrue(w >= MainWindow.SIDE_MIN - 1, "side panel " + w);
        robot.interact(window::rememberSideWidth);
        assertEquals(Math.round(w), Math.round(settings.number(UserSettings.SIDE_WIDTH, -1)));
    }

    private static double textWidth(String s) {
        Text t = new Text(s);
        t.setFont(javafx.scene.text.Font.getDefault());
        return t.getLayoutBounds().getWidth();
    }
}
