package org.baywright.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.baywright.design.dg11.VibrationResult;
import org.baywright.design.dg11.VibrationStatus;
import org.baywright.plan.Level;
import org.baywright.run.RunResult;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayChecks;
import org.baywright.takedown.BayResult;
import org.baywright.units.UnitSystem;

/**
 * The floor-vibration check of a run's bays (AISC DG11 2nd ed., walking) for the design JSON ({@code bays[]}) and
 * the summary's one line. Both appear only when the run checked bays, i.e. some floor of the plan describes a
 * slab, so the output of older plans does not change.
 */
public final class BaySummary {
    private BaySummary() {
    }

    /** True when the run has bays to show. */
    public static boolean present(RunResult run) {
        return !run.bays().isEmpty();
    }

    /** Every bay at every level using its layout: levels bottom first, bays in layout order. */
    public static List<Object> json(RunResult run, UnitSystem us) {
        List<Object> out = new ArrayList<>();
        for (Level lv : run.plan().levels()) {
            for (BayResult b : run.bays()) {
                if (b.levels().contains(lv.name())) {
                    out.add(bay(b, lv.name(), us));
                }
            }
        }
        return out;
    }

    /** One bay at one level as a JSON object (SI values in the output's units; a_p/g, a_o/g as fractions of g). */
    public static Map<String, Object> bay(BayResult r, String level, UnitSystem us) {
        Bay bay = r.bay();
        Map<String, Object> j = new LinkedHashMap<>();
        j.put("id", bay.id());
        j.put("level", level);
        j.put("floor", bay.floor());
        j.put("members", bay.members());
        j.put("beams", bay.beams());
        j.put("beam", bay.beam());
        j.put("girder", r.girder());
        j.put("status", r.status());
        j.put("note", r.note().isEmpty() ? null : r.note());
        VibrationResult v = r.result();
        j.put("fn", v == null ? null : v.fn());
        j.put("apg", v == null ? null : v.apg());
        j.put("limit", v == null ? null : v.limit());
        j.put("ratio", v == null ? null : v.ratio());
        j.put("belowThreeHz", v == null ? null : v.belowThreeHz());
        j.put("beamSpan", us.length().fromSi(bay.beamSpan()));
        j.put("spacing", us.length().fromSi(bay.spacing()));
        Optional<Bay.BayGirder> g = bay.girders().stream().filter(x -> x.id().equals(r.girder())).findFirst();
        j.put("girderSpan", g.map(x -> us.length().fromSi(x.span())).orElse(null));
        j.put("floorWidth", finite(us.length().fromSi(bay.floorWidth())));
        j.put("floorLength", finite(us.length().fromSi(bay.floorLength())));
        j.put("edge", bay.edge());
        if (v != null) {
            BayChecks.Inputs in = r.inputs();
            j.put("beamContinuous", in.vibration().beam().continuous());
            j.put("girderContinuous", in.vibration().girder().continuous());
            j.put("damping", in.vibration().beta());
            j.put("areaWeight", us.areaLoad().fromSi(in.areaWeight()));
            j.put("beamWeight", us.lineLoad().fromSi(in.vibration().beam().weight()));
            j.put("girderWeight", us.lineLoad().fromSi(in.vibration().girder().weight()));
            j.put("dj", us.smallLength().fromSi(v.dj()));
            j.put("dg", us.smallLength().fromSi(v.dg()));
            j.put("dgReduced", us.smallLength().fromSi(v.dgReduced()));
            j.put("fj", v.fj());
            j.put("fg", v.fg());
            j.put("bj", us.length().fromSi(v.bj()));
            j.put("bg", us.length().fromSi(v.bg()));
            j.put("wj", us.force().fromSi(v.wj()));
            j.put("wg", us.force().fromSi(v.wg()));
            j.put("w", us.force().fromSi(v.w()));
        }
        return j;
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /** The worst bay checked by the low-frequency method (highest ratio), if any. */
    public static Optional<BayResult> worst(List<BayResult> bays) {
        return bays.stream().filter(b -> b.checked() && b.result().status() != VibrationStatus.OUTSIDE_METHOD)
                .max(Comparator.comparingDouble(BayResult::ratio));
    }

    /** One line for the summary: how many bays meet the limit and the worst of them. */
    public static String line(RunResult run) {
        List<BayResult> bays = run.bays();
        int meets = 0;
        int exceeds = 0;
        int outside = 0;
        int unchecked = 0;
        int total = 0;
        for (BayResult b : bays) {
            int k = b.levels().size(); // a bay of a typical floor at each level using it, as bays[] lists them
            total += k;
            if (!b.checked()) {
                unchecked += k;
            } else if (b.result().status() == VibrationStatus.MEETS) {
                meets += k;
            } else if (b.result().status() == VibrationStatus.EXCEEDS) {
                exceeds += k;
            } else {
                outside += k;
            }
        }
        StringBuilder s = new StringBuilder("Floor vibration (AISC DG11 walking): ");
        List<String> parts = new ArrayList<>();
        if (meets > 0) {
            parts.add(meets + " meet");
        }
        if (exceeds > 0) {
            parts.add(exceeds + (exceeds == 1 ? " exceeds" : " exceed"));
        }
        if (outside > 0) {
            parts.add(outside + " above 9 Hz (outside the method)");
        }
        if (unchecked > 0) {
            parts.add(unchecked + " not checked");
        }
        s.append(total).append(total == 1 ? " bay: " : " bays: ").append(String.join(", ", parts));
        Optional<BayResult> w = worst(bays);
        if (w.isPresent()) {
            BayResult b = w.get();
            VibrationResult v = b.result();
            s.append(String.format(Locale.ROOT, "; worst %s (%s): f_n = %.2f Hz, a_p/g = %.3f %% %s %.2f %% (ratio %.2f)%s",
                    b.bay().id(), String.join(", ", b.levels()), v.fn(), v.apg() * 100, v.apg() <= v.limit() ? "≤" : ">",
                    v.limit() * 100, v.ratio(), v.belowThreeHz() ? ", below 3 Hz" : ""));
        }
        return s.toString();
    }

    /** The members stiffened for walking vibration, one object per change (bay, levels, members, from, to, ratios). */
    public static List<Object> changes(RunResult run) {
        List<Object> out = new ArrayList<>();
        for (org.baywright.run.VibrationSizing.Change c : run.sizedForVibration()) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("bay", c.bay());
            o.put("levels", c.levels());
            o.put("members", c.members());
            o.put("from", c.from());
            o.put("to", c.to());
            o.put("ratioBefore", c.ratioBefore());
            o.put("ratioEstimated", c.ratioAfter());
            out.add(o);
        }
        return out;
    }

    /** One line per change: "Sized for vibration: bay B-C/3-4 (Level 3, Level 4): beams … W16X31 → W18X35 (ratio 1.42 → 0.97)". */
    public static List<String> changeLines(RunResult run) {
        List<String> out = new ArrayList<>();
        for (org.baywright.run.VibrationSizing.Change c : run.sizedForVibration()) {
            out.add(String.format(java.util.Locale.ROOT, "Sized for vibration: bay %s (%s): %s %s → %s (ratio %.2f → %.2f)", c.bay(),
                    String.join(", ", c.levels()), String.join(", ", c.members()), c.from(), c.to(), c.ratioBefore(), c.ratioAfter()));
        }
        return out;
    }
}
