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
     *
     * <p>Roof live load of a load with a use other than {@link LiveLoadUse#ORDINARY} is the load of a
     * roof used for assembly, as a garden or for another occupancy (ASCE 7-16 §4.8.3): it is occupancy
     * live load, carried with the floor live load of that use and reduced by §4.7 (so an assembly roof
     * of 100 psf or less is not reduced, §4.7.5), never by R1·R2 of §4.8.2. See {@link #isSpecialRoof}.
     */
    static double[] split(LoadValues v, LiveLoadUse use, boolean partitionAsDead, double[] l0) {
        double[] q = new double[Component.values().length];
        double partition = partitionAsDead ? 0 : v.partition();
        q[Component.D.ordinal()] = v.dead() + v.superimposed() + (partitionAsDead ? v.partition() : 0);
        boolean special = isSpecialRoof(use);
        double roofLive = special ? 0 : v.roofLive();
        double live = v.live() + partition + (special ? v.roofLive() : 0);
        Component lc = switch (use) {
            case GARAGE -> Component.L_GARAGE;
            case NOT_REDUCIBLE -> Component.L_FIXED;
            case ASSEMBLY -> live > Takedown.HEAVY_LIVE ? Component.L_HEAVY : Component.L_ASSEMBLY;
            case ORDINARY -> live > Takedown.HEAVY_LIVE ? Component.L_HEAVY : Component.L_ORDINARY;
            case STORAGE_LIGHT, STORAGE_HEAVY -> Component.L_HEAVY;
        };
        q[lc.ordinal()] = live;
        q[Component.LR.ordinal()] = roofLive;
        q[Component.S.ordinal()] = v.snow();
        if (l0 != null) {
            l0[lc.ordinal()] = Math.max(l0[lc.ordinal()], live);
            l0[Component.LR.ordinal()] = Math.max(l0[Component.LR.ordinal()], roofLive);
        }
        return q;
    }

    /**
     * Splits the values of a line or point load into components. ASCE 7-16 §4.7.1 permits reducing only the
     * uniformly distributed live loads of Table 4.3-1, and §4.8.1 only uniformly distributed roof live loads,
     * so the live load (with any partition allowance carried as live) of a line or point load is never
     * reduced ({@link Component#L_CONCENTRATED}), nor its roof live load ({@link Component#LR_CONCENTRATED}).
     */
    static double[] concentrated(LoadValues v, boolean partitionAsDead) {
        double[] q = new double[Component.values().length];
        q[Component.D.ordinal()] = v.dead() + v.superimposed() + (partitionAsDead ? v.partition() : 0);
        q[Component.L_CONCENTRATED.ordinal()] = v.live() + (partitionAsDead ? 0 : v.partition());
        q[Component.LR_CONCENTRATED.ordinal()] = v.roofLive();
        q[Component.S.ordinal()] = v.snow();
        return q;
    }

    /**
     * ASCE 7-16 §4.8.3: true when roof live load with this use is that of a special-purpose roof
     * (assembly, garage, or excluded from reduction by the user) and so is reduced as floor live load
     * by §4.7; false for ordinary roof live load, reduced by §4.8.2.
     */
    static boolean isSpecialRoof(LiveLoadUse use) {
        return use != LiveLoadUse.ORDINARY;
    }
}
