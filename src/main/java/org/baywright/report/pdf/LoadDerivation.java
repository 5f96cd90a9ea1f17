package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.baywright.calc.Quantity;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Floor;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * The part "Load derivation": for every area load of every floor layout, where each of its values comes
 * from — slab and deck, superimposed dead load, partitions (ASCE 7-16 §4.3.2), live load by occupancy
 * with the rows of ASCE 7-16 Table 4.3-1 that carry that value, roof live load and snow — instead of bare
 * numbers. The plan holds one value per load case and a use, not the items behind them; where it has no
 * breakdown the table says so.
 */
final class LoadDerivation {
    private LoadDerivation() {
    }

    /** Which uses a row of Table 4.3-1 may stand for. */
    private enum Kind {
        ANY, ASSEMBLY, GARAGE, ROOF
    }

    /**
     * A row of ASCE 7-16 Table 4.3-1, uniform live load in psf, described in our words.
     *
     * @param found true where the value was read in the standard (FOUND); false where it is from memory,
     *     as the team's check values (§3, Table 3) label them
     */
    record Row(String occupancy, double psf, Kind kind, boolean found) {
    }

    /** Rows of ASCE 7-16 Table 4.3-1 (uniform loads, psf). */
    static final List<Row> TABLE_4_3_1 = List.of(
            new Row("office buildings, offices", 50, Kind.ANY, true),
            new Row("office buildings, lobbies and first-floor corridors", 100, Kind.ANY, true),
            new Row("office buildings, corridors above the first floor", 80, Kind.ANY, true),
            new Row("residential, private rooms and their corridors", 40, Kind.ANY, false),
            new Row("residential, public rooms and their corridors", 100, Kind.ANY, false),
            new Row("schools, classrooms", 40, Kind.ANY, false),
            new Row("hospitals, patient rooms", 40, Kind.ANY, false),
            new Row("hospitals, operating rooms and laboratories", 60, Kind.ANY, false),
            new Row("libraries, reading rooms", 60, Kind.ANY, false),
            new Row("libraries, stack rooms", 150, Kind.ANY, false),
            new Row("retail, first floor", 100, Kind.ANY, false),
            new Row("retail, upper floors", 75, Kind.ANY, false),
            new Row("stairs and exits", 100, Kind.ANY, false),
            new Row("storage, light", 125, Kind.ANY, false),
            new Row("storage, heavy", 250, Kind.ANY, false),
            new Row("assembly areas, fixed seats", 60, Kind.ASSEMBLY, false),
            new Row("assembly areas, lobbies, movable seats and platforms", 100, Kind.ASSEMBLY, false),
            new Row("garages, passenger vehicles only", 40, Kind.GARAGE, false),
            new Row("roofs, ordinary flat, pitched and curved", 20, Kind.ROOF, false));

    /** The partition allowance of ASCE 7-16 §4.3.2, psf, and the live load from which it is not required. */
    static final double PARTITION_PSF = 15;
    static final double PARTITION_NOT_REQUIRED_FROM_PSF = 80;

    /** The rows of Table 4.3-1 whose uniform load is {@code psf} (to 0.5 psf) and that fit {@code use}. */
    static List<Row> rows(double psf, LiveLoadUse use, boolean roofLive) {
        List<Row> out = new ArrayList<>();
        for (Row r : TABLE_4_3_1) {
            boolean fits = roofLive && use == LiveLoadUse.ORDINARY ? r.kind() == Kind.ROOF
                    : use == LiveLoadUse.ASSEMBLY ? r.kind() == Kind.ASSEMBLY || r.kind() == Kind.ANY
                    : use == LiveLoadUse.GARAGE ? r.kind() == Kind.GARAGE : r.kind() != Kind.ROOF;
            if (fits && Math.abs(r.psf() - psf) < 0.5) {
                out.add(r);
            }
        }
        return out;
    }

    static void write(Context cx) {
        PageFlow f = cx.flow;
        UnitSystem us = cx.us;
        boolean partitionAsDead = cx.basis().liveLoad().partitionAsDead();
        String a = Fmt.unit(Quantity.AREA_LOAD, us);
        cx.part("Load derivation");
        f.paragraph(f.body, "Where each service load of each area load comes from, in " + a + ". The plan holds one value per"
                + " load case and a use for live-load reduction, not the items behind them: where it has no breakdown (slab"
                + " and deck weight, superimposed items, snow inputs) the table says so, and the value is the one the plan"
                + " gives. The live load names the rows of " + FrontMatter.ASCE + " Table 4.3-1 whose uniform load it equals;"
                + " the plan does not name the occupancy, so the engineer of record confirms the row. The framing's own"
                + " weight is not listed: the design adds it to D.");
        for (Floor fl : cx.run.plan().floors()) {
            if (fl.areaLoads().isEmpty()) {
                continue;
            }
            f.heading2("Floor layout " + Summaries.floorLabel(cx, fl.id()) + (fl.roof() ? " (roof)" : ""), 80);
            for (AreaLoad al : fl.areaLoads()) {
                f.heading3(al.id() + ": " + useLabel(al.use()) + ", " + Fmt.v(Math.abs(al.outline().signedArea()),
                        Quantity.FLOOR_AREA, us), 60);
                table(al, fl.roof(), partitionAsDead, us).draw(f);
            }
        }
    }

    /** The derivation of one area load. */
    static Table table(AreaLoad al, boolean roof, boolean partitionAsDead, UnitSystem us) {
        LoadValues v = al.values();
        Table t = new Table().left("Component", 20).left("Case", 7).right("Value", 9).left("Derivation", 66).fontSize(7.2f);
        if (v.dead() != 0 || !roof) {
            t.row(roof ? "Roof deck and slab" : "Slab and deck", "D", n(v.dead(), us), "as given in the plan: one value for"
                    + " the slab and deck together; the plan holds no breakdown (concrete, ribs, deck sheet)");
        }
        if (v.superimposed() != 0) {
            t.row("Superimposed items", "D", n(v.superimposed(), us), "as given in the plan: ceiling, services, finishes and"
                    + " other superimposed dead load as one value; the plan holds no list of items");
        }
        double live = psf(v.live());
        if (v.partition() != 0 || v.live() != 0) {
            t.row("Partitions", partitionAsDead ? "D" : "L", n(v.partition(), us), partitions(v, live, partitionAsDead));
        }
        if (v.live() != 0) {
            t.row("Live load", "L", n(v.live(), us), liveText(rows(live, al.use(), false), al.use()));
        }
        if (v.roofLive() != 0) {
            boolean ordinary = al.use() == LiveLoadUse.ORDINARY;
            t.row("Roof live load", ordinary ? "Lr" : "L", n(v.roofLive(), us), ordinary
                    ? liveText(rows(psf(v.roofLive()), al.use(), true), al.use()) + "; reduced by " + FrontMatter.ASCE + " §4.8.2"
                    : "a roof used for " + useLabel(al.use()) + " (" + FrontMatter.ASCE + " §4.8.3): floor live load of that"
                            + " use, reduced by §4.7; " + liveText(rows(psf(v.roofLive()), al.use(), false), al.use()));
        }
        if (v.snow() != 0 || roof) {
            t.row("Snow", "S", n(v.snow(), us), v.snow() == 0 ? "none given in the plan"
                    : "the design snow load as given in the plan; its inputs (ground snow load pg, exposure Ce, thermal Ct,"
                            + " importance Is, slope; " + FrontMatter.ASCE + " Ch. 7) are not in the plan and are the engineer's");
        }
        double dead = v.dead() + v.superimposed() + (partitionAsDead ? v.partition() : 0);
        double liveCarried = v.live() + (partitionAsDead ? 0 : v.partition());
        t.row("Carried", "D / L", n(dead, us) + " / " + n(liveCarried, us), "dead and floor live load as they enter the"
                + " combinations, before live-load reduction" + (v.roofLive() != 0 ? "; roof live load as above" : ""));
        return t;
    }

    private static String partitions(LoadValues v, double livePsf, boolean asDead) {
        String carried = asDead ? "carried as dead load (plan setting)" : "carried as live load and reduced with it (plan setting)";
        if (livePsf >= PARTITION_NOT_REQUIRED_FROM_PSF) {
            return "not required where the live load is " + fmt(PARTITION_NOT_REQUIRED_FROM_PSF) + " psf or more ("
                    + FrontMatter.ASCE + " §4.3.2)" + (v.partition() != 0 ? "; given anyway, " + carried : "");
        }
        double p = psf(v.partition());
        if (p + 0.05 >= PARTITION_PSF) {
            return "allowance for partitions that may move, at least " + fmt(PARTITION_PSF) + " psf (" + FrontMatter.ASCE
                    + " §4.3.2); " + carried;
        }
        return (p == 0 ? "none given" : "given below the " + fmt(PARTITION_PSF) + " psf minimum") + ": " + FrontMatter.ASCE
                + " §4.3.2 asks for at least " + fmt(PARTITION_PSF) + " psf where partitions may be placed or moved"
                + " (live load under " + fmt(PARTITION_NOT_REQUIRED_FROM_PSF) + " psf); the engineer of record confirms that"
                + " none is needed here";
    }

    private static String liveText(List<Row> rows, LiveLoadUse use) {
        String reduction = switch (use) {
            case ORDINARY -> "";
            case ASSEMBLY -> "; assembly use: not reduced at 100 psf or less (§4.7.5)";
            case GARAGE -> "; garage: not reduced, 20 % at most for members supporting two floors or more (§4.7.4)";
            case STORAGE_LIGHT, STORAGE_HEAVY -> "; storage: a heavy live load whatever its value, not reduced on one floor,"
                    + " 20 % at most for members supporting two floors or more (§4.7.3)";
            case NOT_REDUCIBLE -> "; not reduced (plan setting)";
        };
        if (rows.isEmpty()) {
            return "no row of " + FrontMatter.ASCE + " Table 4.3-1 for this use has this value: a value the engineer chose"
                    + reduction;
        }
        List<String> names = new ArrayList<>();
        for (Row r : rows) {
            names.add(r.occupancy() + " (" + fmt(r.psf()) + " psf)");
        }
        return FrontMatter.ASCE + " Table 4.3-1: " + String.join("; ", names) + reduction;
    }

    /** The use as the trade says it (the words the editor's Use list shows). */
    static String useLabel(LiveLoadUse use) {
        return use.words();
    }

    private static double psf(double pascals) {
        return Units.PSF.fromSi(pascals);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : String.format(Locale.ROOT, "%.1f", v);
    }

    private static String n(double si, UnitSystem us) {
        return si == 0 ? "0" : Fmt.n(si, Quantity.AREA_LOAD, us);
    }
}
