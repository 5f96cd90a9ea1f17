/**
 * Sections and catalogs: rolled doubly symmetric I-shapes with their dimensions and design properties,
 * properties computed from the dimensions where a catalog does not tabulate them, Baywright's CSV
 * catalog file (the built-in W catalog among them), and the import of the published shapes table.
 * A {@link org.baywright.catalog.Catalog} keeps its sections in search order, lightest first, which is
 * the tie-break of the lightest-section search.
 *
 * <p>Entry points: {@link org.baywright.catalog.CatalogFile} ({@code loadDefault}, {@code read}),
 * {@link org.baywright.catalog.Catalog}, {@link org.baywright.catalog.Section},
 * {@link org.baywright.catalog.IShapeGeometry}, {@link org.baywright.catalog.ShapesTableImport}.
 * Depends on {@code units} only.
 */
package org.baywright.catalog;
