package org.baywright.takedown;

import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;

/** Service load values split into the components the takedown carries ({@link Component}). */
final class ServiceLoads {
    private ServiceLoads() {
    }

    /**
     * Splits load values into components, the partition allowance into D or the live component; records
     * the largest live intensity per component in {@code l0} (may be null).
     */
    static double[] split(LoadValues v, LiveLoadUse use, boolean partitionAsDead, double[] l0) {
        double[] q = new double[Component.values().length];
        double partition = partitionAsDead ? 0 : v.partition();
        q[Component.D.ordinal()] = v.dead() + v.superimposed() + (partitionAsDead ? v.partition() : 0);
        double live = v.live() + partition;
        Component lc = switch (use) {
            case GARAGE -> Component.L_GARAGE;
            case NOT_REDUCIBLE -> Component.L_FIXED;
            case ASSEMBLY -> live > Takedown.HEAVY_LIVE ? Component.L_HEAVY : Component.L_ASSEMBLY;
            case ORDINARY -> live > Takedown.HEAVY_LIVE ? Component.L_HEAVY : Component.L_ORDINARY;
        };
        q[lc.ordinal()] = live;
        q[Component.LR.ordinal()] = v.roofLive();
        q[Component.S.ordinal()] = v.snow();
        if (l0 != null) {
            l0[lc.ordinal()] = Math.max(l0[lc.ordinal()], live);
            l0[Component.LR.ordinal()] = Math.max(l0[Component.LR.ordinal()], v.roofLive());
        }
        return q;
    }
}
