package org.baywright.study;

import java.util.List;
import org.baywright.design.MemberStatus;
import org.baywright.plan.Level;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Problem;
import org.baywright.report.RunSummary;
import org.baywright.run.RunResult;
import org.baywright.takedown.ColumnResult;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;

/**
 * The figures of one variant of a study (SI).
 *
 * @param index the variant's position in the study
 * @param settings its parameter values, one per sweep
 * @param steelWeight total steel weight: members at every level and column tiers, N
 * @param floorArea total loaded floor area, m²
 * @param weightPerArea steel weight per floor area, Pa (N/m²); NaN when there is no floor area
 * @param beamDepth actual depth d of the deepest beam, m (0 when none)
 * @param girderDepth actual depth d of the deepest girder, m (0 when none)
 * @param pieces members at all levels plus column tiers
 * @param maxRatio highest demand/capacity ratio of any member or tier
 * @param problems number of problems of the run
 * @param errors how many of them are errors
 * @param unsized members and tiers overstressed or unsupported
 * @param message why the variant could not be run (its settings do not fit the plan), else empty
 */
public record VariantResult(int index, List<Setting> settings, double steelWeight, double floorArea, double weightPerArea,
        double beamDepth, double girderDepth, int pieces, double maxRatio, int problems, int errors, int unsized,
        String message) {
    public VariantResult {
        settings = List.copyOf(settings);
    }

    /** Structural depth: the deeper of the deepest beam and the deepest girder, m. */
    public double structuralDepth() {
        return Math.max(beamDepth, girderDepth);
    }

    /** Ran, every member and tier sized, no error. */
    public boolean sound() {
        return message.isEmpty() && errors == 0 && unsized == 0 && Double.isFinite(weightPerArea);
    }

    /** A variant whose settings could not be applied to the plan. */
    public static VariantResult failed(int index, List<Setting> settings, String message) {
        return new VariantResult(index, settings, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, 0, Double.NaN, 1,
                1, 0, message == null || message.isEmpty() ? "cannot be applied" : message);
    }

    /** The figures of a run. */
    public static VariantResult of(int index, List<Setting> settings, RunResult run) {
        TakedownResult t = run.takedown();
        List<Problem> problems = run.problems();
        int errors = (int) problems.stream().filter(p -> p.severity() == Problem.Severity.ERROR).count();
        if (t == null) {
            return new VariantResult(index, settings, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, 0, Double.NaN,
                    problems.size(), Math.max(1, errors), 0, "");
        }
        double beam = 0;
        double girder = 0;
        int pieces = 0;
        for (Level lv : run.plan().levels()) {
            String floor = t.levelFloors().get(lv.name());
            for (MemberResult m : t.members().getOrDefault(floor, List.of())) {
                pieces++;
                if (m.design() != null && m.design().section() != null) {
                    double d = m.design().section().depth();
                    if (m.kind() == MemberKind.GIRDER) {
                        girder = Math.max(girder, d);
                    } else {
                        beam = Math.max(beam, d);
                    }
                }
            }
        }
        for (ColumnResult c : t.columns()) {
            pieces += c.tiers().size();
        }
        var counts = RunSummary.statusCounts(t);
        int unsized = counts.get(MemberStatus.OVERSTRESSED) + counts.get(MemberStatus.UNSUPPORTED);
        double w = t.steelWeight();
        double area = t.floorArea();
        return new VariantResult(index, settings, w, area, area > 0 ? w / area : Double.NaN, beam, girder, pieces,
                RunSummary.maxRatio(t), problems.size(), errors, unsized, "");
    }
}
