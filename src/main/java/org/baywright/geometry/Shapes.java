package org.baywright.geometry;

import java.util.ArrayList;
import java.util.List;
import org.baywright.plan.Point;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.geom.util.PolygonExtracter;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;
import org.locationtech.jts.operation.union.CascadedPolygonUnion;
import org.locationtech.jts.operation.union.UnionStrategy;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;
import org.locationtech.jts.precision.GeometryPrecisionReducer;

/**
 * Plan polygons as JTS geometries on the tolerance grid: conversion, validation with located problems,
 * repair, and overlays by snap-rounding on that grid, so that results do not depend on digits below
 * the tolerance.
 */
final class Shapes {
    final double tol;
    final PrecisionModel grid;
    /** Builds plan geometries on the tolerance grid. */
    final GeometryFactory planFactory;
    /** Builds frame geometries (rotated coordinates are not on any grid). */
    final GeometryFactory frameFactory = new GeometryFactory();
    /** A grid scale 1/tol within this relative distance of a whole number is that number (1/1e-6 is not exactly 1e6). */
    private static final double WHOLE_SCALE = 1e-9;

    /** The plan's unit system: lengths in problems are written in it. */
    private final org.baywright.units.UnitSystem units;

    Shapes(double tol, org.baywright.units.UnitSystem units) {
        this.tol = tol;
        this.units = units;
        double scale = 1.0 / tol;
        double whole = Math.rint(scale);
        if (Math.abs(scale - whole) <= WHOLE_SCALE * scale) {
            scale = whole;
        }
        this.grid = new PrecisionModel(scale);
        this.planFactory = new GeometryFactory(grid);
    }

    double snap(double c) {
        return grid.makePrecise(c);
    }

    Point snap(Point p) {
        return new Point(snap(p.x()), snap(p.y()));
    }

    /**
     * A plan polygon as a valid JTS geometry on the grid, or null when it is unusable. Problems are
     * added for degenerate polygons (ignored) and self-intersecting ones (repaired and used).
     */
    Geometry polygon(org.baywright.plan.Polygon p, String id, String what, List<GeometryProblem> problems) {
        if (p == null) {
            problems.add(new GeometryProblem(GeometryProblem.DEGENERATE_POLYGON, id, what + " " + id + " has no outline",
                    List.of()));
            return null;
        }
        List<Coordinate> cs = new ArrayList<>();
        for (Point q : p.vertices()) {
            Coordinate c = new Coordinate(snap(q.x()), snap(q.y()));
            if (cs.isEmpty() || !c.equals2D(cs.get(cs.size() - 1))) {
                cs.add(c);
            }
        }
        while (cs.size() > 1 && cs.get(cs.size() - 1).equals2D(cs.get(0))) {
            cs.remove(cs.size() - 1);
        }
        if (cs.size() < 3) {
            problems.add(new GeometryProblem(GeometryProblem.DEGENERATE_POLYGON, id,
                    what + " " + id + " has fewer than three distinct vertices; it is ignored", p.vertices()));
            return null;
        }
        cs.add(cs.get(0).copy());
        LinearRing ring = planFactory.createLinearRing(cs.toArray(new Coordinate[0]));
        Geometry g = planFactory.createPolygon(ring);
        IsValidOp check = new IsValidOp(g);
        if (!check.isValid()) {
            Geometry fixed = polygonal(GeometryFixer.fix(g));
            if (!substantial(fixed)) {
                problems.add(new GeometryProblem(GeometryProblem.DEGENERATE_POLYGON, id,
                        what + " " + id + " encloses no area (its vertices are collinear or it is thinner than the"
                                + " tolerance " + units.toleranceText(tol) + "); it is ignored", p.vertices()));
                return null;
            }
            TopologyValidationError e = check.getValidationError();
            Coordinate at = e.getCoordinate();
            List<Point> where = at == null ? p.vertices() : List.of(new Point(at.x, at.y));
            problems.add(new GeometryProblem(GeometryProblem.SELF_INTERSECTION, id,
                    what + " " + id + " is not a simple polygon (" + e.getMessage().toLowerCase()
                            + "); it is repaired to the area its outline encloses", where));
            g = fixed;
        } else if (!substantial(g)) {
            problems.add(new GeometryProblem(GeometryProblem.DEGENERATE_POLYGON, id,
                    what + " " + id + " encloses no area (thinner than the tolerance " + units.toleranceText(tol) + "); it is ignored",
                    p.vertices()));
            return null;
        }
        try {
            g = GeometryPrecisionReducer.reduce(g, grid);
        } catch (RuntimeException ex) {
            problems.add(new GeometryProblem(GeometryProblem.INTERNAL, id,
                    what + " " + id + " could not be snapped to the tolerance grid: " + ex.getMessage(), p.vertices()));
            return null;
        }
        g = polygonal(g);
        if (g.isEmpty() || g.getArea() <= tol * g.getLength() / 2) {
            problems.add(new GeometryProblem(GeometryProblem.DEGENERATE_POLYGON, id,
                    what + " " + id + " encloses no usable area after repair; it is ignored", p.vertices()));
            return null;
        }
        return g;
    }

    /** The polygonal part of g. */
    Geometry polygonal(Geometry g) {
        if (g == null) {
            return planFactory.createPolygon();
        }
        if (g.getDimension() == 2 && (g instanceof org.locationtech.jts.geom.Polygon
                || g instanceof org.locationtech.jts.geom.MultiPolygon)) {
            return g;
        }
        @SuppressWarnings("unchecked")
        List<org.locationtech.jts.geom.Polygon> polys = PolygonExtracter.getPolygons(g);
        return g.getFactory().buildGeometry(polys);
    }

    Geometry difference(Geometry a, Geometry b) {
        return polygonal(OverlayNG.overlay(a, b, OverlayNG.DIFFERENCE, grid));
    }

    /**
     * Union of polygons of a deck frame (off any grid): JTS's robust floating overlay, and should even
     * that fail on near-degenerate input, snap-rounding on the tolerance grid, which cannot fail.
     */
    Geometry frameUnion(List<Geometry> polys) {
        try {
            return OverlayNGRobust.union(polys);
        } catch (RuntimeException e) {
            return polygonal(CascadedPolygonUnion.union(polys, new UnionStrategy() {
                @Override
                public Geometry union(Geometry a, Geometry b) {
                    return OverlayNG.overlay(a, b, OverlayNG.UNION, grid);
                }

                @Override
                public boolean isFloatingPrecision() {
                    return false;
                }
            }));
        }
    }

    /** Intersection of two frame geometries, with the same fallback as {@link #frameUnion}. */
    Geometry frameIntersection(Geometry a, Geometry b) {
        try {
            return polygonal(OverlayNGRobust.overlay(a, b, OverlayNG.INTERSECTION));
        } catch (RuntimeException e) {
            return polygonal(OverlayNG.overlay(a, b, OverlayNG.INTERSECTION, grid));
        }
    }

    /** True when an area is more than a sliver along its own boundary, i.e. thicker than the tolerance. */
    boolean substantial(Geometry g) {
        return g != null && !g.isEmpty() && g.getArea() > tol * g.getLength() / 2;
    }

    /** The exterior vertices of the largest polygon of g (closing vertex dropped), for locating a problem. */
    static List<Point> outline(Geometry g) {
        org.locationtech.jts.geom.Polygon best = null;
        for (Object o : PolygonExtracter.getPolygons(g)) {
            org.locationtech.jts.geom.Polygon p = (org.locationtech.jts.geom.Polygon) o;
            if (best == null || p.getArea() > best.getArea()) {
                best = p;
            }
        }
        if (best == null) {
            return List.of();
        }
        return ring(best.getExteriorRing().getCoordinates());
    }

    /** Ring coordinates as plan points, closing vertex dropped. */
    static List<Point> ring(Coordinate[] c) {
        List<Point> out = new ArrayList<>();
        for (int i = 0; i + 1 < c.length; i++) {
            out.add(new Point(c[i].x, c[i].y));
        }
        return out;
    }
}
