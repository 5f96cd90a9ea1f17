package org.baywright.design.aisc360;

import static org.baywright.design.Deviations.ROUND_OFF;
import static org.baywright.design.Deviations.THREE_FIGURES;
import static org.baywright.design.Deviations.holds;
import static org.junit.jupiter.api.Assertions.assertAll;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.design.Deviations;
import org.baywright.design.Steel;
import org.baywright.units.Units;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * AISC 360-16 G2.1, major-axis shear of rolled I-shapes ({@link IShapeShear}), against CHECK-VALUES
 * §1 ("Shapes with h/tw > 2.24√(E/Fy)", "Design Example G.1A"). The Table 3-2 shear columns (φvVnx,
 * Vnx/Ωv) are checked row by row in {@link FlexureValidationTest}.
 *
 * <p>A992, Fy = 50 ksi, E = 29,000 ksi; the default catalog (AISC Shapes Database v15.0 values).
 */
class ShearValidationTest {
    private static final double FY = Steel.A992.fy();
    private static final double E = Steel.A992.e();

    private static final Deviations G2 = new Deviations("G2.1 shear (phi_v = 0.90 shapes, G.1A)");
    private static Catalog catalog;

    @BeforeAll
    static void load() {
        catalog = CatalogFile.loadDefault();
    }

    @AfterAll
    static void report() {
        G2.report();
    }

    /**
     * CHECK-VALUES §1 Table 1 "Shapes with h/tw > 2.24√(E/Fy) at Fy = 50 (use φv = 0.90)", AISC
     * 360-16 G2.1 User Note, MEMORY + confirmed by scanning the DB: exactly eight W shapes, with the
     * database's h/tw. The engine derives h/tw from d, kdes and tw as printed, the database prints h/tw
     * to three figures: 0.5 %. All eight have h/tw below 1.10√(kv·E/Fy) = 61.2, so Cv1 = 1.0 and
     * Vn = 0.6·Fy·d·tw (CHECK-VALUES §1 Method, G2.1(b)); every other shape takes φv = 1.00, Ωv = 1.50.
     */
    @Test
    void exactlyEightWShapesTakePhiV090() {
        Map<String, Double> published = new TreeMap<>(Map.of(
                "W44X230", 54.8, // CHECK-VALUES §1 Table 1, same row: W44x230 (54.8)
                "W40X149", 54.3, // same row: W40x149 (54.3)
                "W36X135", 54.1, // same row: W36x135 (54.1)
                "W33X118", 54.5, // same row: W33x118 (54.5)
                "W30X90", 57.5, // same row: W30x90 (57.5)
                "W24X55", 54.6, // same row: W24x55 (54.6)
                "W16X26", 56.8, // same row: W16x26 (56.8)
                "W12X14", 54.3)); // same row: W12x14 (54.3)
        TreeSet<String> caseB = new TreeSet<>();
        List<Executable> checks = new ArrayList<>();
        for (Section s : catalog.sections()) {
            IShapeShear.Strength v = IShapeShear.strength(s, FY, E, null);
            double aw = s.depth() * s.dims().tw();
            if (!v.caseA()) {
                caseB.add(s.designation());
                checks.add(holds(s + ": φv = 0.90, Ωv = 1.67 under G2.1(b)",
                        v.phi() == 0.90 && v.omega() == 1.67));
                // Cv1 = 1.0: Vn = 0.6·Fy·Aw (CHECK-VALUES §1 Method, G2-1 and G2-3), exact up to round-off
                checks.add(G2.near(s + ": Vn = 0.6·Fy·d·tw (Cv1 = 1.0)", 0.6 * FY * aw, v.vn(), ROUND_OFF));
                Double hTw = published.get(s.designation());
                if (hTw != null) {
                    checks.add(G2.near(s + ": h/tw", hTw, s.hOverTw(), THREE_FIGURES));
                }
            } else {
                checks.add(holds(s + ": φv = 1.00, Ωv = 1.50 under G2.1(a)", v.phi() == 1.00 && v.omega() == 1.50));
            }
        }
        checks.add(0, holds("the shapes under G2.1(b) are exactly " + published.keySet() + "; the engine has " + caseB,
                caseB.equals(published.keySet())));
        assertAll("G2.1(a)/(b) over the default catalog", checks);
    }

    /**
     * AISC Design Examples, Ex. G.1A (strong-axis shear of a W24X62), CHECK-VALUES §1 "Design Example
     * G.1A", MEMORY + COMPUTED. The demand Vu = 290 kips is checked through the designer in
     * {@code BeamDesignerValidationTest}.
     */
    @Test
    void exampleG1AW24x62() {
        Section s = catalog.find("W24X62").orElseThrow();
        IShapeShear.Strength v = IShapeShear.strength(s, FY, E, null);
        double vn = Units.KIPS.fromSi(v.vn());
        assertAll("AISC DE Ex. G.1A, W24X62",
                // CHECK-VALUES §1 G.1A: h/tw = 50.1 (DB, three figures; the engine derives it from d, kdes, tw)
                G2.near("h/tw", 50.1, s.hOverTw(), THREE_FIGURES),
                holds("G2.1(a): h/tw ≤ 2.24√(E/Fy), φv = 1.00, Ωv = 1.50 (AISC DE Ex. G.1A, MEMORY)",
                        v.caseA() && v.phi() == 1.00 && v.omega() == 1.50),
                // CHECK-VALUES §1 G.1A: Aw = 10.2 in², MEMORY + COMPUTED (d·tw = 23.7 × 0.430)
                G2.printed("Aw [in²]", 10.2, Units.IN2.fromSi(s.depth() * s.dims().tw())),
                // CHECK-VALUES §1 G.1A: Vn = 306 kips, MEMORY (from memory), three figures
                G2.near("Vn [kips] (example)", 306, vn, THREE_FIGURES),
                // CHECK-VALUES §1 G.1A: Vn = 305.7 kips, COMPUTED
                G2.printed("Vn [kips] (computed)", 305.7, vn),
                // CHECK-VALUES §1 G.1A: φvVn = 306 kips, MEMORY (from memory), three figures
                G2.near("φvVn [kips]", 306, v.phi() * vn, THREE_FIGURES),
                // CHECK-VALUES §1 G.1A: Vn/Ωv = 204 kips, MEMORY (from memory), three figures
                G2.near("Vn/Ωv [kips] (example)", 204, vn / v.omega(), THREE_FIGURES),
                // CHECK-VALUES §1 G.1A: Vn/Ωv = 203.8 kips, COMPUTED
                G2.printed("Vn/Ωv [kips] (computed)", 203.8, vn / v.omega()));
    }
}
