package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.baywright.catalog.CatalogFile;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Plan;
import org.baywright.run.PlanRun;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Column lines on the demo plan: the moments of the reactions reach the columns, and the columns at the
 * ends of the balcony take K_LL = 3. The balcony is a cantilever slab on the south face (below grid 1)
 * between grids B and D.
 */
class ColumnMomentsTest {
    private static final Plan DEMO = PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow();
    private static final TakedownResult RUN = PlanRun.run(DEMO, CatalogFile.loadDefault()).takedown();

    private static ColumnResult column(String grid) {
        return RUN.columns().stream().filter(c -> c.grid().equals(grid)).findFirst().orElseThrow();
    }

    /**
     * ASCE 7-16 Table 4.7-1 (FOUND): "Edge columns with cantilever slabs" K_LL = 3, "Edge columns without
     * cantilever slabs" K_LL = 4. B-1 and D-1 stand at the two ends of the balcony: the cantilever slab lies
     * beside them on one side; C-1, in its middle, had K_LL = 3 already. Before this change B-1 and D-1 took
     * K_LL = 4 (the ray along grid B ran down the balcony's end edge and found no slab beyond the column).
     */
    @Test
    void theColumnsAtTheBalconyEndsAreEdgeColumnsWithACantileverSlab() {
        assertAll(
                () -> assertEquals(3.0, column("B-1").kll(), "B-1"),
                () -> assertEquals(3.0, column("C-1").kll(), "C-1"),
                () -> assertEquals(3.0, column("D-1").kll(), "D-1"),
                () -> assertTrue(column("B-1").position().contains("cantilever"), column("B-1").position()),
                () -> assertEquals(4.0, column("A-2").kll(), "an edge column away from the balcony"),
                () -> assertEquals(4.0, column("B-2").kll(), "an interior column"));
    }

    /**
     * An edge column receives the reaction of its girder on one side only: its storeys carry a moment, and their
     * ratio is the H1.1 interaction, above the axial ratio Pu/(φc·Pn) the columns were designed for before.
     */
    @Test
    void edgeColumnsCarryTheMomentOfTheirOneSidedReactions() {
        List<Executable> checks = new ArrayList<>();
        for (String grid : List.of("A-2", "E-2", "B-4", "C-4", "B-1", "D-1")) {
            ColumnResult c = column(grid);
            StoreyLoad s = c.tiers().get(0).storeys().get(0);
            checks.add(() -> assertNotNull(s.interaction(), grid));
            checks.add(() -> assertTrue(s.interaction().mrx() + s.interaction().mry() > Units.KIPS.toSi(1) * Units.FT_.toSi(1),
                    grid + ": a moment of more than 1 kip-ft"));
            checks.add(() -> assertTrue(s.ratio() > s.required() / s.available() * (1 + 1e-6),
                    grid + ": interaction " + s.ratio() + " above the axial ratio " + s.required() / s.available()));
            checks.add(() -> assertTrue(s.ratio() <= 1.0, grid + " passes"));
        }
        assertAll(checks);
    }
}
