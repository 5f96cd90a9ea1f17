package org.baywright.ui;

import javafx.collections.FXCollections;
import javafx.scene.control.ComboBox;
import javafx.util.StringConverter;
import org.baywright.plan.LiveLoadUse;

/** The list of load-area uses, shown in the trade's words with the ASCE 7-16 clause that reduces them. */
final class UseList {
    private UseList() {
    }

    /** A list showing {@code current}. */
    static ComboBox<LiveLoadUse> of(LiveLoadUse current) {
        ComboBox<LiveLoadUse> box = new ComboBox<>(FXCollections.observableArrayList(LiveLoadUse.values()));
        box.setConverter(new StringConverter<>() {
            @Override
            public String toString(LiveLoadUse u) {
                return u == null ? "" : u.label();
            }

            @Override
            public LiveLoadUse fromString(String s) {
                for (LiveLoadUse u : LiveLoadUse.values()) {
                    if (u.label().equals(s)) {
                        return u;
                    }
                }
                return null;
            }
        });
        box.setValue(current);
        box.setMaxWidth(Double.MAX_VALUE);
        return box;
    }
}
