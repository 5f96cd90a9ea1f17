package org.baywright.report.drawing;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.baywright.io.PlanFiles;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Floor;
import org.baywright.plan.LiveLoadUse;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.plan.RegularPlan;
import org.baywright.run.PlanRun;
import org.baywright.run.RunResult;
import org.baywright.units.Units;

/** Plans and runs the drawing tests draw (invented for the tests). */
final class DrawingSamples {
    private static RunResult small;
    private static RunResult demo;

    private DrawingSamples() {
    }

    static double ft(double v) {
        return Units.FT_.toSi(v);
    }

    static double psf(double v) {
        return Units.PSF.toSi(v);
    }

    /**
     * Two bays (30 ft and 25 ft by 28 ft), two levels, with every state a member can be in on Level 2: girder
     * G-1-AB fixed at W8X10 (overstressed), girder G-2-BC fixed at W24X104 (fixed size, passes), a beam B-stub
     * running off the slab with nothing under its north end (unsupported), a skewed beam B-skew drawn from its
     * south-east end towards the north-west, an opening in bay A–B, a 125 psf area load in bay B–C and a 100 psf one near the skewed beam's south end.
     */
    static Plan smallPlan() {
        Plan base = RegularPlan.generate(new RegularPlan.Spec("Drawing test bay", "us", List.of(ft(30), ft(25)),
                List.of(ft(28)), List.of(ft(14), ft(13)), true, ft(10),
                new LoadValues(psf(56), psf(10), psf(50), 0, 0, psf(15)), new LoadValues(psf(56), psf(15), 0, psf(20), 0, 0),
                LoadValues.ZERO));
        Floor typical = base.floor("typical").orElseThrow();
        List<Member> members = new ArrayList<>();
        for (Member m : typical.members()) {
            if (m.id().equals("G-1-AB")) {
                members.add(new Member(m.id(), m.kind(), m.start(), m.end(), Optional.of("W8X10")));
            } else if (m.id().equals("G-2-BC")) {
                members.add(new Member(m.id(), m.kind(), m.start(), m.end(), Optional.of("W24X104")));
            } else {
                members.add(m);
            }
        }
        members.add(new Member("B-stub", MemberKind.BEAM, new Point(ft(45), ft(28)), new Point(ft(45), ft(34)),
                Optional.empty()));
        // drawn from its south-east end towards the north-west: its label must still read from the left
        members.add(new Member("B-skew", MemberKind.BEAM, new Point(ft(18), ft(0)), new Point(ft(12), ft(28)),
                Optional.empty()));
        List<AreaLoad> loads = new ArrayList<>(typical.areaLoads());
        loads.add(new AreaLoad("AL-plant", Polygon.rectangle(ft(35), ft(4), ft(52), ft(14)),
                new LoadValues(psf(56), psf(10), psf(125), 0, 0, 0), LiveLoadUse.ORDINARY));
        // loads the skewed beam's south end more than its north end
        loads.add(new AreaLoad("AL-files", Polygon.rectangle(ft(13), ft(1), ft(23), ft(7)),
                new LoadValues(0, 0, psf(100), 0, 0, 0), LiveLoadUse.ORDINARY));
        Floor level2 = new Floor("typical", "Typical floor", false, typical.slabEdge(), typical.decks(), members,
                typical.infills(), List.of(new Opening("OP-stair", Polygon.rectangle(ft(1.5), ft(16), ft(8.5), ft(25)))), loads,
                typical.lineLoads(), typical.pointLoads());
        List<Floor> floors = new ArrayList<>();
        for (Floor f : base.floors()) {
            floors.add(f.id().equals("typical") ? level2 : f);
        }
        return new Plan(base.name(), base.units(), base.settings(), base.grid(), base.levels(), floors, base.columns());
    }

    /** The small plan's run, with a fixed version string so that drawings do not depend on the build. */
    static synchronized RunResult small() {
        if (small == null) {
            RunResult r = PlanRun.run(smallPlan());
            small = new RunResult(r.plan(), r.takedown(), r.validation(), r.catalogName(), "0.0-test", 0);
        }
        return small;
    }

    /** The demo plan's run (plans/harbourview-offices.bay.json). */
    static synchronized RunResult demo() {
        if (demo == null) {
            Plan p = PlanFiles.read(Path.of("plans/harbourview-offices.bay.json")).plan().orElseThrow();
            RunResult r = PlanRun.run(p);
            demo = new RunResult(r.plan(), r.takedown(), r.validation(), r.catalogName(), "0.0-test", 0);
        }
        return demo;
    }
}
