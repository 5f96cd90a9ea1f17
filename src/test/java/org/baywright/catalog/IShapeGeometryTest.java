package org.baywright.catalog;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class IShapeGeometryTest {
    @Test
    void withoutFilletsIsThreeRectangles() {
        // Plain plate girder, no fillets (kdes = tf): textbook rectangles (common practice).
        double d = 0.5;
        double bf = 0.2;
        double tw = 0.01;
        double tf = 0.02;
        SectionProperties p = IShapeGeometry.compute(new IShapeDimensions(d, bf, tw, tf, tf));
        double hw = d - 2 * tf;
        assertAll(
                () -> assertEquals(2 * bf * tf + hw * tw, p.a(), 1e-15),
                () -> assertEquals(bf * d * d * d / 12 - (bf - tw) * hw * hw * hw / 12, p.ix(), 1e-15),
                () -> assertEquals(bf * tf * (d - tf) + tw * hw * hw / 4, p.zx(), 1e-15),
                () -> assertEquals(2 * tf * bf * bf * bf / 12 + hw * tw * tw * tw / 12, p.iy(), 1e-15),
                () -> assertEquals(p.iy() * (d - tf) * (d - tf) / 4, p.cw(), 1e-20));
    }

    @Test
    void filletsAddArea() {
        IShapeDimensions a = new IShapeDimensions(0.5, 0.2, 0.01, 0.02, 0.02);
        IShapeDimensions b = new IShapeDimensions(0.5, 0.2, 0.01, 0.02, 0.03);
        double r = 0.01;
        // four spandrels of (1 − π/4) r² (common practice geometry)
        assertEquals(4 * (1 - Math.PI / 4) * r * r, IShapeGeometry.compute(b).a() - IShapeGeometry.compute(a).a(), 1e-15);
    }

    @Test
    void rejectsImpossibleDimensions() {
        assertThrows(IllegalArgumentException.class, () -> new IShapeDimensions(0.1, 0.1, 0.01, 0.06, 0.07));
        assertThrows(IllegalArgumentException.class, () -> new IShapeDimensions(0.5, 0.2, 0.01, 0.02, 0.01));
        assertThrows(IllegalArgumentException.class, () -> new IShapeDimensions(-0.5, 0.2, 0.01, 0.02, 0.03));
        assertThrows(IllegalArgumentException.class, () -> new IShapeDimensions(Double.NaN, 0.2, 0.01, 0.02, 0.03));
    }
}
