package org.baywright.run;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.Section;
import org.baywright.design.SearchFilter;
import org.baywright.design.dg11.VibrationStatus;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.takedown.Bay;
import org.baywright.takedown.BayChecks;
import org.baywright.takedown.BayResult;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;

/**
 * Sizing for walking vibration (AISC Design Guide 11, 2nd ed.) on floors whose setting asks for it: for each bay
 * that exceeds its limit, the beams of the bay (all of them, to one section) or its girders (those the check uses)
 * are stiffened to the lightest section of larger I_x that makes the bay meet the limit, whichever adds the less
 * steel weight; where neither does alone, the change that lowers the ratio most per unit of steel added. Only the
 * lightest section for its I_x is tried (a search given a least I_x chooses no other). The run then designs the
 * floor again with those moments of inertia as the least its members may have (their strength, studs and
 * reactions follow), and checks the bays again, until they meet, no change lowers the ratio, or
 * {@link #MAX_ROUNDS} rounds have passed.
 */
public final class VibrationSizing {
    /** The most rounds of stiffening and redesign. */
    static final int MAX_ROUNDS = 8;
    /** The most candidate sections tried for one change. */
    private static final int MAX_CANDIDATES = 60;

    /**
     * A change made for vibration.
     *
     * @param floor the result key of the floor layout
     * @param bay the bay's id
     * @param levels the levels using the layout
     * @param members the members stiffened
     * @param from their section before (the bay's check member's)
     * @param to the section they take
     * @param ratioBefore the bay's ratio before
     * @param ratioAfter the ratio the change gives the bay (as estimated before the floor is designed again)
     */
    public record Change(String floor, String bay, List<String> levels, List<String> members, String from, String to, double ratioBefore,
            double ratioAfter) {
    }

    private VibrationSizing() {
    }

    /** True when some floor of the plan is sized for vibration. */
    static boolean wanted(Plan plan) {
        return plan.floors().stream().anyMatch(f -> f.composite().sizeForVibration() && f.hasSlab() && !f.roof());
    }

    /**
     * The changes for this round, added to {@code least} (result key → member id → least section); empty when no
     * bay of a floor sized for vibration exceeds its limit or none can be stiffened further.
     */
    static List<Change> stiffen(Plan plan, TakedownResult t, List<BayResult> bays, DesignBasis basis,
            Map<String, Map<String, String>> least, java.util.Set<String> refused) {
        List<Change> out = new ArrayList<>();
        Catalog catalog = basis.catalog();
        // a member that did not take the section it was given (none of that stiffness passes its own checks) is
        // not stiffened again: its bay is tried with the other change
        for (Map.Entry<String, Map<String, String>> e : least.entrySet()) {
            Map<String, MemberResult> byId = new HashMap<>();
            for (MemberResult m : t.members().getOrDefault(e.getKey(), List.of())) {
                byId.put(m.id(), m);
            }
            e.getValue().entrySet().removeIf(x -> {
                MemberResult m = byId.get(x.getKey());
                Section s = catalog.find(x.getValue()).orElse(null);
                boolean missed = m == null || m.design() == null || m.design().section() == null || s == null
                        || m.design().section().props().ix() < s.props().ix() * (1 - 1e-12);
                if (missed) {
                    refused.add(e.getKey() + "|" + x.getKey());
                }
                return missed;
            });
        }
        for (BayResult b : bays) {
            if (!b.checked() || b.result().status() != VibrationStatus.EXCEEDS) {
                continue;
            }
            Floor floor = floorOf(plan, b);
            if (floor == null || !floor.composite().sizeForVibration()) {
                continue;
            }
            Bay bay = b.bay();
            Map<String, MemberResult> members = new HashMap<>();
            for (MemberResult m : t.members().getOrDefault(bay.floor(), List.of())) {
                members.put(m.id(), m);
            }
            boolean beamsRefused = bay.beams().stream().anyMatch(id -> refused.contains(bay.floor() + "|" + id));
            boolean girdersRefused = bay.girders().stream().anyMatch(g -> refused.contains(bay.floor() + "|" + g.id()));
            Option beams = beamsRefused ? null : beams(floor, b, catalog, filterOf(members, bay.beams(), basis), members);
            Option girder = girdersRefused ? null : girder(floor, b, catalog, filterOf(members,
                    bay.girders().stream().map(Bay.BayGirder::id).toList(), basis), members);
            Option pick = better(beams, girder, b.ratio());
            if (pick == null) {
                continue;
            }
            Map<String, String> floorLeast = least.computeIfAbsent(bay.floor(), k -> new LinkedHashMap<>());
            List<String> changed = new ArrayList<>();
            for (String id : pick.members) {
                MemberResult m = members.get(id);
                if (m != null && m.design() != null && m.design().section() != null
                        && m.design().section().props().ix() < pick.section.props().ix()) {
                    floorLeast.put(id, pick.section.designation());
                    changed.add(id);
                }
            }
            if (!changed.isEmpty()) {
                out.add(new Change(bay.floor(), bay.id(), b.levels(), changed, pick.from, pick.section.designation(), b.ratio(),
                        pick.ratio));
            }
        }
        return out;
    }

    /** The search filter of the members stiffened together: the girders' when any is a girder, else the beams'. */
    private static SearchFilter filterOf(Map<String, MemberResult> members, List<String> ids, DesignBasis basis) {
        boolean girder = ids.stream().map(members::get).anyMatch(m -> m != null && m.kind() == org.baywright.plan.MemberKind.GIRDER);
        return girder ? basis.girders() : basis.beams();
    }

    /** One way of stiffening a bay: the members, the section they take, the bay's ratio then, the steel added. */
    private record Option(List<String> members, String from, Section section, double ratio, double added) {
        boolean meets() {
            return ratio <= 1;
        }
    }

    /**
     * Of two options, the one that meets the limit with less steel; else the one that lowers the ratio more per
     * unit of steel added.
     */
    private static Option better(Option a, Option b, double now) {
        if (a == null || b == null) {
            return a == null ? b : a;
        }
        if (a.meets() != b.meets()) {
            return a.meets() ? a : b;
        }
        if (a.meets()) {
            return a.added <= b.added ? a : b;
        }
        return gain(a, now) >= gain(b, now) ? a : b;
    }

    /** Ratio lowered per newton of steel added. */
    private static double gain(Option o, double now) {
        return (now - o.ratio) / Math.max(o.added, 1e-9);
    }

    /**
     * The sections a search would choose for a least moment of inertia: allowed by {@code filter}, stiffer than
     * {@code than}, each stiffer than every lighter one (the lightest section for its I_x), lightest first.
     */
    private static List<Section> stiffer(Catalog catalog, SearchFilter filter, Section than) {
        List<Section> out = new ArrayList<>();
        double ix = than.props().ix() * (1 + 1e-9);
        for (Section s : catalog.sections()) {
            if (filter.allows(s) && s.props().ix() > ix) {
                out.add(s);
                ix = s.props().ix();
                if (out.size() >= MAX_CANDIDATES) {
                    break;
                }
            }
        }
        return out;
    }

    /**
     * All the bay's beams to the lightest section of larger I_x that makes the bay meet; where none does, the one
     * that lowers the ratio most per unit of steel (null when none lowers it).
     */
    private static Option beams(Floor floor, BayResult b, Catalog catalog, SearchFilter filter, Map<String, MemberResult> members) {
        Bay bay = b.bay();
        Section now = bay.beamSection();
        Option best = null;
        for (Section s : stiffer(catalog, filter, now)) {
            Bay stiffer = new Bay(bay.id(), bay.floor(), bay.beams(), bay.beam(), s, bay.beamSpan(), bay.spacing(),
                    bay.beamAdjacentSpan(), bay.girders(), bay.centre(), bay.beamAngle(), bay.width(), bay.floorWidth(),
                    bay.floorLength(), bay.edge());
            BayResult r = BayChecks.check(floor, stiffer, b.levels(), b.settings());
            if (!r.checked() || !(r.ratio() < b.ratio() - 1e-6)) {
                continue;
            }
            double added = 0;
            for (String id : bay.beams()) {
                MemberResult m = members.get(id);
                if (m != null && m.design() != null && m.design().section() != null) {
                    added += Math.max(0, s.weight() - m.design().section().weight()) * m.length();
                }
            }
            Option o = new Option(bay.beams(), now.designation(), s, r.ratio(), added);
            if (o.meets()) {
                return o;
            }
            best = better(best, o, b.ratio());
        }
        return best;
    }

    /**
     * The bay's girders of the kind the check uses (those with beams on both sides, else all) to the lightest
     * section of larger I_x that makes the bay meet; else as {@link #beams}.
     */
    private static Option girder(Floor floor, BayResult b, Catalog catalog, SearchFilter filter, Map<String, MemberResult> members) {
        Bay bay = b.bay();
        List<Bay.BayGirder> interior = bay.girders().stream().filter(Bay.BayGirder::bothSides).toList();
        List<Bay.BayGirder> used = (interior.isEmpty() ? bay.girders() : interior).stream().filter(x -> x.section() != null).toList();
        Bay.BayGirder g = used.stream().filter(x -> x.id().equals(b.girder())).findFirst().orElse(null);
        if (g == null) {
            return null;
        }
        List<String> ids = used.stream().map(Bay.BayGirder::id).toList();
        Option best = null;
        for (Section s : stiffer(catalog, filter, g.section())) {
            List<Bay.BayGirder> girders = new ArrayList<>();
            double added = 0;
            for (Bay.BayGirder x : bay.girders()) {
                if (ids.contains(x.id()) && x.section().props().ix() < s.props().ix()) {
                    girders.add(new Bay.BayGirder(x.id(), s, x.span(), x.carriedWidth(), x.adjacentSpan(), x.bothSides()));
                    MemberResult m = members.get(x.id());
                    added += m == null ? 0 : Math.max(0, s.weight() - x.section().weight()) * m.length();
                } else {
                    girders.add(x);
                }
            }
            Bay stiffer = new Bay(bay.id(), bay.floor(), bay.beams(), bay.beam(), bay.beamSection(), bay.beamSpan(), bay.spacing(),
                    bay.beamAdjacentSpan(), girders, bay.centre(), bay.beamAngle(), bay.width(), bay.floorWidth(),
                    bay.floorLength(), bay.edge());
            BayResult r = BayChecks.check(floor, stiffer, b.levels(), b.settings());
            if (!r.checked() || !(r.ratio() < b.ratio() - 1e-6)) {
                continue;
            }
            Option o = new Option(ids, g.section().designation(), s, r.ratio(), added);
            if (o.meets()) {
                return o;
            }
            best = better(best, o, b.ratio());
        }
        return best;
    }

    private static Floor floorOf(Plan plan, BayResult b) {
        for (String name : b.levels()) {
            for (Level l : plan.levels()) {
                if (l.name().equals(name)) {
                    return plan.floor(l.floor()).orElse(null);
                }
            }
        }
        return null;
    }
}
