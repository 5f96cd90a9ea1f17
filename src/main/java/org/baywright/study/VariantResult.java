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
 * @param infill the infill beams the variant's plan actually placed (a maximum spacing is rounded to a
 *     whole number of beams per bay, so several spacings may give the same floor)
 * @param floorKey a digest of the designed floor: every member's kind, position and section and every
 *     column tier's section at every level; two variants with the same key are the same floor (empty when
 *     the variant did not run)
 * @param vibrationRatio the worst floor-vibration ratio (a_p/g ÷ a_o/g, AISC DG11 walking) of the variant's bays
 *     within the method (meets or exceeds; bays above 9 Hz and bays not checked left out), NaN when no bay was so
 *     checked (no slab, a roof only, the variant did not run)
 */
public record VariantResult(int index, List<Setting> settings, double steelWeight, double floorArea, double weightPerArea,
        double beamDepth, double girderDepth, int pieces, double maxRatio, int problems, int errors, int unsized,
        String message, InfillLayout infill, String floorKey, double vibrationRatio) {
    public VariantResult {
        settings = List.copyOf(settings);
        infill = infill == null ? InfillLayout.NONE : infill;
        floorKey = floorKey == null ? "" : floorKey;
    }

    /** The figures without a vibration check (NaN: no bay checked). */
    public VariantResult(int index, List<Setting> settings, double steelWeight, double floorArea, double weightPerArea,
            double beamDepth, double girderDepth, int pieces, double maxRatio, int problems, int errors, int unsized,
            String message, InfillLayout infill, String floorKey) {
        this(index, settings, steelWeight, floorArea, weightPerArea, beamDepth, girderDepth, pieces, maxRatio, problems, errors,
                unsized, message, infill, floorKey, Double.NaN);
    }

    /** True when some bay of the variant was checked for floor vibration within the method. */
    public boolean vibrationChecked() {
        return !Double.isNaN(vibrationRatio);
    }

    /**
     * True when no checked bay exceeds the floor-vibration limit (a_p/g ≤ a_o/g, AISC DG11 2nd ed. Eq. 4-1); also
     * true when no bay was checked, so plans without slabs are not filtered out.
     */
    public boolean meetsVibration() {
        return !(vibrationRatio > 1);
    }

    /** The worst ratio of the run's bays within the method (meets or exceeds), NaN when none. */
    public static double vibrationRatio(RunResult run) {
        double worst = Double.NaN;
        for (org.baywright.takedown.BayResult b : run.bays()) {
            if (b.checked() && b.result().status() != org.baywright.design.dg11.VibrationStatus.OUTSIDE_METHOD
                    && !(b.ratio() <= worst)) {
                worst = b.ratio();
            }
        }
        return worst;
    }

    /** The figures without infill layout or floor digest (tests and hand-made results). */
    public VariantResult(int index, List<Setting> settings, double steelWeight, double floorArea, double weightPerArea,
            double beamDepth, double girderDepth, int pieces, double maxRatio, int problems, int errors, int unsized,
            String message) {
        this(index, settings, steelWeight, floorArea, weightPerArea, beamDepth, girderDepth, pieces, maxRatio, problems, errors,
                unsized, message, InfillLayout.NONE, "");
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
                    problems.size(), Math.max(1, errors), 0, "", InfillLayout.of(run.plan()), "");
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
                RunSummary.maxRatio(t), problems.size(), errors, unsized, "", InfillLayout.of(run.plan()), floorKey(run),
                vibrationRatio(run));
    }

    /**
     * The digest of a designed floor: per level in order, the members sorted by kind and position
     * (millimetres) with their sections, then every column tier's section. Ids and generated names are left
     * out, so two spacings that place the same beams give the same key.
     */
    static String floorKey(RunResult run) {
        TakedownResult t = run.takedown();
        StringBuilder b = new StringBuilder();
        for (Level lv : run.plan().levels()) {
            b.append("level ").append(lv.name()).append('\n');
            List<String> lines = new java.util.ArrayList<>();
            for (MemberResult m : t.members().getOrDefault(t.levelFloors().get(lv.name()), List.of())) {
                lines.add(m.kind() + " " + mm(m.start().x()) + " " + mm(m.start().y()) + " "
                        + mm(m.end().x()) + " " + mm(m.end().y()) + " "
                        + (m.design() != null && m.design().section() != null ? m.design().section().designation() : "-"));
            }
            java.util.Collections.sort(lines);
            lines.forEach(l -> b.append(l).append('\n'));
        }
        for (ColumnResult c : t.columns()) {
            b.append("column ").append(c.grid()).append(' ').append(mm(c.at().x())).append(' ').append(mm(c.at().y()));
            c.tiers().forEach(tier -> b.append(' ').append(tier.section() == null ? "-" : tier.section()));
            b.append('\n');
        }
        try {
            byte[] d = java.security.MessageDigest.getInstance("SHA-256").digest(b.toString().getBytes(
                    java.nio.charset.StandardCharsets.UTF_8));
            return java.util.HexFormat.of().formatHex(d, 0, 12);
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

    private static long mm(double metres) {
        return Math.round(metres * 1000);
    }
}
