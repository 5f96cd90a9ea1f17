package org.baywright.ui;

import javafx.geometry.Point2D;

/**
 * The one mapping between plan coordinates (metres, x east, y north, y up) and canvas pixels (x right,
 * y down). Immutable: panning and zooming give a new transform.
 *
 * <p>A plan point (wx, wy) appears at pixel ({@code originX + scale·wx}, {@code originY − scale·wy}), so
 * {@code originX, originY} is where the plan origin sits on the canvas and {@code scale} is pixels per
 * metre.
 *
 * @param scale pixels per metre, within [{@link #MIN_SCALE}, {@link #MAX_SCALE}]
 * @param originX canvas x of the plan origin, px
 * @param originY canvas y of the plan origin, px
 */
public record ViewTransform(double scale, double originX, double originY) {
    /** Smallest zoom: 0.05 px per metre (a 20 km plan across a 1000 px window). */
    public static final double MIN_SCALE = 0.05;
    /** Largest zoom: 20 000 px per metre (a millimetre is 20 px). */
    public static final double MAX_SCALE = 20_000;

    public ViewTransform {
        if (!Double.isFinite(scale) || !Double.isFinite(originX) || !Double.isFinite(originY)) {
            throw new IllegalArgumentException("view transform values must be finite");
        }
        scale = clampScale(scale);
    }

    /** One pixel per metre, plan origin at the canvas corner. */
    public static ViewTransform identity() {
        return new ViewTransform(1, 0, 0);
    }

    private static double clampScale(double s) {
        return Math.max(MIN_SCALE, Math.min(MAX_SCALE, s));
    }

    /** Canvas x of a plan x, px. */
    public double screenX(double worldX) {
        return originX + scale * worldX;
    }

    /** Canvas y of a plan y, px (plan y up, canvas y down). */
    public double screenY(double worldY) {
        return originY - scale * worldY;
    }

    /** The canvas point of a plan point. */
    public Point2D toScreen(double worldX, double worldY) {
        return new Point2D(screenX(worldX), screenY(worldY));
    }

    /** The plan point (metres) under a canvas point. */
    public Point2D toWorld(double screenX, double screenY) {
        return new Point2D((screenX - originX) / scale, (originY - screenY) / scale);
    }

    /** A distance in pixels as metres on the plan. */
    public double toWorldLength(double pixels) {
        return pixels / scale;
    }

    /** The view moved by a drag of (dx, dy) pixels: the drawing follows the pointer. */
    public ViewTransform panBy(double dx, double dy) {
        return new ViewTransform(scale, originX + dx, originY + dy);
    }

    /**
     * The view zoomed by {@code factor} (greater than 1 zooms in) about a canvas point: the plan point
     * under the cursor stays under it. At the zoom limits the scale stops and the view does not drift.
     */
    public ViewTransform zoomAt(double screenX, double screenY, double factor) {
        if (!(factor > 0) || !Double.isFinite(factor)) {
            throw new IllegalArgumentException("zoom factor must be a positive number, got " + factor);
        }
        Point2D w = toWorld(screenX, screenY);
        double s = clampScale(scale * factor);
        return new ViewTransform(s, screenX - s * w.getX(), screenY + s * w.getY());
    }

    /**
     * The view that shows the plan rectangle [minX, maxX] × [minY, maxY] whole and centred in a canvas
     * of the given size, leaving {@code margin} pixels on every side. An empty or degenerate rectangle
     * is shown at its centre with a 10 m wide view.
     */
    public static ViewTransform fit(double minX, double minY, double maxX, double maxY, double width, double height,
            double margin) {
        double w = Math.max(1, width - 2 * margin);
        double h = Math.max(1, height - 2 * margin);
        double spanX = maxX - minX;
        double spanY = maxY - minY;
        if (!(spanX > 0) && !(spanY > 0)) {
            spanX = 10;
            spanY = 10;
        }
        double s = Math.min(spanX > 0 ? w / spanX : Double.POSITIVE_INFINITY, spanY > 0 ? h / spanY : Double.POSITIVE_INFINITY);
        s = clampScale(s);
        double cx = (minX + maxX) / 2;
        double cy = (minY + maxY) / 2;
        return new ViewTransform(s, width / 2 - s * cx, height / 2 + s * cy);
    }
}
