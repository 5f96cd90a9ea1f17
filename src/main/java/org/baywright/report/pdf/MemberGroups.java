package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.design.BeamLoads;
import org.baywright.load.LoadCase;
import org.baywright.plan.Level;
import org.baywright.run.RunResult;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;

/**
 * Groups the designed members of each floor layout that would print the same calculation sheet:
 * same kind, status and section, same span, same design criteria (method, steel, bracing, deflection
 * limits), the same service loads case by case, the same live-load reduction and the same end
 * reactions; composite members only with composite members of the same studs and camber. Numbers are
 * compared to one part in 10⁹, far below the four significant figures a sheet
 * prints. Each group keeps its members in design order; groups come in the order of their first member.
 */
final class MemberGroups {
    /** Values this close to zero are equal whatever the relative tolerance says (two zeros, or 0 and -0). */
    private static final double ZERO = 1e-12;

    private static final double TOLERANCE = 1e-9;

    /**
     * Members printed on one sheet.
     *
     * @param floor the floor layout id
     * @param members at least one; the first is the one whose numbers are printed
     */
    record Group(String floor, List<MemberResult> members) {
        MemberResult first() {
            return members.get(0);
        }

        List<String> ids() {
            return members.stream().map(MemberResult::id).toList();
        }
    }

    private MemberGroups() {
    }

    /** Floor layout ids in the order of the levels that use them (bottom first), then any others. */
    static List<String> floorOrder(RunResult run) {
        Set<String> out = new LinkedHashSet<>();
        TakedownResult t = run.takedown();
        for (Level lv : run.plan().levels()) {
            String f = t.levelFloors().get(lv.name());
            if (f != null) {
                out.add(f);
            }
        }
        out.addAll(t.members().keySet());
        return new ArrayList<>(out);
    }

    /** The names of the levels that use a floor layout, bottom first. */
    static List<String> levelsOf(RunResult run, String floor) {
        List<String> out = new ArrayList<>();
        for (Level lv : run.plan().levels()) {
            if (floor.equals(run.takedown().levelFloors().get(lv.name()))) {
                out.add(lv.name());
            }
        }
        return out;
    }

    /** True when the member has a design, a section and loads to print a sheet from. */
    static boolean designed(MemberResult m) {
        return m.design() != null && m.design().section() != null && m.loads() != null && m.criteria() != null;
    }

    /** The groups of one floor layout's designed members. */
    static List<Group> of(String floor, List<MemberResult> members) {
        List<List<MemberResult>> groups = new ArrayList<>();
        for (MemberResult m : members) {
            if (!designed(m)) {
                continue;
            }
            List<MemberResult> home = null;
            for (List<MemberResult> g : groups) {
                if (same(g.get(0), m)) {
                    home = g;
                    break;
                }
            }
            if (home == null) {
                home = new ArrayList<>();
                groups.add(home);
            }
            home.add(m);
        }
        return groups.stream().map(g -> new Group(floor, List.copyOf(g))).toList();
    }

    static boolean same(MemberResult a, MemberResult b) {
        return a.kind() == b.kind() && a.status() == b.status() && a.section().equals(b.section())
                && near(a.length(), b.length()) && a.criteria().equals(b.criteria())
                && near(a.kll(), b.kll()) && near(a.liveFactor(), b.liveFactor()) && near(a.roofLiveFactor(), b.roofLiveFactor())
                && near(a.tributaryArea(), b.tributaryArea()) && near(a.reductionArea(), b.reductionArea())
                && near(a.startReaction(), b.startReaction()) && near(a.endReaction(), b.endReaction())
                && sameLoads(a.loads(), b.loads()) && sameComposite(a, b);
    }

    /**
     * Both bare steel, or both composite with the same studs, camber, deck, ribs, shoring and effective
     * widths (their sections already equal); a member and its mirror image (b_eff sides swapped) share.
     */
    static boolean sameComposite(MemberResult a, MemberResult b) {
        if (a.isComposite() != b.isComposite()) {
            return false;
        }
        if (!a.isComposite()) {
            return true;
        }
        var x = a.composite();
        var y = b.composite();
        return x.studs() == y.studs() && near(x.camber(), y.camber()) && x.shored() == y.shored() && x.ribs().equals(y.ribs())
                && x.deck().equals(y.deck()) && near(x.design().beff(), y.design().beff())
                // mirror images (the slab edge on the other side) print the same sheet
                && near(Math.min(x.design().beffLeft(), x.design().beffRight()), Math.min(y.design().beffLeft(), y.design().beffRight()));
    }

    static boolean sameLoads(BeamLoads a, BeamLoads b) {
        if (!near(a.span(), b.span()) || !near(a.supportA(), b.supportA()) || !near(a.supportB(), b.supportB())) {
            return false; // an overhanging member groups only with one on the same supports
        }
        if (a.separateDeflectionLoads() != b.separateDeflectionLoads()) {
            return false;
        }
        for (LoadCase c : LoadCase.values()) {
            if (!sameList(canonical(a.of(c).loads()), canonical(b.of(c).loads()))
                    || !sameList(canonical(a.forDeflection(c).loads()), canonical(b.forDeflection(c).loads()))) {
                return false;
            }
        }
        return true;
    }

    private static boolean sameList(List<double[]> x, List<double[]> y) {
        if (x.size() != y.size()) {
            return false;
        }
        for (int i = 0; i < x.size(); i++) {
            if (!near(x.get(i), y.get(i))) {
                return false;
            }
        }
        return true;
    }

    /** The non-zero loads as number tuples in a fixed order: point loads, then line loads, by position. */
    private static List<double[]> canonical(List<SpanLoad> loads) {
        List<double[]> out = new ArrayList<>();
        for (SpanLoad l : loads) {
            if (l instanceof PointLoad p && p.force() != 0) {
                out.add(new double[] {0, p.position(), p.position(), p.force(), p.force()});
            } else if (l instanceof DistributedLoad d && (d.wStart() != 0 || d.wEnd() != 0)) {
                out.add(new double[] {1, d.start(), d.end(), d.wStart(), d.wEnd()});
            }
        }
        out.sort(Comparator.<double[]>comparingDouble(v -> v[0]).thenComparingDouble(v -> v[1])
                .thenComparingDouble(v -> v[2]).thenComparingDouble(v -> v[3]).thenComparingDouble(v -> v[4]));
        return out;
    }

    private static boolean near(double a, double b) {
        if (Double.isNaN(a) || Double.isNaN(b)) {
            return Double.isNaN(a) && Double.isNaN(b);
        }
        return Math.abs(a - b) <= TOLERANCE * Math.max(Math.abs(a), Math.abs(b)) + ZERO;
    }

    private static boolean near(double[] a, double[] b) {
        if (a == null || b == null) {
            return a == b;
        }
        if (a.length != b.length) {
            return false;
        }
        double scale = 0;
        for (int i = 0; i < a.length; i++) {
            scale = Math.max(scale, Math.max(Math.abs(a[i]), Math.abs(b[i])));
        }
        for (int i = 0; i < a.length; i++) {
            if (Math.abs(a[i] - b[i]) > TOLERANCE * scale + ZERO) {
                return false;
            }
        }
        return true;
    }
}
