package org.baywright.catalog;

/** A catalog file that cannot be read; the message names the file, line, column and what is allowed. */
public final class CatalogException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public CatalogException(String message) {
        super(message);
    }

    public CatalogException(String message, Throwable cause) {
        super(message, cause);
    }
}
