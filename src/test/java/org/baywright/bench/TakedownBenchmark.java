package org.baywright.bench;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.units.Units;

/**
 * A full run of a 20-storey, 8 × 6-bay building (30 × 40 ft bays, beams at 10 ft): wall time per run
 * and members designed per second. A benchmark main, not a test:
 * {@code mvn -B -q -Pbench -Dbench=takedown [-Dbench.args="RUNS [composite]"]} (default 15 runs; with
 * {@code composite}, the same building with a 3 in deck + 4½ in slab described on its floors, which act
 * compositely). The building is invented for benchmarking.
 */
public final class TakedownBenchmark {
    private TakedownBenchmark() {
    }

    public static Plan building() {
        List<Double> storeys = Collections.nCopies(20, Units.FT_.toSi(13));
        return RegularPlan.generate(new RegularPlan.Spec("Benchmark tower", "us",
                Collections.nCopies(8, Units.FT_.toSi(30)), Collections.nCopies(6, Units.FT_.toSi(40)), storeys, true,
                Units.FT_.toSi(10), new LoadValues(Units.PSF.toSi(56), Units.PSF.toSi(10), Units.PSF.toSi(50), 0, 0,
                        Units.PSF.toSi(15)),
                new LoadValues(Units.PSF.toSi(56), Units.PSF.toSi(15), 0, Units.PSF.toSi(20), 0, 0),
                new LoadValues(Units.KLF.toSi(0.4), 0, 0, 0, 0, 0)));
    }

    public static void main(String[] args) {
        boolean composite = args.length > 1 && args[1].equals("composite");
        Plan plan = composite ? org.baywright.plan.RegularPlan.withSlab(building(), org.baywright.plan.Slab.typical(),
                org.baywright.plan.CompositeMode.COMPOSITE, 0) : building();
        System.out.println(composite ? "composite floors" : "bare steel (no slab described)");
        Catalog catalog = CatalogFile.loadDefault();
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 15;
        List<Double> times = new ArrayList<>();
        RunResult last = null;
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            last = PlanRun.run(plan, catalog);
            times.add((System.nanoTime() - t0) / 1e6);
        }
        int designed = 0;
        for (String floor : last.takedown().levelFloors().values()) {
            designed += last.takedown().members().get(floor).size();
        }
        int distinct = 0;
        for (List<MemberResult> l : last.takedown().members().values()) {
            distinct += l.size();
        }
        int tiers = last.takedown().columns().stream().mapToInt(c -> c.tiers().size()).sum();
        List<Double> warm = new ArrayList<>(times.subList(Math.min(5, times.size() - 1), times.size()));
        Collections.sort(warm);
        double median = warm.get(warm.size() / 2);
        System.out.printf("runs %d; first %.1f ms; warm median %.1f ms, min %.1f ms%n", runs, times.get(0), median, warm.get(0));
        System.out.printf("members at all levels %d (distinct designs %d), column tiers %d, columns %d%n", designed, distinct,
                tiers, last.takedown().columns().size());
        System.out.printf("members per second (all levels, warm median): %.0f%n", designed / (median / 1000));
        System.out.printf("problems: %d%n", last.problems().size());
    }
}
