package org.baywright.ui;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.event.ActionEvent;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.VBox;
import javafx.stage.Window;

/**
 * The offer at start-up of plans autosaved by an editor that did not close normally: one row each
 * (plan name, original file or "not saved", time autosaved) and Recover, Discard, Later. Plans that
 * could not be read are listed as set aside, with where they are kept.
 */
final class RecoveryDialog {
    static final ButtonType RECOVER = new ButtonType("Recover", ButtonBar.ButtonData.OK_DONE);
    static final ButtonType DISCARD = new ButtonType("Discard", ButtonBar.ButtonData.OTHER);
    static final ButtonType LATER = new ButtonType("Later", ButtonBar.ButtonData.CANCEL_CLOSE);

    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

    private RecoveryDialog() {
    }

    /** One row: {@code name — original file or "not saved" — autosaved time}. */
    static String describe(RecoveryStore.Entry e, ZoneId zone) {
        return e.plan().name() + " — " + (e.originalFile() == null ? "not saved" : e.originalFile().toString())
                + " — autosaved " + TIME.format(e.autosaved().atZone(zone));
    }

    /**
     * Shows the offer (not modal-blocking: it returns at once). {@code recover} opens the chosen plan
     * and says whether it did (false: the user kept the current plan, and the dialog stays);
     * {@code discard} deletes one and says whether it did.
     */
    static Dialog<ButtonType> show(Window owner, RecoveryStore.LeftOver found, Predicate<RecoveryStore.Entry> recover,
            Predicate<RecoveryStore.Entry> discard) {
        Dialog<ButtonType> d = new Dialog<>();
        if (owner != null) {
            d.initOwner(owner);
        }
        d.setTitle("Baywright");
        d.setHeaderText(found.entries().isEmpty() ? "Autosaved work could not be read"
                : "Unsaved work from a session that did not end normally");
        ObservableList<RecoveryStore.Entry> rows = FXCollections.observableArrayList(found.entries());
        ListView<RecoveryStore.Entry> list = new ListView<>(rows);
        list.setId("recovery-list");
        list.setPlaceholder(new Label("Nothing left to recover."));
        list.setPrefHeight(Math.min(8, Math.max(3, rows.size() + 1)) * 26);
        list.setPrefWidth(640);
        ZoneId zone = ZoneId.systemDefault();
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(RecoveryStore.Entry e, boolean empty) {
                super.updateItem(e, empty);
                setText(empty || e == null ? null : describe(e, zone));
            }
        });
        list.getSelectionModel().selectFirst();
        Label intro = new Label("These plans were autosaved and never saved or discarded. Recover opens the selected "
                + "one as unsaved work (save it to keep it); Discard deletes its autosaved copy; Later keeps them "
                + "all for the next start.");
        intro.setWrapText(true);
        intro.setMaxWidth(640);
        VBox box = new VBox(8, intro, list);
        if (!found.setAside().isEmpty()) {
            Label aside = new Label(found.setAside().stream().map(RecoveryStore.SetAside::message)
                    .collect(Collectors.joining("\n")));
            aside.setId("recovery-set-aside");
            aside.setWrapText(true);
            aside.setMaxWidth(640);
            box.getChildren().add(aside);
        }
        if (found.entries().isEmpty()) {
            box.getChildren().removeAll(intro, list);
        }
        d.getDialogPane().setContent(box);
        d.getDialogPane().getButtonTypes().setAll(RECOVER, DISCARD, LATER);
        Button recoverButton = (Button) d.getDialogPane().lookupButton(RECOVER);
        Button discardButton = (Button) d.getDialogPane().lookupButton(DISCARD);
        Button laterButton = (Button) d.getDialogPane().lookupButton(LATER);
        recoverButton.setId("recovery-recover");
        discardButton.setId("recovery-discard");
        laterButton.setId("recovery-later");
        if (found.entries().isEmpty()) {
            laterButton.setText("OK");
        }
        recoverButton.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        discardButton.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        recoverButton.addEventFilter(ActionEvent.ACTION, ev -> {
            RecoveryStore.Entry e = list.getSelectionModel().getSelectedItem();
            if (e == null || !recover.test(e)) {
                ev.consume(); // the dialog stays
            }
        });
        discardButton.addEventFilter(ActionEvent.ACTION, ev -> {
            ev.consume(); // the dialog stays for the others
            RecoveryStore.Entry e = list.getSelectionModel().getSelectedItem();
            if (e != null && discard.test(e)) {
                rows.remove(e);
                list.getSelectionModel().selectFirst();
                if (rows.isEmpty() && found.setAside().isEmpty()) {
                    d.setResult(DISCARD);
                    d.close();
                }
            }
        });
        d.show();
        return d;
    }
}
