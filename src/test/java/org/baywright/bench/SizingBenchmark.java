package org.baywright.bench;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.BeamDesigner;
import org.baywright.design.BeamLoads;
import org.baywright.design.SearchFilter;
import org.baywright.load.LoadCase;
import org.baywright.units.Units;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Threads;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.runner.Runner;
import org.openjdk.jmh.runner.RunnerException;
import org.openjdk.jmh.runner.options.OptionsBuilder;

/**
 * Members sized per second: random simple-span floor members (10–45 ft, uniform dead and live
 * loads, a third of them with point loads) against the full built-in W catalog, one thread. A
 * benchmark, not a test: run it with {@code mvn -B -q -Pbench -Dbench=sizing} (JMH options in {@code -Dbench.args})
 * and read the figure; nothing asserts it.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
@Threads(1)
public class SizingBenchmark {
    private Catalog catalog;
    private List<BeamLoads> members;
    private BeamCriteria criteria;
    private int next;

    @Setup
    public void setup() {
        catalog = CatalogFile.loadDefault();
        criteria = BeamCriteria.defaults();
        members = randomMembers(1000, 42);
    }

    /** Random members, reproducible from the seed (invented loads for benchmarking only). */
    public static List<BeamLoads> randomMembers(int n, long seed) {
        Random r = new Random(seed);
        List<BeamLoads> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double span = Units.FT_.toSi(10 + 35 * r.nextDouble());
            Map<LoadCase, List<SpanLoad>> m = new EnumMap<>(LoadCase.class);
            List<SpanLoad> d = new ArrayList<>();
            List<SpanLoad> l = new ArrayList<>();
            d.add(DistributedLoad.full(span, Units.KLF.toSi(0.2 + 1.3 * r.nextDouble())));
            l.add(DistributedLoad.full(span, Units.KLF.toSi(0.2 + 1.8 * r.nextDouble())));
            if (r.nextInt(3) == 0) {
                double x = span * (0.2 + 0.6 * r.nextDouble());
                d.add(new PointLoad(x, Units.KIPS.toSi(2 + 10 * r.nextDouble())));
                l.add(new PointLoad(x, Units.KIPS.toSi(2 + 15 * r.nextDouble())));
            }
            m.put(LoadCase.D, d);
            m.put(LoadCase.L, l);
            out.add(BeamLoads.of(span, m));
        }
        return out;
    }

    @Benchmark
    public BeamDesign sizeOneMember() {
        BeamLoads loads = members.get(next);
        next = (next + 1) % members.size();
        return new BeamDesigner(loads, criteria).search(catalog, SearchFilter.ALL);
    }

    public static void main(String[] args) throws RunnerException {
        new Runner(new OptionsBuilder().include(SizingBenchmark.class.getSimpleName()).build()).run();
    }
}
