package org.baywright.takedown;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.baywright.analysis.SpanLoad;
import org.baywright.load.LiveLoadReduction;
import org.baywright.load.LoadCase;

/**
 * The live-load reduction of one member by its own A_T and K_LL (ASCE 7-16 §4.7; roof live load §4.8).
 *
 * @param area A_T, m²
 * @param kll the live-load element factor (Table 4.7-1)
 * @param factor the reduction factor per {@link Component} ordinal (1 = none)
 */
record MemberReduction(double area, double kll, double[] factor) {

    /** The factors for a member's loads; all 1 when reduction is off. */
    static MemberReduction of(MemberLoads loads, double area, double kll, boolean reduce) {
        double[] factor = new double[Component.values().length];
        Arrays.fill(factor, 1.0);
        if (reduce) {
            double[] l0 = loads.l0();
            for (Component c : Component.values()) {
                if (c.isLive() && !loads.byComponent().get(c.ordinal()).isEmpty()) {
                    factor[c.ordinal()] = LiveLoadReduction.floor(Math.max(l0[c.ordinal()], 1e-9), kll, area, 1,
                            c.reducibleUse(), null).factor();
                }
            }
            if (!loads.byComponent().get(Component.LR.ordinal()).isEmpty()) {
                factor[Component.LR.ordinal()] = LiveLoadReduction.roof(Math.max(l0[Component.LR.ordinal()], 1e-9), area, 0,
                        null).factor();
            }
        }
        return new MemberReduction(area, kll, factor);
    }

    /** The same member with nothing reduced (every factor 1). */
    static MemberReduction none(MemberReduction r) {
        double[] one = new double[r.factor.length];
        Arrays.fill(one, 1.0);
        return new MemberReduction(r.area, r.kll, one);
    }

    /** The member's service loads by load case, each component scaled by its factor. */
    Map<LoadCase, List<SpanLoad>> apply(MemberLoads loads) {
        return apply(loads, false);
    }

    /**
     * The loads of the finished floor acting on a composite section: as {@link #apply(MemberLoads)} without the
     * dead load in place before the concrete hardens ({@link Component#D_WET}), which an unshored member
     * carries on the bare steel.
     */
    Map<LoadCase, List<SpanLoad>> applyComposite(MemberLoads loads) {
        return apply(loads, true);
    }

    private Map<LoadCase, List<SpanLoad>> apply(MemberLoads loads, boolean withoutWet) {
        Map<LoadCase, List<SpanLoad>> caseLoads = new EnumMap<>(LoadCase.class);
        for (Component c : Component.values()) {
            if (c.loadCase() == null || withoutWet && c == Component.D_WET) {
                continue;
            }
            List<SpanLoad> list = caseLoads.computeIfAbsent(c.loadCase(), k -> new ArrayList<>());
            double f = factor[c.ordinal()];
            for (SpanLoad l : loads.byComponent().get(c.ordinal())) {
                list.add(f == 1.0 ? l : l.scaled(f));
            }
        }
        return caseLoads;
    }

    /** The factor of ordinary floor live load. */
    double ordinaryLive() {
        return factor[Component.L_ORDINARY.ordinal()];
    }

    /** The factor of roof live load (§4.8.2). */
    double roofLive() {
        return factor[Component.LR.ordinal()];
    }
}
