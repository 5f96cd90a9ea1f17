package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.load.LoadCase;
import org.baywright.plan.Floor;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * Live load of a point load passes to the columns unreduced: ASCE 7-16 §4.7.1 permits reducing only the
 * uniformly distributed live loads L0 of Table 4.3-1, and §4.8.1 only uniformly distributed roof live
 * loads (FOUND in the standard's text). A regression: point and line live loads were carried with the
 * floor's ordinary live load and reduced by the member's or column's factor.
 */
class ConcentratedLiveLoadTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    private static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    private static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    /** Two floors and a roof of 2 × 2 bays of 30 ft; with a point load on every level when {@code point} is not null. */
    private static TakedownResult run(LoadValues point) {
        Plan p = RegularPlan.generate(new RegularPlan.Spec("point", "us", List.of(ft(30), ft(30)), List.of(ft(30), ft(30)),
                List.of(4.0, 4.0, 4.0), true, ft(10), new LoadValues(psf(50), 0, psf(50), 0, 0, 0),
                new LoadValues(psf(20), 0, 0, psf(20), 0, 0), LoadValues.ZERO));
        List<Floor> floors = new ArrayList<>();
        for (Floor f : p.floors()) {
            List<PointLoadItem> pts = point == null ? List.of() : List.of(new PointLoadItem("PL-1", new Point(ft(25), ft(25)), point));
            floors.add(new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), f.members(), f.infills(), f.openings(),
                    f.areaLoads(), f.lineLoads(), pts));
        }
        return PlanRun.run(new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), floors, p.columns()), CATALOG)
                .takedown();
    }

    private static StoreyLoad bottom(TakedownResult t, String column) {
        ColumnResult c = t.columns().stream().filter(x -> x.id().equals(column)).findFirst().orElseThrow();
        return c.tiers().get(0).storeys().get(0);
    }

    @Test
    void aPointLoadsLiveAndRoofLiveLoadsReachTheColumnUnreduced() {
        double kip = Units.KIPS.toSi(1);
        TakedownResult without = run(null);
        TakedownResult with = run(new LoadValues(0, 0, 0.5 * kip, 0.3 * kip, 0, 0));
        for (LoadCase lc : List.of(LoadCase.L, LoadCase.LR)) {
            int k = lc.ordinal();
            StoreyLoad a = bottom(without, "C-B2");
            StoreyLoad b = bottom(with, "C-B2");
            double added = b.unreduced()[k] - a.unreduced()[k];
            assertTrue(added > 0, lc + ": the point loads reach the interior column");
            assertTrue(a.reduced()[k] < a.unreduced()[k], lc + ": the area load is reduced");
            assertEquals(added, b.reduced()[k] - a.reduced()[k], 1e-6 * kip, lc + ": the point loads' share is not reduced");
        }
    }
}
