package org.baywright.ui;

import java.util.Objects;

/** The editor's stylesheet ({@code baywright.css}) and the style classes the window's parts use. */
final class Styles {
    /** The bar of the current tool's options. */
    static final String TOOL_OPTIONS = "tool-options";
    /** The current tool's name in its options bar. */
    static final String TOOL_NAME = "tool-name";
    /** Quieter text: hints and notes. */
    static final String QUIET = "quiet-text";
    /** A panel's title (Properties, Problems). */
    static final String PANEL_TITLE = "panel-title";
    /** The label column of the Properties panel. */
    static final String PROPERTY_LABEL = "property-label";
    /** The calculation sheet's monospaced text. */
    static final String CALCULATION = "calculation-sheet";
    /** The status bar at the bottom of the window. */
    static final String STATUS_BAR = "status-bar";
    /** The caution under the status line. */
    static final String CAUTION = "caution-text";
    /** A field's error message in a dialog. */
    static final String FIELD_ERROR = "field-error";

    private Styles() {
    }

    /** The stylesheet's URL, for {@code getStylesheets().add(…)}. */
    static String sheet() {
        return Objects.requireNonNull(Styles.class.getResource("baywright.css"), "baywright.css is missing").toExternalForm();
    }

    /** A node's style classes plus {@code style}; returns the node. */
    static <T extends javafx.scene.Node> T with(T node, String style) {
        node.getStyleClass().add(style);
        return node;
    }
}
