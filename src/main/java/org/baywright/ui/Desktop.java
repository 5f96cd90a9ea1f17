package org.baywright.ui;

import javafx.application.Application;

/**
 * Starts the editor from the command-line launcher. Kept apart so that the launcher touches JavaFX
 * only when the editor is asked for: {@code baywright --help} never loads the toolkit.
 */
public final class Desktop {
    private Desktop() {
    }

    /**
     * Opens the editor and returns when its window closes: 0, or 1 with a message when there is no
     * display to open it on.
     */
    public static int open(String[] args) {
        try {
            StartupLog.quietClasspathNotice();
            Application.launch(BaywrightApp.class, args);
            return 0;
        } catch (RuntimeException | UnsatisfiedLinkError e) {
            System.err.println("baywright: the editor could not start (" + e.getMessage() + "). It needs a display;"
                    + " the command line works without one: baywright --help");
            return 1;
        }
    }
}
