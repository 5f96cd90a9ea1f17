package org.baywright.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.baywright.io.PlanFiles;
import org.baywright.plan.Floor;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.PlanEdits;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The {@code new} command's defaults and its roof, partition and notes options. */
class NewCommandTest {
    private static final double PSF = 1e-9; // loads are written and read as text: rounding only

    private static Plan written(Path file, String... args) {
        String[] a = new String[args.length + 7];
        String[] head = {"new", "--bays-x", "2@30ft", "--bays-y", "1@30ft", "--levels", "2@13ft"};
        System.arraycopy(head, 0, a, 0, head.length);
        System.arraycopy(args, 0, a, head.length, args.length);
        String[] full = java.util.Arrays.copyOf(a, a.length + 2);
        full[a.length] = "-o";
        full[a.length + 1] = file.toString();
        BeamCommandTest.Run r = BeamCommandTest.run(full);
        assertEquals(0, r.code(), r.err());
        return PlanFiles.read(file).plan().orElseThrow();
    }

    private static LoadValues loads(Plan p, boolean roof) {
        Floor f = p.floors().stream().filter(x -> x.roof() == roof).findFirst().orElseThrow();
        return f.areaLoads().get(0).values();
    }

    @Test
    void theOfficeDefaultsCarryPartitions(@TempDir Path dir) {
        // ASCE 7-16 §4.3.2: partition allowance 15 psf for offices; Table 4.3-1 office 50 psf; slab 50 psf and
        // services 15 psf (common practice); roof live 20 psf (Table 4.3-1, ordinary flat roof)
        Plan p = written(dir.resolve("a.bay.json"), "--composite", "none");
        LoadValues floor = loads(p, false);
        LoadValues roof = loads(p, true);
        assertAll(
                () -> assertEquals(15, Units.PSF.fromSi(floor.partition()), PSF),
                () -> assertEquals(50, Units.PSF.fromSi(floor.live()), PSF),
                () -> assertEquals(50, Units.PSF.fromSi(floor.dead()), PSF),
                () -> assertEquals(15, Units.PSF.fromSi(floor.superimposed()), PSF),
                () -> assertEquals(20, Units.PSF.fromSi(roof.roofLive()), PSF),
                // the roof carries no partitions and, by default, the floor's dead load
                () -> assertEquals(0, roof.partition(), 0),
                () -> assertEquals(floor.dead(), roof.dead(), 1e-6),
                // one source of truth: the editor's new floors start with the same loads
                () -> assertEquals(PlanEdits.OFFICE_FLOOR.partition(), floor.partition(), 1e-6),
                () -> assertEquals(PlanEdits.OFFICE_FLOOR.dead(), floor.dead(), 1e-6),
                () -> assertEquals(PlanEdits.OFFICE_FLOOR.superimposed(), floor.superimposed(), 1e-6),
                () -> assertEquals(PlanEdits.OFFICE_FLOOR.live(), floor.live(), 1e-6),
                () -> assertEquals("", p.notes()));
    }

    @Test
    void theRoofTakesItsOwnDeadLoad(@TempDir Path dir) {
        Plan own = written(dir.resolve("a.bay.json"), "--dead", "56psf", "--roof-dead", "20psf", "--composite", "none");
        // a plan without a slab described (no --roof-dead) writes the same roof as before: the floor's dead load
        Plan same = written(dir.resolve("b.bay.json"), "--dead", "56psf", "--composite", "none");
        assertAll(
                () -> assertEquals(20, Units.PSF.fromSi(loads(own, true).dead()), PSF),
                () -> assertEquals(56, Units.PSF.fromSi(loads(own, false).dead()), PSF),
                () -> assertEquals(56, Units.PSF.fromSi(loads(same, true).dead()), PSF));
    }

    @Test
    void noPartitionsNeedAReasonInTheNotes(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("a.bay.json");
        BeamCommandTest.Run refused = BeamCommandTest.run("new", "--bays-x", "2@30ft", "--bays-y", "1@30ft",
                "--partition", "0psf", "-o", f.toString());
        String reason = "fixed masonry partitions, carried in the superimposed dead load";
        Plan noted = written(dir.resolve("b.bay.json"), "--partition", "0psf", "--notes", reason);
        // ASCE 7-16 §4.3.2 exception: no partition allowance where the live load is 80 psf or more
        Plan heavy = written(dir.resolve("c.bay.json"), "--partition", "0psf", "--live", "125psf");
        assertAll(
                () -> assertEquals(2, refused.code()),
                () -> assertTrue(refused.err().contains("§4.3.2") && refused.err().contains("--notes"), refused.err()),
                () -> assertFalse(Files.exists(f)),
                () -> assertEquals(0, loads(noted, false).partition(), 0),
                () -> assertEquals(reason, noted.notes()),
                () -> assertTrue(Files.readString(dir.resolve("b.bay.json")).contains("\"notes\": \"" + reason + "\"")),
                () -> assertEquals(0, loads(heavy, false).partition(), 0));
    }

    @Test
    void theHelpStatesTheDefaults() {
        BeamCommandTest.Run r = BeamCommandTest.run("new", "--help");
        String out = r.out().replaceAll("\\s+", " ");
        assertAll(
                () -> assertEquals(0, r.code()),
                () -> assertTrue(out.contains("default 0klf: no cladding load"), out),
                () -> assertTrue(out.contains("(default 15psf, ASCE 7-16 §4."), out),
                () -> assertTrue(out.contains("--roof-dead"), out),
                () -> assertTrue(out.contains("or --dead with --composite none"), out),
                () -> assertTrue(out.contains("--composite=on|off|none") && out.contains("(default on)"), out));
    }

    @Test
    void newPlansDescribeTheSlabAndActCompositelyByDefault(@TempDir Path dir) {
        Plan on = written(dir.resolve("a.bay.json"));
        Plan off = written(dir.resolve("b.bay.json"), "--composite", "off", "--topping", "3.25in", "--concrete", "110pcf");
        org.baywright.plan.Floor f = on.floor("typical").orElseThrow();
        org.baywright.plan.Floor roof = on.floor("roof").orElseThrow();
        org.baywright.plan.Slab slab = f.decks().get(0).slab();
        org.baywright.plan.Slab light = off.floor("typical").orElseThrow().decks().get(0).slab();
        assertAll(
                () -> assertEquals(org.baywright.plan.CompositeMode.COMPOSITE, f.composite().mode()),
                () -> assertFalse(f.composite().shored()),
                // ASCE/SEI 37 construction live load 20 psf (from memory)
                () -> assertEquals(20, Units.PSF.fromSi(f.composite().constructionLive()), PSF),
                () -> assertEquals(org.baywright.plan.Slab.typical(), slab),
                // the slab's weight comes from its description, so the area load carries no other dead load
                () -> assertEquals(0, loads(on, false).dead(), 0),
                // 3 in deck + 4½ in normal-weight concrete: about 75 psf (CHECK-VALUES §10; AISC DE I.1 uses 75 psf)
                () -> assertEquals(75, Units.PSF.fromSi(org.baywright.takedown.SlabDesign.weight(slab)), 0.5),
                // 3 in deck + 3¼ in lightweight at 110 pcf: about 46 psf (CHECK-VALUES §10)
                () -> assertEquals(46, Units.PSF.fromSi(org.baywright.takedown.SlabDesign.weight(light)), 0.5),
                () -> assertEquals(org.baywright.plan.CompositeMode.NON_COMPOSITE,
                        off.floor("typical").orElseThrow().composite().mode()),
                // new plans size their bays for walking vibration (AISC DG11) unless --vibration off
                () -> assertTrue(f.composite().sizeForVibration()),
                () -> assertFalse(written(dir.resolve("c.bay.json"), "--vibration", "off").floor("typical").orElseThrow()
                        .composite().sizeForVibration()),
                () -> assertFalse(roof.composite().sizeForVibration()),
                // the roof's deck carries no concrete: no slab, its own dead load (50 psf default)
                () -> assertNull(roof.decks().get(0).slab()),
                () -> assertEquals(50, Units.PSF.fromSi(loads(on, true).dead()), PSF));
    }
}
