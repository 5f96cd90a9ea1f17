package org.baywright.design;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.aisc360.IShapeCompression;
import org.baywright.design.aisc360.ResistanceFactors;
import org.baywright.load.Combinations;
import org.baywright.load.DesignMethod;
import org.baywright.load.LoadCase;

/**
 * Sizes the tiers of one column line, the lightest allowed section per tier: flexural buckling by AISC
 * 360-16 E3 with K = 1 and the storey height as unbraced length about both axes, required strength from
 * the gravity combinations (ASCE 7-16 §2.3.1 / §2.4.1) of the storey's service loads with live load
 * already reduced, each tier's own weight added to D of its storeys and of every storey below. Shapes
 * with slender elements are not candidates.
 *
 * <p>Immutable and thread-safe: column lines are independent and may be designed in parallel.
 */
public final class ColumnDesigner {

    /**
     * The axial load in one storey from everything above, without the own weight of any column.
     *
     * @param level the level at the top of the storey
     * @param height storey height, m
     * @param unreduced service load by {@link LoadCase} ordinal, N
     * @param reduced the same with live and roof live load reduced, N
     */
    public record StoreyDemand(String level, double height, double[] unreduced, double[] reduced) {
    }

    /** The storeys one section spans between splices, bottom first. */
    public record TierDemand(List<StoreyDemand> storeys) {
        public TierDemand {
            storeys = List.copyOf(storeys);
        }

        /** The tier's length: its storey heights summed from the bottom, m. */
        public double length() {
            double length = 0;
            for (StoreyDemand s : storeys) {
                length += s.height();
            }
            return length;
        }
    }

    /**
     * One storey checked with a tier's section.
     *
     * @param unreduced service load by load case with the own weight of the columns above the storey's base, N
     * @param reduced the same with live load reduced, N
     * @param required required strength (Pu or Pa) of the governing combination, N
     * @param available available strength (φc·Pn or Pn/Ωc), N; NaN with no section
     * @param combination the governing combination
     */
    public record StoreyCheck(double[] unreduced, double[] reduced, double required, double available, double ratio,
            String combination) {
    }

    /**
     * A tier as designed.
     *
     * @param section the section, or null when no section is allowed at all
     * @param storeys bottom first
     * @param rejected lighter sections rejected, with their governing ratio
     */
    public record TierDesign(Section section, MemberStatus status, List<StoreyCheck> storeys, double length,
            List<String> rejected) {
        /** Weight per length of the section, N/m (0 with none). */
        public double weight() {
            return section == null ? 0 : section.weight();
        }

        /** Highest ratio of the tier's storeys. */
        public double maxRatio() {
            return storeys.stream().mapToDouble(StoreyCheck::ratio).max().orElse(Double.NaN);
        }

        TierDesign withStatus(MemberStatus s) {
            return new TierDesign(section, s, storeys, length, rejected);
        }
    }

    private final Catalog candidates;
    private final Steel steel;
    private final DesignMethod method;

    /**
     * @param catalog the run's catalog
     * @param series the series allowed for columns (empty = all)
     */
    public ColumnDesigner(Catalog catalog, Steel steel, DesignMethod method, List<String> series) {
        this.steel = steel;
        this.method = method;
        List<String> allowed = List.copyOf(series);
        this.candidates = catalog.filter(s -> (allowed.isEmpty() || allowed.contains(s.series()))
                && !IShapeCompression.hasSlenderElement(s, steel.fy(), steel.e(), null));
    }

    /** Whether a section of this designation is among the candidates (allowed series, no slender element). */
    public boolean allows(String designation) {
        return candidates.find(designation).isPresent();
    }

    /**
     * Designs a column line's tiers from the top down, so that each carries the weight of those above.
     * A fixed section that is a candidate is checked instead of searching (status {@link
     * MemberStatus#FIXED_SIZE}); one that is not is ignored and the tier sized. A tier no section passes
     * is {@link MemberStatus#OVERSTRESSED} with the closest section, or with none when there are no
     * candidates (then it still carries its loads down, without its own weight).
     *
     * @param tiers bottom first
     * @return the tiers as designed, bottom first
     */
    public List<TierDesign> design(List<TierDemand> tiers, Optional<String> fixed) {
        TierDesign[] out = new TierDesign[tiers.size()];
        double weightAbove = 0;
        for (int t = tiers.size() - 1; t >= 0; t--) {
            out[t] = tier(tiers.get(t), weightAbove, fixed);
            weightAbove += out[t].weight() * out[t].length();
        }
        return List.of(out);
    }

    private TierDesign tier(TierDemand tier, double weightAbove, Optional<String> fixed) {
        List<String> rejected = new ArrayList<>();
        TierDesign chosen = null;
        TierDesign best = null;
        for (Section s : candidates.sections()) {
            TierDesign d = check(tier, s, weightAbove, rejected);
            if (Check.passes(d.maxRatio())) {
                chosen = d;
                break;
            }
            rejected.add(s.designation() + " " + String.format(Locale.ROOT, "%.2f", d.maxRatio()));
            if (best == null || d.maxRatio() < best.maxRatio()) {
                best = d;
            }
        }
        Optional<Section> given = fixed.flatMap(candidates::find);
        if (given.isPresent()) {
            rejected.clear();
            TierDesign d = check(tier, given.get(), weightAbove, rejected);
            chosen = Check.passes(d.maxRatio()) ? d.withStatus(MemberStatus.FIXED_SIZE) : null;
            best = d;
        }
        if (chosen != null) {
            return chosen;
        }
        return best == null ? check(tier, null, weightAbove, rejected) : best.withStatus(MemberStatus.OVERSTRESSED);
    }

    /** The tier's storeys with section {@code s}; with none (null), the loads alone (ratios NaN, overstressed). */
    private TierDesign check(TierDemand tier, Section s, double weightAbove, List<String> rejected) {
        List<StoreyCheck> storeys = new ArrayList<>();
        double own = 0;
        for (int i = tier.storeys().size() - 1; i >= 0; i--) {
            StoreyDemand d = tier.storeys().get(i);
            double h = d.height();
            own += s == null ? 0 : s.weight() * h;
            storeys.add(0, storey(d, s, weightAbove + own));
        }
        return new TierDesign(s, s == null ? MemberStatus.OVERSTRESSED : MemberStatus.SIZED, List.copyOf(storeys),
                tier.length(), List.copyOf(rejected));
    }

    /** One storey with {@code columnWeight} (the columns above its base) added to D. */
    private StoreyCheck storey(StoreyDemand d, Section s, double columnWeight) {
        double[] unreduced = d.unreduced().clone();
        double[] reduced = d.reduced().clone();
        unreduced[LoadCase.D.ordinal()] += columnWeight;
        reduced[LoadCase.D.ordinal()] += columnWeight;
        Set<LoadCase> present = EnumSet.noneOf(LoadCase.class);
        for (LoadCase lc : LoadCase.values()) {
            if (reduced[lc.ordinal()] != 0) {
                present.add(lc);
            }
        }
        Combinations.Governing g = Combinations.governing(reduced, Combinations.gravity(method, present));
        double req = g.value();
        String gov = g.combination().name();
        double avail = Double.NaN;
        if (s != null) {
            IShapeCompression.Strength st = IShapeCompression.strength(s, steel.fy(), steel.e(), d.height(), d.height(), null);
            avail = method.available(st.pn(), ResistanceFactors.PHI_C, ResistanceFactors.OMEGA_C);
        }
        return new StoreyCheck(unreduced, reduced, req, avail, req / avail, gov);
    }
}
