package org.baywright.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.baywright.io.PlanFiles;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.ColumnTier;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class TakeoffTest {
    private static RunResult run;

    @BeforeAll
    static void demo() {
        run = PlanRun.run(PlanFiles.read(Path.of("plans", "harbourview-offices.bay.json")).plan().orElseThrow());
    }

    @Test
    void totalIsTheSumOfWeightTimesLength() {
        double sum = 0;
        for (var lv : run.plan().levels()) {
            for (MemberResult m : run.takedown().members().get(run.takedown().levelFloors().get(lv.name()))) {
                sum += m.design().section().weight() * m.length();
            }
        }
        for (ColumnResult c : run.takedown().columns()) {
            for (ColumnTier t : c.tiers()) {
                sum += t.weight() * t.length();
            }
        }
        Takeoff t = Takeoff.of(run, 10);
        double total = sum;
        assertAll(
                () -> assertEquals(total, t.total(), 1e-9 * total),
                () -> assertEquals(total, t.bySection().stream().mapToDouble(Takeoff.Row::weight).sum(), 1e-9 * total),
                () -> assertEquals(total, t.byKind().stream().mapToDouble(Takeoff.Row::weight).sum(), 1e-9 * total),
                () -> assertEquals(total, t.byLevel().stream().mapToDouble(Takeoff.Row::weight).sum(), 1e-9 * total),
                () -> assertEquals(0.1 * total, t.allowance(), 1e-9 * total),
                () -> assertEquals(1.1 * total, t.grandTotal(), 1e-9 * total),
                // 1 short ton = 2,000 lb; 1 tonne = 1,000 kg (definitions, common practice)
                () -> assertEquals(total / Units.NEWTONS_PER_POUND / 2000, Takeoff.shortTons(total), 1e-9),
                () -> assertEquals(total / Units.STANDARD_GRAVITY / 1000, Takeoff.tonnes(total), 1e-9));
    }

    @Test
    void csvHasOneHeaderWithUnits() {
        String csv = Takeoff.of(run, 5).csv(UnitSystem.US);
        List<String> lines = csv.lines().toList();
        assertEquals("group,item,count,length[ft],weight[lb],short tons,tonnes,value", lines.get(0));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("kind,columns,")), csv);
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("level,Level 3,")), csv);
        assertTrue(lines.stream().anyMatch(l -> l.contains("allowance 5.0 %")), csv);
        for (String l : lines) {
            assertEquals(8, l.split(",", -1).length, l);
        }
        assertTrue(Takeoff.of(run, 0).csv(UnitSystem.SI).startsWith("group,item,count,length[m],weight[kg]"));
    }

    @Test
    void sectionsAreInTradeOrder() {
        assertTrue(Takeoff.compareSections("W8X10", "W10X12") < 0);
        assertTrue(Takeoff.compareSections("W10X12", "W10X15") < 0);
        assertTrue(Takeoff.compareSections("W14X48", "W14X120") < 0);
    }

    @Test
    void columnScheduleListsEveryStoreyAndFoundation() {
        String csv = ColumnSchedule.csv(run, UnitSystem.US);
        long foundations = csv.lines().filter(l -> l.contains(",foundation,")).count();
        assertEquals(run.takedown().columns().size(), foundations);
        assertEquals(1 + run.takedown().columns().size() * (run.plan().levels().size() + 1), csv.lines().count());
    }
}
