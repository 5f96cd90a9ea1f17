package org.baywright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.BeamLoads;
import org.baywright.design.Bracing;
import org.baywright.design.CompositeBeam;
import org.baywright.design.CompositeBeamDesigner;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.CompositeDesign;
import org.baywright.design.CompositeMember;
import org.baywright.design.SearchFilter;
import org.baywright.design.SlabOnDeck;
import org.baywright.design.Studs;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.load.LoadCase;
import org.baywright.units.Units;

/**
 * Composite beams sized per second on one thread: for a set of invented beams (spans 20–45 ft, beams at
 * 8–12 ft, ribs perpendicular and parallel, 3 in deck with 4½ in normal-weight or 3¼ in lightweight
 * concrete), {@link CompositeBeamDesigner#search} over the whole default catalog, with the (section ×
 * stud count) evaluations it makes; then the same for invented girders ({@link CompositeMember}s with the
 * beams' reactions as point loads at their third or quarter points, ribs parallel, general statics and
 * the I8.2c check). A benchmark main, not a test; it asserts nothing:
 * {@code mvn -B -q -Pbench -Dbench=composite [-Dbench.args="SECONDS [beams|girders]"]} (SECONDS for each set; one set only
 * when named). Figures per wall-clock second and per CPU second of the thread (the latter steadier on a shared machine).
 */
public final class CompositeSizingBenchmark {
    private CompositeSizingBenchmark() {
    }

    static List<CompositeBeam> beams() {
        List<CompositeBeam> out = new ArrayList<>();
        SlabOnDeck nw = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);
        SlabOnDeck lw = SlabOnDeck.us(3, 6, 12, 2.5, 3.25, 110, 3.5);
        for (double spanFt : new double[] {20, 25, 30, 35, 40, 45}) {
            for (double spacingFt : new double[] {8, 10, 12}) {
                for (SlabOnDeck slab : new SlabOnDeck[] {nw, lw}) {
                    for (DeckRibs ribs : new DeckRibs[] {DeckRibs.PERPENDICULAR, DeckRibs.PARALLEL}) {
                        out.add(CompositeBeam.interior(Units.FT_.toSi(spanFt), Units.FT_.toSi(spacingFt), ribs, slab,
                                Studs.defaults(), Units.PSF.toSi(15), Units.PSF.toSi(80), Units.PSF.toSi(20)));
                    }
                }
            }
        }
        return out;
    }

    /** Girders 20–45 ft carrying beams at their third or quarter points (beams at 30 ft, 10 ft apart). */
    static List<CompositeMember> girders() {
        List<CompositeMember> out = new ArrayList<>();
        SlabOnDeck nw = SlabOnDeck.us(3, 6, 12, 2.5, 4.5, 145, 4);
        SlabOnDeck lw = SlabOnDeck.us(3, 6, 12, 2.5, 3.25, 110, 3.5);
        double inf = Double.POSITIVE_INFINITY;
        for (double spanFt : new double[] {20, 25, 30, 35, 40, 45}) {
            for (int bays : new int[] {3, 4}) {
                for (SlabOnDeck slab : new SlabOnDeck[] {nw, lw}) {
                    double l = Units.FT_.toSi(spanFt);
                    double area = Units.FT_.toSi(30) * l / bays; // floor carried by one beam
                    List<SpanLoad> wet = new ArrayList<>();
                    List<SpanLoad> cl = new ArrayList<>();
                    List<SpanLoad> sdl = new ArrayList<>();
                    List<SpanLoad> live = new ArrayList<>();
                    for (int i = 1; i < bays; i++) {
                        double x = l * i / bays;
                        wet.add(new PointLoad(x, slab.weight(null) * area + Units.KIPS.toSi(1)));
                        cl.add(new PointLoad(x, Units.PSF.toSi(20) * area));
                        sdl.add(new PointLoad(x, Units.PSF.toSi(15) * area));
                        live.add(new PointLoad(x, Units.PSF.toSi(80) * area));
                    }
                    // the girder's own strip of slab, 1 ft wide
                    wet.add(DistributedLoad.full(l, slab.weight(null) * Units.FT_.toSi(1)));
                    double[] at = new double[bays - 1];
                    for (int i = 1; i < bays; i++) {
                        at[i - 1] = (double) i / bays;
                    }
                    out.add(new CompositeMember(l, DeckRibs.PARALLEL, Units.FT_.toSi(30), Units.FT_.toSi(30), inf, inf, slab,
                            Studs.defaults(), slab.weight(null), wet, cl,
                            BeamLoads.of(l, Map.of(LoadCase.D, sdl, LoadCase.L, live)), Bracing.atFractions(at)));
                }
            }
        }
        return out;
    }

    /** Sizes every member of {@code designers} over and over for {@code seconds}; prints members per wall and per CPU second. */
    private static void measure(String what, List<Supplier<CompositeBeamDesigner>> designers, Catalog catalog, double seconds) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        long warmEnd = System.nanoTime() + 2_000_000_000L;
        while (System.nanoTime() < warmEnd) {
            for (Supplier<CompositeBeamDesigner> d : designers) {
                d.get().search(catalog, SearchFilter.ALL);
            }
        }
        long sized = 0;
        long evaluations = 0;
        long t0 = System.nanoTime();
        long c0 = mx.getCurrentThreadCpuTime();
        long end = t0 + (long) (seconds * 1e9);
        while (System.nanoTime() < end) {
            for (Supplier<CompositeBeamDesigner> d : designers) {
                CompositeDesign r = d.get().search(catalog, SearchFilter.ALL);
                sized++;
                evaluations += r.evaluations();
            }
        }
        double s = (System.nanoTime() - t0) / 1e9;
        double cpu = (mx.getCurrentThreadCpuTime() - c0) / 1e9;
        System.out.printf("composite %s sized: %d in %.2f s = %.0f per second; %.0f per CPU second (one thread, %d sections)%n",
                what, sized, s, sized / s, sized / cpu, catalog.size());
        System.out.printf("  (section × stud count) evaluations: %.1f per member, %.0f per CPU second%n",
                (double) evaluations / sized, evaluations / cpu);
    }

    public static void main(String[] args) {
        double seconds = args.length > 0 ? Double.parseDouble(args[0]) : 5;
        String only = args.length > 1 ? args[1] : "";
        Catalog catalog = CatalogFile.loadDefault();
        CompositeCriteria criteria = CompositeCriteria.defaults();
        List<CompositeBeam> beams = beams();
        List<Supplier<CompositeBeamDesigner>> b = new ArrayList<>();
        for (CompositeBeam x : beams) {
            b.add(() -> new CompositeBeamDesigner(x, criteria));
        }
        if (!only.equals("girders")) {
            measure("beams (uniform loads)", b, catalog, seconds);
        }
        for (CompositeBeam x : beams.subList(0, 4)) {
            CompositeDesign d = new CompositeBeamDesigner(x, criteria).search(catalog, SearchFilter.ALL);
            System.out.printf("    %.0f ft at %.0f ft, %s: %s with %d studs, camber %.2f in%n", Units.FT_.fromSi(x.span()),
                    Units.FT_.fromSi(x.tributaryWidth()), x.ribs(), d.section(), d.studs(), Units.IN.fromSi(d.camber()));
        }
        List<CompositeMember> girders = girders();
        List<Supplier<CompositeBeamDesigner>> g = new ArrayList<>();
        for (CompositeMember x : girders) {
            g.add(() -> new CompositeBeamDesigner(x, criteria));
        }
        if (!only.equals("beams")) {
            measure("girders (point loads)", g, catalog, seconds);
        }
        for (CompositeMember x : girders.subList(0, 4)) {
            CompositeDesign d = new CompositeBeamDesigner(x, criteria).search(catalog, SearchFilter.ALL);
            System.out.printf("    %.0f ft girder, %d point loads: %s with %d studs, camber %.2f in%n", Units.FT_.fromSi(x.span()),
                    x.composite().of(LoadCase.L).loads().size(), d.section(), d.studs(), Units.IN.fromSi(d.camber()));
        }
    }
}
