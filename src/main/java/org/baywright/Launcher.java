package org.baywright;

import org.baywright.cli.BaywrightCommand;

/**
 * Entry point of {@code baywright.jar}. Deliberately not a JavaFX {@code Application}: the command
 * line must work on a machine with no display and no JavaFX toolkit.
 */
public final class Launcher {

    private Launcher() {
    }

    public static void main(String[] args) {
        System.exit(BaywrightCommand.execute(args));
    }
}
