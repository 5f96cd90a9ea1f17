package org.baywright.bench;

import java.util.ArrayList;
import java.util.List;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.CompositeBeam;
import org.baywright.design.CompositeBeamDesigner;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.CompositeDesign;
import org.baywright.design.SearchFilter;
import org.baywright.design.SlabOnDeck;
import org.baywright.design.Studs;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.units.Units;

/**
 * Composite beams sized per second on one thread: for a set of invented beams (spans 20–45 ft, beams at
 * 8–12 ft, ribs perpendicular and parallel, 3 in deck with 4½ in normal-weight or 3¼ in lightweight
 * concrete), {@link CompositeBeamDesigner#search} over the whole default catalog, with the (section ×
 * stud count) evaluations it makes. A benchmark main, not a test; it asserts nothing:
 * {@code java -cp target/classes:target/test-classes:$(deps) org.baywright.bench.CompositeSizingBenchmark [SECONDS]}.
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

    public static void main(String[] args) {
        double seconds = args.length > 0 ? Double.parseDouble(args[0]) : 5;
        Catalog catalog = CatalogFile.loadDefault();
        List<CompositeBeam> beams = beams();
        CompositeCriteria criteria = CompositeCriteria.defaults();
        // warm-up
        long warmEnd = System.nanoTime() + 2_000_000_000L;
        while (System.nanoTime() < warmEnd) {
            for (CompositeBeam b : beams) {
                new CompositeBeamDesigner(b, criteria).search(catalog, SearchFilter.ALL);
            }
        }
        long sized = 0;
        long evaluations = 0;
        long t0 = System.nanoTime();
        long end = t0 + (long) (seconds * 1e9);
        while (System.nanoTime() < end) {
            for (CompositeBeam b : beams) {
                CompositeDesign d = new CompositeBeamDesigner(b, criteria).search(catalog, SearchFilter.ALL);
                sized++;
                evaluations += d.evaluations();
            }
        }
        double s = (System.nanoTime() - t0) / 1e9;
        System.out.printf("composite beams sized: %d in %.2f s = %.0f per second (one thread, %d sections in the catalog)%n",
                sized, s, sized / s, catalog.size());
        System.out.printf("(section × stud count) evaluations: %d = %.0f per second, %.1f per beam%n", evaluations,
                evaluations / s, (double) evaluations / sized);
        for (CompositeBeam b : beams.subList(0, 4)) {
            CompositeDesign d = new CompositeBeamDesigner(b, criteria).search(catalog, SearchFilter.ALL);
            System.out.printf("  %.0f ft at %.0f ft, %s: %s with %d studs, camber %.2f in%n", Units.FT_.fromSi(b.span()),
                    Units.FT_.fromSi(b.tributaryWidth()), b.ribs(), d.section(), d.studs(), Units.IN.fromSi(d.camber()));
        }
    }
}
