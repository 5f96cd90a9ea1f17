package org.baywright;

import org.baywright.cli.BaywrightCommand;

/**
 * Entry point of {@code baywright.jar}. Deliberately not a JavaFX {@code Application}: the command
 * line must work on a machine with no display and no JavaFX toolkit. With no arguments it opens the
 * editor ({@code org.baywright.ui.Desktop}, loaded only then); with any argument it is the CLI.
 */
public final class Launcher {

    private Launcher() {
    }

    public static void main(String[] args) {
        if (args.length == 0) {
            System.exit(org.baywright.ui.Desktop.open(args));
        }
        System.exit(BaywrightCommand.execute(args));
    }
}
