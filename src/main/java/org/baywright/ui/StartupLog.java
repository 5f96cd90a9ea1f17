package org.baywright.ui;

import java.util.logging.Filter;
import java.util.logging.Logger;

/**
 * Keeps one JavaFX start-up line off the user's console.
 *
 * <p>Baywright ships as one runnable jar on the class path (the launcher must work with no display and no
 * toolkit, and PDFBox and JTS are automatic modules, so a module-path image is not an option: see the
 * build notes). On every class-path start JavaFX logs "Unsupported JavaFX configuration: classes were
 * loaded from 'unnamed module …'" to its {@code javafx} logger. The configuration is deliberate and
 * tested, the line asks nothing of the user and reads like a fault, so a filter drops exactly that
 * record; every other JavaFX message still prints.
 */
final class StartupLog {
    /** The logger JavaFX writes to (System.Logger "javafx", backed by java.util.logging by default). */
    static final String JAVAFX_LOGGER = "javafx";
    /** The start of the one message dropped. */
    static final String CLASSPATH_NOTICE = "Unsupported JavaFX configuration";

    /** Held so the configured logger is not collected (java.util.logging keeps loggers weakly). */
    private static final Logger LOGGER = Logger.getLogger(JAVAFX_LOGGER);

    private StartupLog() {
    }

    /** Installs the filter (idempotent); call before the toolkit starts. */
    static synchronized void quietClasspathNotice() {
        Filter previous = LOGGER.getFilter();
        if (previous instanceof ClasspathNotice) {
            return;
        }
        LOGGER.setFilter(new ClasspathNotice(previous));
    }

    private record ClasspathNotice(Filter next) implements Filter {
        @Override
        public boolean isLoggable(java.util.logging.LogRecord r) {
            String m = r.getMessage();
            if (m != null && m.startsWith(CLASSPATH_NOTICE)) {
                return false;
            }
            return next == null || next.isLoggable(r);
        }
    }
}
