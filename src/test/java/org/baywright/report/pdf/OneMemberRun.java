package org.baywright.report.pdf;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.SpanLoad;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.design.BeamCriteria;
import org.baywright.design.BeamDesign;
import org.baywright.design.BeamDesigner;
import org.baywright.design.BeamLoads;
import org.baywright.load.LoadCase;
import org.baywright.plan.Deck;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.run.RunResult;
import org.baywright.takedown.Component;
import org.baywright.takedown.MemberResult;
import org.baywright.takedown.TakedownResult;
import org.baywright.units.Units;

/**
 * A run of one simply supported beam designed with the design package directly: a 35 ft W18X50 with a
 * uniform dead load of 0.45 klf (which includes its own weight, so the check adds none) and a live load
 * of 0.75 klf, continuously braced, LRFD, A992. These are the data of AISC Design Examples V15.1,
 * Example F.1-1 (FOUND).
 */
final class OneMemberRun {
    static final Catalog CATALOG = CatalogFile.loadDefault();

    private OneMemberRun() {
    }

    static MemberResult member(String id, double spanFt, double deadKlf, double liveKlf, String section) {
        double span = Units.FT_.toSi(spanFt);
        BeamLoads loads = BeamLoads.of(span, Map.<LoadCase, List<? extends SpanLoad>>of(
                LoadCase.D, List.of(DistributedLoad.full(span, Units.KLF.toSi(deadKlf))),
                LoadCase.L, List.of(DistributedLoad.full(span, Units.KLF.toSi(liveKlf)))));
        BeamCriteria criteria = BeamCriteria.defaults().withSelfWeight(false);
        BeamDesign design = new BeamDesigner(loads, criteria).checkFixed(CATALOG.find(section).orElseThrow());
        double[] r = new double[Component.values().length];
        r[Component.D.ordinal()] = Units.KLF.toSi(deadKlf) * span / 2;
        r[Component.L_ORDINARY.ordinal()] = Units.KLF.toSi(liveKlf) * span / 2;
        return new MemberResult(id, "f1", MemberKind.BEAM, new Point(0, 0), new Point(span, 0), span, design.status(), design,
                0, 0, 2, 1, 1, r.clone(), r.clone(), "column C-1", "column C-2", List.of(), loads, criteria);
    }

    static RunResult run(List<MemberResult> members) {
        double span = members.get(0).length();
        Polygon slab = Polygon.rectangle(0, -1, span, 1);
        Floor floor = new Floor("f1", "Example floor", false, slab, List.of(new Deck("DK-1", slab, 90)),
                members.stream().map(m -> new Member(m.id(), m.kind(), m.start(), m.end(), Optional.of(m.section()))).toList(),
                List.of(), List.of(), List.of(), List.of(), List.of());
        Plan plan = new Plan("Example F.1 beam", "us", DesignSettings.defaults(), List.of(),
                List.of(new Level("Level 2", Units.FT_.toSi(14), Units.FT_.toSi(14), "f1")), List.of(floor), List.of());
        TakedownResult t = new TakedownResult(Map.of("f1", members), Map.of("Level 2", "f1"), List.of(), List.of(), List.of(),
                2 * span);
        return new RunResult(plan, t, List.of(), CATALOG.name(), "test build", 0);
    }
}
