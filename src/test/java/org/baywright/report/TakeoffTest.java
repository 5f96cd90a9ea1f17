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
    void everyTableCountsTheSamePiecesAndWeight() {
        Takeoff t = Takeoff.of(run, 0);
        int tiers = run.takedown().columns().stream().mapToInt(c -> c.tiers().size()).sum();
        int pieces = 0; // members are listed per floor layout; a layout used on several levels counts on each
        for (var lv : run.plan().levels()) {
            pieces += run.takedown().members().get(run.takedown().levelFloors().get(lv.name())).size();
        }
        pieces += tiers;
        int expected = pieces;
        double total = t.total();
        assertAll(
                () -> assertEquals(expected, t.pieces(), "a beam or girder per level, a column tier once"),
                () -> assertEquals(expected, t.bySection().stream().mapToInt(Takeoff.Row::count).sum()),
                () -> assertEquals(expected, t.byKind().stream().mapToInt(Takeoff.Row::count).sum()),
                () -> assertEquals(expected, t.byLevel().stream().mapToInt(Takeoff.Row::count).sum(),
                        "level rows count the column pieces too, on the lowest level of their tier"),
                () -> assertEquals(tiers, t.byKind().stream().filter(r -> r.item().equals("columns")).findFirst()
                        .orElseThrow().count()),
                () -> assertEquals(total, t.lines().stream().mapToDouble(Takeoff.Line::weight).sum(), 1e-9 * total));
    }

    @Test
    void tidyCsvHasOneRowPerSizeLevelAndKindInWholePounds() {
        Takeoff t = Takeoff.of(run, 5);
        String csv = t.csv(UnitSystem.US);
        List<String> lines = csv.lines().toList();
        // the demo is a composite floor: each row also gives its studs and its pieces' camber
        assertEquals("section,level,kind,pieces,length[ft],weight[lb],studs,camber[in]", lines.get(0));
        assertEquals(t.lines().size() + 1, lines.size());
        java.util.Set<String> keys = new java.util.HashSet<>();
        long pounds = 0;
        for (String l : lines.subList(1, lines.size())) {
            String[] f = l.split(",", -1);
            assertEquals(8, f.length, l);
            assertTrue(keys.add(f[0] + "|" + f[1] + "|" + f[2] + "|" + f[7]), "one row per size × level × kind × camber: " + l);
            assertTrue(f[2].matches("beam|girder|column"), l);
            assertTrue(f[4].matches("\\d+\\.\\d{2}"), "length to 0.01 ft: " + l);
            assertTrue(f[5].matches("\\d+"), "whole pounds: " + l);
            pounds += Long.parseLong(f[5]);
        }
        double lb = t.total() / Units.NEWTONS_PER_POUND;
        assertEquals(lb, pounds, lines.size(), "the rows add up to the total, within a pound a row of rounding");
        assertTrue(t.csv(UnitSystem.SI).startsWith("section,level,kind,pieces,length[m],weight[kg],studs,camber[mm]\n"));
    }

    /** A bare-steel plan's CSV reads as before composite floors: no stud or camber columns, no composite totals. */
    @Test
    void bareSteelCsvHasTheSixColumns() {
        RunResult bare = PlanRun.run(PlanFiles.read(Path.of("plans", "examples", "harbourview-offices-bare-steel.bay.json"))
                .plan().orElseThrow());
        Takeoff t = Takeoff.of(bare, 5);
        assertEquals("section,level,kind,pieces,length[ft],weight[lb]", t.csv(UnitSystem.US).lines().findFirst().orElseThrow());
        assertTrue(t.csv(UnitSystem.SI).startsWith("section,level,kind,pieces,length[m],weight[kg]\n"));
        assertTrue(!t.totalsCsv(UnitSystem.US).contains("studs"), "no composite totals");
    }

    @Test
    void totalsCsvHasTheAllowanceApart() {
        Takeoff t = Takeoff.of(run, 5);
        List<String> lines = t.totalsCsv(UnitSystem.US).lines().toList();
        assertEquals("quantity,value,unit", lines.get(0));
        long bare = Math.round(t.total() / Units.NEWTONS_PER_POUND);
        long allowance = Math.round(0.05 * t.total() / Units.NEWTONS_PER_POUND);
        assertAll(
                () -> assertTrue(lines.contains("members and columns," + bare + ",lb"), lines::toString),
                () -> assertTrue(lines.contains("connections and miscellaneous allowance,5.0,%"), lines::toString),
                () -> assertTrue(lines.contains("connections and miscellaneous allowance," + allowance + ",lb"), lines::toString),
                () -> assertTrue(lines.stream().anyMatch(l -> l.startsWith("total with allowance,") && l.endsWith(",short tons")),
                        lines::toString),
                () -> assertTrue(lines.contains("pieces," + t.pieces() + ",\"beams, girders and column tiers\""), lines::toString));
        for (String l : lines) {
            assertTrue(l.split(",(?=(?:[^\"]*\"[^\"]*\")*[^\"]*$)", -1).length == 3, l);
        }
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
