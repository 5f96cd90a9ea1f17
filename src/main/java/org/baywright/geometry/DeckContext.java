package org.baywright.geometry;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.operation.distance.DistanceOp;

/**
 * One deck of a floor as the analysis sees it: its id, span frame, one-way decomposition and region
 * (in the frame).
 */
record DeckContext(String deckId, double spanAngle, SpanFrame frame, DeckLayout layout, Geometry region,
        double tol) {

    /**
     * The piece of this deck holding frame point {@code (u, v)}; a point outside the deck but within
     * the tolerance of it (measured square to the deck's edge) is looked up at the nearest point of the
     * deck. Null when the point is not on this deck.
     */
    DeckLayout.Location locate(double u, double v) {
        DeckLayout.Location loc = layout.locate(u, v);
        if (loc != null) {
            return loc;
        }
        Geometry p = region.getFactory().createPoint(new Coordinate(u, v));
        Envelope near = new Envelope(u - tol, u + tol, v - tol, v + tol);
        if (!region.getEnvelopeInternal().intersects(near)) {
            return null;
        }
        Coordinate[] nearest = DistanceOp.nearestPoints(region, p);
        if (nearest[0].distance(nearest[1]) > tol) {
            return null;
        }
        return layout.locate(nearest[0].x, nearest[0].y);
    }

    /** The position along {@code m} (which crosses the span) at frame ordinate {@code v}, clamped, m. */
    double along(PlacedMember m, double v) {
        double v1 = frame.v(m.a());
        double v2 = frame.v(m.b());
        double s = (v - v1) / (v2 - v1) * m.length();
        return Math.max(0, Math.min(m.length(), s));
    }

    /** |sin| of the angle between the member and the span: width = chord × this factor. */
    double crossFactor(PlacedMember m) {
        return frame.crossFactor(m.b().x() - m.a().x(), m.b().y() - m.a().y(), m.length());
    }
}
