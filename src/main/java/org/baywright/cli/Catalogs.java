package org.baywright.cli;

import java.nio.file.Path;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogException;
import org.baywright.catalog.CatalogFile;

/** Loads the catalog a command names, or the built-in one. */
final class Catalogs {
    private Catalogs() {
    }

    static Catalog load(Path file) {
        try {
            return file == null ? CatalogFile.loadDefault() : CatalogFile.read(file);
        } catch (CatalogException e) {
            throw new BadInputException("--catalog: " + e.getMessage().replace("\n", "\n  "), e);
        }
    }
}
