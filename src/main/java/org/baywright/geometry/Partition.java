package org.baywright.geometry;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.operation.overlayng.CoverageUnion;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;
import org.locationtech.jts.operation.polygonize.Polygonizer;

/**
 * The floor cut into faces by every outline at once: the boundaries of the slab edge, the decks and
 * the openings are noded together by snap-rounding on the tolerance grid and polygonised. Each face
 * lies wholly inside or outside each outline, so it is given to the first deck containing it, unless
 * it is outside the slab or inside an opening. Deck regions built from faces share their edges bit for
 * bit: they partition the loaded area exactly, which separate pairwise overlays on a grid cannot promise
 * (each overlay rounds its own new vertices).
 */
final class Partition {

    /** Where deck {@code later} covers the same area as the earlier deck {@code first}. */
    record Overlap(int first, int later, Geometry area) {
    }

    private final List<Geometry> regions;
    private final Geometry decked;
    private final double loadedArea;
    private final Geometry loadedUnion;
    private final List<Overlap> overlaps;

    private Partition(List<Geometry> regions, Geometry decked, double loadedArea, List<Overlap> overlaps,
            Geometry loadedUnion) {
        this.loadedUnion = loadedUnion;
        this.regions = regions;
        this.decked = decked;
        this.loadedArea = loadedArea;
        this.overlaps = overlaps;
    }

    /**
     * @param slab the slab edge, or null for none (decks are then not clipped)
     * @param decks deck outlines in priority order (valid, on the grid)
     * @param openings opening outlines (valid, on the grid)
     */
    static Partition of(Shapes shapes, Geometry slab, List<Geometry> decks, List<Geometry> openings) {
        GeometryFactory f = shapes.planFactory;
        int n = decks.size();
        List<Geometry> empty = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            empty.add(f.createPolygon());
        }
        if (n == 0) {
            return new Partition(empty, null, 0, List.of(), null);
        }
        List<Geometry> boundaries = new ArrayList<>();
        if (slab != null) {
            boundaries.add(slab.getBoundary());
        }
        for (Geometry d : decks) {
            boundaries.add(d.getBoundary());
        }
        for (Geometry o : openings) {
            boundaries.add(o.getBoundary());
        }
        Geometry lines = f.buildGeometry(boundaries);
        Geometry noded = OverlayNG.overlay(lines, f.createLineString(), OverlayNG.UNION, shapes.grid);
        Polygonizer polygonizer = new Polygonizer();
        polygonizer.add(noded);

        PreparedGeometry slabP = slab == null ? null : PreparedGeometryFactory.prepare(slab);
        List<PreparedGeometry> deckP = decks.stream().map(PreparedGeometryFactory::prepare).toList();
        List<PreparedGeometry> openP = openings.stream().map(PreparedGeometryFactory::prepare).toList();
        List<List<Geometry>> loaded = new ArrayList<>();
        List<Geometry> deckedFaces = new ArrayList<>();
        List<List<List<Geometry>>> shared = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            loaded.add(new ArrayList<>());
            List<List<Geometry>> row = new ArrayList<>();
            for (int k = 0; k < n; k++) {
                row.add(new ArrayList<>());
            }
            shared.add(row);
        }
        double loadedArea = 0;
        List<Geometry> loadedFaces = new ArrayList<>();
        // JTS hands the faces back in an order (and with holes in an order) that varies between runs;
        // normalise and sort them so that sums of areas are the same to the last bit every time
        List<Polygon> faces = new ArrayList<>();
        for (Object o : polygonizer.getPolygons()) {
            faces.add((Polygon) ((Polygon) o).norm());
        }
        faces.sort(java.util.Comparator.comparingDouble((Polygon p) -> p.getEnvelopeInternal().getMinX())
                .thenComparingDouble(p -> p.getEnvelopeInternal().getMinY())
                .thenComparingDouble(p -> p.getEnvelopeInternal().getMaxX())
                .thenComparingDouble(p -> p.getEnvelopeInternal().getMaxY())
                .thenComparingDouble(Polygon::getArea));
        for (Polygon face : faces) {
            if (!(face.getArea() > 0)) {
                continue;
            }
            org.locationtech.jts.geom.Point p = face.getInteriorPoint();
            if (slabP != null && !slabP.contains(p)) {
                continue;
            }
            int owner = -1;
            for (int i = 0; i < n; i++) {
                if (deckP.get(i).contains(p)) {
                    if (owner < 0) {
                        owner = i;
                    } else {
                        shared.get(owner).get(i).add(face);
                    }
                }
            }
            if (owner < 0) {
                continue;
            }
            deckedFaces.add(face);
            if (openP.stream().anyMatch(op -> op.contains(p))) {
                continue;
            }
            loaded.get(owner).add(face);
            loadedFaces.add(face);
            loadedArea += face.getArea();
        }
        List<Geometry> regions = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            regions.add(union(f, loaded.get(i)));
        }
        List<Overlap> overlaps = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < n; k++) {
                if (!shared.get(i).get(k).isEmpty()) {
                    Geometry both = union(f, shared.get(i).get(k));
                    if (shapes.substantial(both)) {
                        overlaps.add(new Overlap(i, k, both));
                    }
                }
            }
        }
        return new Partition(regions, deckedFaces.isEmpty() ? null : union(f, deckedFaces), loadedArea, overlaps,
                loadedFaces.isEmpty() ? null : union(f, loadedFaces));
    }

    /** Union of faces that share edges exactly; falls back to a general overlay should that fail. */
    private static Geometry union(GeometryFactory f, List<Geometry> faces) {
        if (faces.isEmpty()) {
            return f.createPolygon();
        }
        Geometry all = f.buildGeometry(faces);
        try {
            return CoverageUnion.union(all);
        } catch (RuntimeException e) {
            return OverlayNGRobust.union(faces);
        }
    }

    /** The loaded region of deck i: its faces inside the slab, outside openings and not taken by an earlier deck. */
    Geometry region(int i) {
        return regions.get(i);
    }

    /** Everything inside the slab and some deck, openings included; null when there is none. */
    Geometry decked() {
        return decked;
    }

    /** Area of all loaded regions, m². */
    /** The loaded deck (decks ∩ slab − openings) as one geometry, or null when empty. */
    Geometry loaded() {
        return loadedUnion;
    }

    double loadedArea() {
        return loadedArea;
    }

    List<Overlap> overlaps() {
        return overlaps;
    }
}
