package org.baywright.geometry;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.PolygonExtracter;

/**
 * The chord of a polygonal area along the span, as a function of {@code v}, in a deck frame.
 *
 * <p>With shells counter-clockwise and holes clockwise, the chord at {@code v} is Σ ± u over the edges
 * crossing the line {@code v = const}, + for edges going up in v and − for edges going down. Between
 * two neighbouring vertex ordinates the same edges cross, so the chord is exactly linear there.
 */
final class ChordProfile {
    private ChordProfile() {
    }

    /** One linear piece: the chord goes from {@code ca} at {@code va} to {@code cb} at {@code vb}. */
    record Piece(double va, double vb, double ca, double cb) {
    }

    private record SignedEdge(FrameLine line, double sign) {
    }

    /** The chord profile of the polygons in {@code g} (other components are ignored). */
    static List<Piece> of(Geometry g) {
        List<SignedEdge> edges = new ArrayList<>();
        List<Double> vs = new ArrayList<>();
        for (Object o : PolygonExtracter.getPolygons(g)) {
            Polygon p = (Polygon) o;
            ring(p.getExteriorRing(), true, edges, vs);
            for (int h = 0; h < p.getNumInteriorRing(); h++) {
                ring(p.getInteriorRingN(h), false, edges, vs);
            }
        }
        double[] cuts = vs.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
        List<Piece> out = new ArrayList<>();
        for (int k = 0; k + 1 < cuts.length; k++) {
            double lo = cuts[k];
            double hi = cuts[k + 1];
            double ca = 0;
            double cb = 0;
            for (SignedEdge e : edges) {
                if (e.line().va() <= lo && e.line().vb() >= hi) {
                    ca += e.sign() * e.line().at(lo);
                    cb += e.sign() * e.line().at(hi);
                }
            }
            if (ca != 0 || cb != 0) {
                out.add(new Piece(lo, hi, ca, cb));
            }
        }
        return out;
    }

    private static void ring(LinearRing r, boolean shell, List<SignedEdge> edges, List<Double> vs) {
        Coordinate[] c = r.getCoordinates();
        if (c.length < 4) {
            return;
        }
        boolean ccw = Orientation.isCCW(c);
        double ringSign = shell == ccw ? 1 : -1;
        for (int i = 0; i + 1 < c.length; i++) {
            vs.add(c[i].y);
            if (c[i].y != c[i + 1].y) {
                double up = c[i + 1].y > c[i].y ? 1 : -1;
                edges.add(new SignedEdge(FrameLine.through(c[i].x, c[i].y, c[i + 1].x, c[i + 1].y), ringSign * up));
            }
        }
    }
}
