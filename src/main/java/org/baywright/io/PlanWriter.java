package org.baywright.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import org.baywright.io.PlanDocument.AreaLoadDoc;
import org.baywright.io.PlanDocument.BayDoc;
import org.baywright.io.PlanDocument.ColumnDoc;
import org.baywright.io.PlanDocument.DeckDoc;
import org.baywright.io.PlanDocument.DeflectionDoc;
import org.baywright.io.PlanDocument.FloorDoc;
import org.baywright.io.PlanDocument.GridLineDoc;
import org.baywright.io.PlanDocument.InfillDoc;
import org.baywright.io.PlanDocument.LevelDoc;
import org.baywright.io.PlanDocument.LineLoadDoc;
import org.baywright.io.PlanDocument.MemberDoc;
import org.baywright.io.PlanDocument.OpeningDoc;
import org.baywright.io.PlanDocument.PlanDoc;
import org.baywright.io.PlanDocument.PointLoadDoc;
import org.baywright.io.PlanDocument.SettingsDoc;
import org.baywright.plan.AreaLoad;
import org.baywright.plan.Column;
import org.baywright.plan.CompositeFloor;
import org.baywright.plan.CompositeRules;
import org.baywright.plan.Deck;
import org.baywright.plan.Slab;
import org.baywright.plan.StudPlacement;
import org.baywright.plan.VibrationSettings;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.RoofCeiling;
import org.baywright.plan.GridLine;
import org.baywright.plan.Infill;
import org.baywright.plan.Level;
import org.baywright.plan.LineLoad;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.Opening;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.PointLoadItem;
import org.baywright.plan.Polygon;
import org.baywright.units.Unit;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * Turns a {@link Plan} into the document records of its file, writing every quantity in the plan's
 * unit system: US as ft (coordinates, lengths), in (depth limit), psf, klf, kip and ksi; SI as m, mm,
 * kPa, kN/m, kN and MPa. Absent optional values (a fixed section, a zero load) are left out.
 */
final class PlanWriter {
    private final UnitSystem units;

    private PlanWriter(UnitSystem units) {
        this.units = units;
    }

    static PlanDoc document(Plan plan) {
        UnitSystem system = "us".equals(plan.units()) ? UnitSystem.US : "si".equals(plan.units()) ? UnitSystem.SI : null;
        if (system == null) {
            throw new IllegalArgumentException("cannot write plan \"" + plan.name() + "\": its units are \"" + plan.units()
                    + "\"; a plan's units are \"us\" or \"si\"");
        }
        return new PlanWriter(system).plan(plan);
    }

    private PlanDoc plan(Plan p) {
        return new PlanDoc(PlanFiles.FORMAT, PlanFiles.VERSION, p.name(), p.notes().isEmpty() ? null : p.notes(), p.units(),
                settings(p.settings()),
                map(p.grid(), this::gridLine), map(p.levels(), this::level), map(p.floors(), f -> floor(f, p.settings())),
                map(p.columns(), this::column));
    }

    private SettingsDoc settings(DesignSettings s) {
        return new SettingsDoc(s.method().toLowerCase(Locale.ROOT), q(s.fy(), units.stress()),
                new DeflectionDoc(finite(s.liveDeflection()), finite(s.totalDeflection())),
                s.deflectionLiveReduced() ? "reduced" : "unreduced", s.beamSeries(), s.girderSeries(),
                s.columnSeries(), s.maxBeamDepth() == 0 ? null : q(s.maxBeamDepth(), units.smallLength()), s.spliceEvery(),
                s.liveLoadReduction(), s.partitionAsDead() ? "dead" : "live", s.girderAreaDelivered() ? "delivered" : "half-bay",
                s.catalog(), s.connectionEccentricity() == DesignSettings.DEFAULT_CONNECTION_ECCENTRICITY ? null
                        : q(s.connectionEccentricity(), units.smallLength()), compositeRules(s.composite()), vibration(s.vibration()));
    }

    /** The vibration inputs, only when they differ from the defaults (older files read the same). */
    private PlanDocument.VibrationDoc vibration(VibrationSettings v) {
        VibrationSettings d = VibrationSettings.defaults();
        if (v.use() == d.use() && v.fitOut() == null && Double.isNaN(v.damping()) && Double.isNaN(v.live())) {
            return null;
        }
        return new PlanDocument.VibrationDoc(PlanAssembler.useKey(v.use()),
                v.fitOut() == null ? null : PlanAssembler.fitOutKey(v.fitOut()),
                Double.isNaN(v.damping()) ? null : finite(v.damping()), Double.isNaN(v.live()) ? null : q(v.live(), units.areaLoad()));
    }

    /** The composite rules, only when they differ from the defaults (older files read the same). */
    private PlanDocument.CompositeRulesDoc compositeRules(CompositeRules c) {
        if (c.isDefault()) {
            return null;
        }
        CompositeRules d = CompositeRules.DEFAULT;
        return new PlanDocument.CompositeRulesDoc(c.minDegree() == d.minDegree() ? null : finite(c.minDegree()),
                c.studWeight() == d.studWeight() ? null : q(c.studWeight(), units == UnitSystem.US ? Units.LBF : Units.N),
                c.camber() == d.camber() ? null : c.camber(), c.camberShare() == d.camberShare() ? null : finite(c.camberShare()),
                c.camberAllowance() == d.camberAllowance() ? null : q(c.camberAllowance(), units == UnitSystem.US ? Units.LBF : Units.N));
    }

    private GridLineDoc gridLine(GridLine g) {
        String offset = length(g.offset());
        return g.axis() == GridLine.Axis.X ? new GridLineDoc(g.label(), offset, null) : new GridLineDoc(g.label(), null, offset);
    }

    private LevelDoc level(Level l) {
        return new LevelDoc(l.name(), length(l.elevation()), length(l.storeyHeight()), l.floor());
    }

    private FloorDoc floor(Floor f, DesignSettings s) {
        // a roof's ceiling only when the plan sets one (a roof without it reads as the default)
        RoofCeiling ceiling = f.roof() ? s.roofCeilings().get(f.id()) : null;
        return new FloorDoc(f.id(), f.name(), f.roof(), ceiling == null ? null : PlanAssembler.ceilingKey(ceiling),
                compositeFloor(f.composite()), polygon(f.slabEdge()), map(f.decks(), this::deck),
                map(f.members(), this::member), map(f.infills(), this::infill), map(f.openings(), this::opening),
                map(f.areaLoads(), this::areaLoad), map(f.lineLoads(), this::lineLoad), map(f.pointLoads(), this::pointLoad));
    }

    /** A floor's composite setting; left out for a bare-steel floor with the default values (as older files). */
    private PlanDocument.CompositeFloorDoc compositeFloor(CompositeFloor c) {
        if (c.equals(CompositeFloor.NONE)) {
            return null;
        }
        String action = switch (c.mode()) {
            case COMPOSITE -> "composite";
            case NON_COMPOSITE -> "non-composite";
            case PER_MEMBER -> "per-member";
        };
        return new PlanDocument.CompositeFloorDoc(action, c.shored() ? "shored" : "unshored",
                q(c.constructionLive(), units.areaLoad()), c.sizeForVibration() ? "size" : null);
    }

    private DeckDoc deck(Deck d) {
        // the limits are written only when the user gave them, so a plan with the defaults reads as before
        boolean byDefault = d.defaultLimits();
        return new DeckDoc(d.id(), polygon(d.outline()), finite(d.spanAngle()), byDefault ? null : length(d.maxSpan()),
                byDefault ? null : length(d.maxOverhang()), slab(d.slab()));
    }

    private PlanDocument.SlabDoc slab(Slab s) {
        if (s == null) {
            return null;
        }
        Unit small = units.smallLength();
        PlanDocument.StudsDoc studs = new PlanDocument.StudsDoc(q(s.studDiameter(), small), q(s.studFu(), units.stress()),
                s.studsPerRib(), s.studPosition() == StudPlacement.STRONG ? "strong" : "weak");
        return new PlanDocument.SlabDoc(q(s.ribHeight(), small), q(s.ribWidth(), small), q(s.ribPitch(), small),
                q(s.deckWeight(), units.areaLoad()), q(s.topping(), small), q(s.density(), units.unitWeight()),
                q(s.fc(), units.stress()), s.weightGiven() ? q(s.weightOverride(), units.areaLoad()) : null, studs);
    }

    private MemberDoc member(Member m) {
        return new MemberDoc(m.id(), m.kind().name().toLowerCase(Locale.ROOT), point(m.start()), point(m.end()),
                m.fixedSection().orElse(null), m.composite().orElse(null),
                m.fixedStuds().isPresent() ? m.fixedStuds().getAsInt() : null);
    }

    private InfillDoc infill(Infill n) {
        boolean byCount = n.count() > 0;
        return new InfillDoc(n.id(), new BayDoc(List.of(n.x0(), n.x1()), List.of(n.y0(), n.y1())),
                n.direction().name().toLowerCase(Locale.ROOT), byCount ? n.count() : null,
                byCount ? null : length(n.maxSpacing()));
    }

    private OpeningDoc opening(Opening o) {
        return new OpeningDoc(o.id(), polygon(o.outline()));
    }

    private AreaLoadDoc areaLoad(AreaLoad a) {
        String[] v = loads(a.values(), units.areaLoad());
        return new AreaLoadDoc(a.id(), polygon(a.outline()), v[0], v[1], v[2], v[3], v[4], v[5],
                a.use().name().toLowerCase(Locale.ROOT).replace('_', '-'));
    }

    private LineLoadDoc lineLoad(LineLoad l) {
        String[] v = loads(l.values(), units.lineLoad());
        return new LineLoadDoc(l.id(), map(l.path(), this::point), v[0], v[1], v[2], v[3], v[4], v[5]);
    }

    private PointLoadDoc pointLoad(PointLoadItem l) {
        String[] v = loads(l.values(), units.force());
        return new PointLoadDoc(l.id(), point(l.at()), v[0], v[1], v[2], v[3], v[4], v[5]);
    }

    private ColumnDoc column(Column c) {
        return new ColumnDoc(c.id(), point(c.at()), c.grid(), c.topLevel(), c.fixedSection().orElse(null));
    }

    /** The six load values; a zero value is left out of the file. */
    private static String[] loads(LoadValues v, Unit unit) {
        double[] values = {v.dead(), v.superimposed(), v.live(), v.roofLive(), v.snow(), v.partition()};
        String[] out = new String[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = values[i] == 0 ? null : q(values[i], unit);
        }
        return out;
    }

    private List<List<String>> polygon(Polygon p) {
        return map(p.vertices(), this::point);
    }

    private List<String> point(Point p) {
        return List.of(length(p.x()), length(p.y()));
    }

    private String length(double metres) {
        return q(metres, units.length());
    }

    /** A quantity as the file holds it: the number in {@code unit}, then the unit symbol: {@code 30ft}. */
    static String q(double si, Unit unit) {
        return Numbers.format(unit.fromSi(si)) + unit.symbol();
    }

    private static Double finite(double v) {
        Numbers.format(v); // refuses non-finite values
        return v;
    }

    private static <T, R> List<R> map(List<T> list, Function<T, R> f) {
        List<R> out = new ArrayList<>(list.size());
        for (T t : list) {
            out.add(f.apply(t));
        }
        return out;
    }
}
