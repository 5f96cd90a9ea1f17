package org.baywright.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.baywright.calc.Caution;
import org.baywright.io.PlanFiles;
import org.baywright.plan.CompositeMode;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Plan;
import org.baywright.plan.RegularPlan;
import org.baywright.plan.Slab;
import org.baywright.units.Dimension;
import org.baywright.units.Quantities;
import org.baywright.units.UnitParseException;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code baywright new}: write a regular plan, the starting point of a study. */
@Command(name = "new", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Write a regular plan: a grid of bays with columns at every intersection, girders, column-line beams, "
            + "infill beams at a maximum spacing, one deck, area loads, an edge load, and levels of a typical floor "
            + "under a roof.",
            "Lists of lengths: 3@30ft, or 25ft,30ft,30ft (items without spaces)."},
        footer = {"", Caution.TEXT})
public final class NewCommand implements Callable<Integer> {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--bays-x", required = true, paramLabel = "LENGTHS", description = "Bay widths west to east, e.g. 3@30ft.")
    String baysX;

    @Option(names = "--bays-y", required = true, paramLabel = "LENGTHS", description = "Bay depths south to north, e.g. 3@30ft.")
    String baysY;

    @Option(names = "--levels", defaultValue = "1@13ft", paramLabel = "LENGTHS", description = "Storey heights bottom to top; with more than one, the top level is the roof (default ${DEFAULT-VALUE}).")
    String levels;

    @Option(names = "--beams-along", defaultValue = "y", paramLabel = "x|y", description = "Direction the infill beams span (default ${DEFAULT-VALUE}); girders run the other way.")
    String beamsAlong;

    @Option(names = "--beam-spacing", defaultValue = "10ft", paramLabel = "LENGTH", description = "Largest infill beam spacing (default ${DEFAULT-VALUE}).")
    String beamSpacing;

    @Option(names = "--dead", paramLabel = "AREA-LOAD", description = "Dead load of the structure on the floors besides the framing. With the slab described (--composite on or off) the slab's weight is worked out from it and this is any other structural dead load (default 0psf); with --composite none it is the slab and deck (default " + RegularPlan.OFFICE_DEAD + ", common practice). The framing's own weight is added by the run.")
    String dead;

    @Option(names = "--superimposed", defaultValue = RegularPlan.OFFICE_SUPERIMPOSED, paramLabel = "AREA-LOAD", description = "Superimposed dead load: ceiling, services, finishes (default ${DEFAULT-VALUE}, common practice); the roof takes the same.")
    String superimposed;

    @Option(names = "--live", defaultValue = RegularPlan.OFFICE_LIVE, paramLabel = "AREA-LOAD", description = "Floor live load (default ${DEFAULT-VALUE}, offices, ASCE 7-16 Table 4.3-1).")
    String live;

    @Option(names = "--partition", defaultValue = RegularPlan.OFFICE_PARTITION, paramLabel = "AREA-LOAD", description = "Partition allowance on the floors, carried as reducible live load (default ${DEFAULT-VALUE}, ASCE 7-16 §4.3.2 for offices). Less, e.g. 0psf, needs the reason in --notes unless --live is 80 psf or more (§4.3.2 exception).")
    String partition;

    @Option(names = "--roof-dead", paramLabel = "AREA-LOAD", description = "Dead load of the roof's own slab or deck, e.g. 20psf (default: " + RegularPlan.OFFICE_DEAD + ", or --dead with --composite none).")
    String roofDead;

    @Option(names = "--roof-live", defaultValue = RegularPlan.ROOF_LIVE, paramLabel = "AREA-LOAD", description = "Roof live load (default ${DEFAULT-VALUE}, ordinary flat roof, ASCE 7-16 Table 4.3-1).")
    String roofLive;

    @Option(names = "--snow", defaultValue = RegularPlan.SNOW, paramLabel = "AREA-LOAD", description = "Roof snow load (default ${DEFAULT-VALUE}: none; the site decides it, ASCE 7-16 Chapter 7).")
    String snow;

    @Option(names = "--edge-load", defaultValue = RegularPlan.EDGE_LOAD, paramLabel = "LINE-LOAD", description = "Cladding dead load per length of slab edge, on every level and the roof (default ${DEFAULT-VALUE}: no cladding load; give the facade's weight, e.g. 0.4klf).")
    String edgeLoad;

    @Option(names = "--composite", defaultValue = "on", paramLabel = "on|off|none", description = "The floors' slab and how their members act with it (default ${DEFAULT-VALUE}). on: a slab on composite deck is described on the deck (3in deck, --topping of --concrete, 3/4in studs) and the floor members act with it (AISC 360-16 Chapter I; unshored, 20 psf construction live load); off: the same slab, members designed as bare steel (the comparison); none: no slab described, its weight is --dead (files of earlier versions). The roof's deck carries no slab.")
    String composite;

    @Option(names = "--vibration", defaultValue = "on", paramLabel = "on|off", description = "With the slab described: on (default ${DEFAULT-VALUE}) sizes the floors' bays for walking vibration (AISC Design Guide 11, offices 0.5 %g): where a bay exceeds the limit its beams or girder are stiffened, whichever adds less steel; off only reports the check.")
    String vibration;

    @Option(names = "--topping", defaultValue = "4.5in", paramLabel = "LENGTH", description = "Concrete above the top of the 3in deck (default ${DEFAULT-VALUE}).")
    String topping;

    @Option(names = "--concrete", defaultValue = "145pcf", paramLabel = "UNIT-WEIGHT", description = "Concrete unit weight (default ${DEFAULT-VALUE}, normal weight; lightweight e.g. 110pcf).")
    String concrete;

    @Option(names = "--name", defaultValue = "New plan", paramLabel = "TEXT", description = "Project name.")
    String name;

    @Option(names = "--notes", paramLabel = "TEXT", description = "The plan's notes, e.g. why a load departs from the defaults (\"no partitions: fixed masonry walls, carried as dead load\").")
    String notes;

    @Option(names = "--units", paramLabel = "us|si", description = "Units of the plan file (default: SI when the bays are metric).")
    String units;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "PLAN.bay.json", description = "File to write.")
    Path output;

    @Option(names = "--force", description = "Replace the output file if it exists (the previous one is kept as FILE.bak).")
    boolean force;

    @Override
    public Integer call() throws IOException {
        if (!force && java.nio.file.Files.exists(output)) {
            throw new BadInputException("-o: " + output + " already exists; a new plan does not replace it unless you add "
                    + "--force (the old file is then kept as " + output.getFileName() + ".bak)");
        }
        List<Double> bx = list("--bays-x", baysX);
        List<Double> by = list("--bays-y", baysY);
        List<Double> st = list("--levels", levels);
        if (bx.size() > 200 || by.size() > 200 || st.size() > 200) {
            throw new BadInputException("--bays-x, --bays-y and --levels allow at most 200 items each");
        }
        String along = beamsAlong.trim().toLowerCase(Locale.ROOT);
        if (!along.equals("x") && !along.equals("y")) {
            throw new BadInputException("--beams-along: \"" + beamsAlong + "\" is not allowed; use x or y");
        }
        double spacing = CliValues.quantity("--beam-spacing", beamSpacing, Dimension.LENGTH, true);
        String mode = composite.trim().toLowerCase(Locale.ROOT);
        if (!mode.equals("on") && !mode.equals("off") && !mode.equals("none")) {
            throw new BadInputException("--composite: \"" + composite + "\" is not allowed; use on, off or none");
        }
        boolean slabDescribed = !mode.equals("none");
        double d = dead == null ? (slabDescribed ? 0 : CliValues.quantity("--dead", RegularPlan.OFFICE_DEAD, Dimension.AREA_LOAD, false))
                : CliValues.quantity("--dead", dead, Dimension.AREA_LOAD, false);
        double tc = CliValues.quantity("--topping", topping, Dimension.LENGTH, true);
        if (tc < Units.IN.toSi(2) || tc > Units.IN.toSi(12)) {
            throw new BadInputException("--topping: \"" + topping + "\" is not allowed; give the concrete above the deck, 2 to 12 in"
                    + " (50 to 300 mm), e.g. 4.5in");
        }
        double wc = CliValues.quantity("--concrete", concrete, Dimension.UNIT_WEIGHT, true);
        if (wc < Units.PCF.toSi(90) || wc > Units.PCF.toSi(160)) {
            throw new BadInputException("--concrete: \"" + concrete + "\" is not allowed; give a structural concrete unit weight,"
                    + " 90 to 160 pcf (14 to 25 kN/m3), e.g. 145pcf or 110pcf");
        }
        double sd = CliValues.quantity("--superimposed", superimposed, Dimension.AREA_LOAD, false);
        double l = CliValues.quantity("--live", live, Dimension.AREA_LOAD, false);
        double p = CliValues.quantity("--partition", partition, Dimension.AREA_LOAD, false);
        double rd = roofDead != null ? CliValues.quantity("--roof-dead", roofDead, Dimension.AREA_LOAD, false)
                : slabDescribed ? CliValues.quantity("--roof-dead", RegularPlan.OFFICE_DEAD, Dimension.AREA_LOAD, false) : d;
        double lr = CliValues.quantity("--roof-live", roofLive, Dimension.AREA_LOAD, false);
        double s = CliValues.quantity("--snow", snow, Dimension.AREA_LOAD, false);
        double edge = CliValues.quantity("--edge-load", edgeLoad, Dimension.LINE_LOAD, false);
        double required = RegularPlan.OFFICE_FLOOR.partition();
        if (p < required * (1 - 1e-9) && l < RegularPlan.PARTITION_NOT_REQUIRED_LIVE && (notes == null || notes.isBlank())) {
            throw new BadInputException("--partition: \"" + partition + "\" is less than the " + RegularPlan.OFFICE_PARTITION
                    + " partition allowance ASCE 7-16 §4.3.2 asks for where the live load is below 80 psf; give the reason "
                    + "in the plan's notes with --notes \"…\" (e.g. fixed partitions carried as dead load)");
        }
        UnitSystem us;
        if (units != null) {
            us = CliValues.units("--units", units);
        } else {
            String t = baysX.trim().toLowerCase(Locale.ROOT);
            us = t.endsWith("mm") || (t.endsWith("m") && !t.endsWith("in")) ? UnitSystem.SI : UnitSystem.US;
        }
        Plan plan = RegularPlan.generate(new RegularPlan.Spec(name, us.name().toLowerCase(Locale.ROOT), bx, by, st,
                along.equals("y"), spacing, new LoadValues(d, sd, l, 0, 0, p), new LoadValues(rd, sd, 0, lr, s, 0),
                new LoadValues(edge, 0, 0, 0, 0, 0))).withNotes(notes == null ? "" : notes.strip());
        String vib = vibration.trim().toLowerCase(Locale.ROOT);
        if (!vib.equals("on") && !vib.equals("off")) {
            throw new BadInputException("--vibration: \"" + vibration + "\" is not allowed; use on or off");
        }
        if (slabDescribed) {
            plan = RegularPlan.withSlab(plan, Slab.typical().withTopping(tc).withDensity(wc),
                    mode.equals("on") ? CompositeMode.COMPOSITE : CompositeMode.NON_COMPOSITE, d);
            if (vib.equals("on")) {
                Plan p0 = plan;
                plan = new Plan(p0.name(), p0.units(), p0.settings(), p0.grid(), p0.levels(), p0.floors().stream()
                        .map(f -> f.roof() ? f : f.withComposite(f.composite().withSizeForVibration(true))).toList(), p0.columns(),
                        p0.notes());
            }
        }
        PlanFiles.write(plan, output);
        spec.commandLine().getErr().println("wrote " + output + ": " + (bx.size()) + " × " + by.size() + " bays, "
                + st.size() + (st.size() == 1 ? " level, " : " levels, ") + plan.columns().size()
                + (plan.columns().size() == 1 ? " column" : " columns") + (slabDescribed ? ", floors " + (mode.equals("on") ? "composite" : "non-composite") + " on a slab of "
                        + UnitSystem.format(org.baywright.takedown.SlabDesign.weight(Slab.typical().withTopping(tc).withDensity(wc)),
                                us.areaLoad(), 1) : ""));
        return 0;
    }

    private static List<Double> list(String option, String text) {
        try {
            return Quantities.lengthList(option, text);
        } catch (UnitParseException e) {
            throw new BadInputException(e.getMessage(), e);
        }
    }

}
