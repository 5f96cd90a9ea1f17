package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.logging.Handler;
import java.util.logging.LogRecord;
import java.util.logging.Logger;
import org.junit.jupiter.api.Test;

/** The class-path notice of JavaFX is kept off the console; other JavaFX messages are not. */
class StartupLogTest {
    @Test
    void onlyTheClasspathNoticeIsDropped() {
        Logger javafx = Logger.getLogger(StartupLog.JAVAFX_LOGGER);
        List<String> seen = new ArrayList<>();
        Handler h = new Handler() {
            @Override
            public void publish(LogRecord r) {
                seen.add(r.getMessage());
            }

            @Override
            public void flush() {
            }

            @Override
            public void close() {
            }
        };
        javafx.addHandler(h);
        try {
            StartupLog.quietClasspathNotice();
            StartupLog.quietClasspathNotice(); // twice: still one filter
            // the way JavaFX writes it: System.Logger "javafx", backed by java.util.logging
            System.Logger fx = System.getLogger(StartupLog.JAVAFX_LOGGER);
            fx.log(System.Logger.Level.WARNING, "Unsupported JavaFX configuration: classes were loaded from 'unnamed module @1b2c3d'");
            fx.log(System.Logger.Level.WARNING, "Loading FXML document with JavaFX API of version 99 by JavaFX runtime of version 21");
            assertEquals(List.of("Loading FXML document with JavaFX API of version 99 by JavaFX runtime of version 21"), seen);
        } finally {
            javafx.removeHandler(h);
        }
    }
}
