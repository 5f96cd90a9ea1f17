package org.baywright.run;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogException;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.Steel;
import org.baywright.io.PlanFiles;
import org.baywright.load.DesignMethod;
import org.baywright.load.LiveLoadRules;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Plan;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/** The design basis is worked out once from the plan's settings and is what the run used. */
class DesignBasisTest {
    private static final Catalog CATALOG = CatalogFile.loadDefault();

    private static Plan demo() {
        return PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow();
    }

    private static Plan withSettings(Plan p, DesignSettings s) {
        return new Plan(p.name(), p.units(), s, p.grid(), p.levels(), p.floors(), p.columns());
    }

    @Test
    void theSettingsBecomeTypedValues() {
        Plan demo = demo();
        Plan p = withSettings(demo, demo.settings().withMethod("ASD").withFy(Units.KSI.toSi(36)).withDeflection(480, 0)
                .withBeamSeries(List.of("w16", "W18"), List.of()).withMaxBeamDepth(Units.IN.toSi(21))
                .withLiveLoad(false, true, false).withColumnSeries(List.of("W12")).withSpliceEvery(3));
        DesignBasis b = DesignBasis.of(p, CATALOG);
        assertAll(
                () -> assertEquals(DesignMethod.ASD, b.method(), "the method's text in any case"),
                () -> assertEquals(Units.KSI.toSi(36), b.steel().fy()),
                () -> assertEquals(Steel.A992.e(), b.steel().e(), "E of structural steel"),
                () -> assertEquals(new DeflectionLimits(480, 0), b.deflection()),
                () -> assertEquals(Set.of("W16", "W18"), b.beams().series(), "series normalised"),
                () -> assertEquals(Units.IN.toSi(21), b.beams().maxDepth()),
                () -> assertEquals(Set.of(), b.girders().series()),
                () -> assertEquals(Units.IN.toSi(21), b.girders().maxDepth(), "the depth limit applies to girders too"),
                () -> assertEquals(new LiveLoadRules(false, true, false), b.liveLoad()),
                () -> assertEquals(List.of("W12"), b.columnSeries()),
                () -> assertEquals(3, b.spliceEvery()),
                () -> assertSame(CATALOG, b.catalog()));
    }

    @Test
    void anUnknownMethodDesignsByLrfdAndFiftyKsiIsA992Itself() {
        Plan demo = demo();
        DesignBasis b = DesignBasis.of(demo, CATALOG);
        assertAll(
                () -> assertEquals(DesignMethod.LRFD,
                        DesignBasis.of(withSettings(demo, demo.settings().withMethod("neither")), CATALOG).method()),
                () -> assertSame(Steel.A992, b.steel()),
                () -> assertEquals(Double.POSITIVE_INFINITY, b.beams().maxDepth(), "no depth limit in the demo"),
                () -> assertEquals(UnitSystem.US, b.units(), "the demo is in US units"));
    }

    @Test
    void theRunCarriesTheBasisItUsed() {
        Plan demo = demo();
        RunResult r = PlanRun.run(withSettings(demo, demo.settings().withMethod("asd")), CATALOG);
        assertEquals(DesignMethod.ASD, r.basis().method());
        assertSame(CATALOG, r.basis().catalog());
        assertEquals(CATALOG.name(), r.catalogName());
        r.takedown().members().values().forEach(ms -> ms.stream().filter(m -> m.criteria() != null).forEach(m -> {
            assertEquals(r.basis().steel(), m.criteria().steel(), m.id());
            assertEquals(DesignMethod.ASD, m.criteria().method(), m.id());
        }));
    }

    @Test
    void aCatalogThatCannotBeReadIsALocatedProblemAndTheBasisStillStands() {
        Plan demo = demo();
        for (String name : List.of("no/such/catalog.csv", "nul\u0000in-name.csv")) {
            Plan p = withSettings(demo, demo.settings().withCatalog(name));
            DesignBasis.Loaded l = DesignBasis.load(p);
            assertAll(name,
                    () -> assertTrue(!l.ok() && l.problems().get(0).kind().equals("catalog")),
                    () -> assertEquals("/settings/catalog", l.problems().get(0).location()),
                    () -> assertNull(l.basis().catalog()),
                    () -> assertEquals(name, l.basis().catalogFile()),
                    () -> assertThrows(CatalogException.class, () -> DesignBasis.catalogOf(p)));
            RunResult r = PlanRun.run(p);
            assertAll(name, () -> assertNull(r.takedown()), () -> assertNotNull(r.basis()),
                    () -> assertEquals(l.problems(), r.problems()));
        }
    }
}
