package org.baywright.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import org.baywright.calc.CalcFormat;
import org.baywright.calc.Quantity;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogException;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Property;
import org.baywright.catalog.Section;
import org.baywright.catalog.SectionProperties;
import org.baywright.catalog.ShapesTableImport;
import org.baywright.io.JsonText;
import org.baywright.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code baywright catalog}: list, show, import and export section catalogs. */
@Command(name = "catalog", mixinStandardHelpOptions = true,
        description = "List, show, import and export section catalogs.",
        subcommands = {CatalogCommand.ListCmd.class, CatalogCommand.Show.class, CatalogCommand.Import.class,
            CatalogCommand.Export.class})
public final class CatalogCommand implements Runnable {
    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** The options {@code list} and {@code show} share. */
    static final class ViewOptions {
        @Option(names = "--catalog", paramLabel = "FILE", description = "Catalog file (default: built-in W shapes).")
        Path catalog;

        @Option(names = "--units", paramLabel = "us|si", description = "Units (default us).")
        String units;

        @Option(names = "--json", description = "Print JSON.")
        boolean json;
    }

    static UnitSystem units(String text) {
        if (text == null) {
            return UnitSystem.US;
        }
        return CliValues.units("--units", text);
    }

    /** {@code catalog list}. */
    @Command(name = "list", mixinStandardHelpOptions = true, description = "List the sections, lightest first.")
    static final class ListCmd implements Callable<Integer> {
        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Option(names = "--series", paramLabel = "LIST", split = ",", description = "Only these nominal-depth series, e.g. W18 or W14,W16.")
        List<String> series = new ArrayList<>();

        @Mixin
        ViewOptions view;

        @Override
        public Integer call() {
            PrintWriter out = spec.commandLine().getOut();
            UnitSystem us = units(view.units);
            Catalog cat = Catalogs.load(view.catalog);
            Set<String> wanted = new LinkedHashSet<>();
            for (String s : series) {
                String n = Section.normalize(s);
                if (cat.sections().stream().noneMatch(x -> x.series().equals(n))) {
                    throw new BadInputException("--series: \"" + s + "\" is not a series of the catalog; e.g. W14, W18");
                }
                wanted.add(n);
            }
            List<Section> list = cat.sections().stream().filter(s -> wanted.isEmpty() || wanted.contains(s.series())).toList();
            if (view.json) {
                List<Object> arr = new ArrayList<>();
                for (Section s : list) {
                    arr.add(summary(s, us));
                }
                Map<String, Object> o = new LinkedHashMap<>();
                o.put("catalog", cat.name());
                o.put("units", us.name().toLowerCase(Locale.ROOT));
                o.put("sections", arr);
                out.print(JsonText.write(o));
                return 0;
            }
            out.println(cat.name() + ": " + list.size() + " of " + cat.size() + " sections, lightest first");
            TextTable t = new TextTable(new boolean[] {false, true, true, true, true, true, true, true},
                    "section", "weight [" + us.weightPerLength().symbol() + "]", "d [" + us.smallLength().symbol() + "]",
                    "bf [" + us.smallLength().symbol() + "]", "A [" + us.area().symbol() + "]",
                    "Ix [" + us.inertia().symbol() + "]", "Zx [" + us.sectionModulus().symbol() + "]",
                    "Sx [" + us.sectionModulus().symbol() + "]");
            for (Section s : list) {
                SectionProperties p = s.props();
                t.row(s.designation(), n(us.weightPerLength(s.weight())), n(us.smallLength().fromSi(s.depth())),
                        n(us.smallLength().fromSi(s.dims().bf())), n(us.area().fromSi(p.a())), n(us.inertia().fromSi(p.ix())),
                        n(us.sectionModulus().fromSi(p.zx())), n(us.sectionModulus().fromSi(p.sx())));
            }
            out.print(t.render(""));
            return 0;
        }
    }

    /** {@code catalog show}. */
    @Command(name = "show", mixinStandardHelpOptions = true, description = "Show one section: dimensions, design properties, and the values computed from the dimensions.")
    static final class Show implements Callable<Integer> {
        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Parameters(paramLabel = "DESIGNATION", description = "e.g. W18X50")
        String designation;

        @Mixin
        ViewOptions view;

        @Override
        public Integer call() {
            PrintWriter out = spec.commandLine().getOut();
            UnitSystem us = units(view.units);
            Catalog cat = Catalogs.load(view.catalog);
            Section s = cat.find(designation).orElseThrow(() -> new BadInputException("\"" + designation
                    + "\" is not in the catalog " + cat.name() + "; see 'baywright catalog list'"));
            if (view.json) {
                Map<String, Object> o = summary(s, us);
                o.put("units", us.name().toLowerCase(Locale.ROOT));
                Map<String, Object> comp = new LinkedHashMap<>();
                for (Property p : Property.values()) {
                    comp.put(p.column(), unit(p, us).fromSi(p.of(s.computed())));
                }
                o.put("computedFromDimensions", comp);
                o.put("tabulated", s.tabulated().keySet().stream().map(Property::column).toList());
                out.print(JsonText.write(o));
                return 0;
            }
            out.println(s.designation() + " (" + cat.name() + ")");
            out.println("  weight " + n(us.weightPerLength(s.weight())) + " " + us.weightPerLength().symbol());
            String sl = us.smallLength().symbol();
            out.println("  d = " + n(us.smallLength().fromSi(s.depth())) + " " + sl + ", bf = " + n(us.smallLength().fromSi(s.dims().bf()))
                    + " " + sl + ", tw = " + n(us.smallLength().fromSi(s.dims().tw())) + " " + sl + ", tf = "
                    + n(us.smallLength().fromSi(s.dims().tf())) + " " + sl + ", kdes = " + n(us.smallLength().fromSi(s.dims().kdes()))
                    + " " + sl);
            out.println("  h/tw = " + n(s.hOverTw()) + ", bf/2tf = " + n(s.bfOver2tf()) + ", ho = "
                    + n(us.smallLength().fromSi(s.ho())) + " " + sl);
            out.println();
            TextTable t = new TextTable(new boolean[] {false, true, true, true, false}, "property", "design", "from dimensions",
                    "difference", "unit");
            for (Property p : Property.values()) {
                double d = p.of(s.props());
                double c = p.of(s.computed());
                t.row(p.column(), n(unit(p, us).fromSi(d)), n(unit(p, us).fromSi(c)),
                        String.format(Locale.ROOT, "%+.1f %%", (c / d - 1) * 100) + (s.tabulated().containsKey(p) ? "" : " (computed)"),
                        unit(p, us).symbol());
            }
            t.row("rx", n(us.smallLength().fromSi(s.props().rx())), n(us.smallLength().fromSi(s.computed().rx())), "", sl);
            t.row("ry", n(us.smallLength().fromSi(s.props().ry())), n(us.smallLength().fromSi(s.computed().ry())), "", sl);
            t.row("rts", n(us.smallLength().fromSi(s.props().rts())), n(us.smallLength().fromSi(s.computed().rts())), "", sl);
            out.print(t.render("  "));
            out.println("  Design uses the tabulated value where the catalog gives one, otherwise the computed value.");
            return 0;
        }
    }

    /** {@code catalog import}. */
    @Command(name = "import", mixinStandardHelpOptions = true,
            description = {"Read the published shapes database exported to CSV (its own column names: AISC_Manual_Label, "
                + "Type, W, d, bf, tw, tf, kdes, A, Ix, Zx, Sx, Iy, Zy, Sy, J, Cw) and write a Baywright catalog file."})
    static final class Import implements Callable<Integer> {
        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Parameters(paramLabel = "FILE.csv", description = "The shapes database as CSV (US or SI edition).")
        Path file;

        @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Catalog file to write (default: standard output).")
        Path output;

        @Option(names = "--types", paramLabel = "LIST", split = ",", defaultValue = "W", description = "Shape types to import: W, HP, M (default ${DEFAULT-VALUE}).")
        List<String> types;

        @Option(names = "--edition", paramLabel = "us|si", description = "Units of the CSV (default: recognised from the depths).")
        String edition;

        @Override
        public Integer call() throws IOException {
            Set<String> t = new LinkedHashSet<>();
            for (String x : types) {
                t.add(x.trim().toUpperCase(Locale.ROOT));
            }
            UnitSystem ed = edition == null ? null : units(edition);
            ShapesTableImport.Result r;
            try {
                r = ShapesTableImport.read(file, t, ed);
            } catch (CatalogException e) {
                throw new BadInputException(e.getMessage().replace("\n", "\n  "), e);
            }
            StringWriter sw = new StringWriter();
            CatalogFile.write(r.catalog(), sw, true);
            if (output == null) {
                spec.commandLine().getOut().print(sw);
            } else {
                Path tmp = Files.createTempFile(output.toAbsolutePath().getParent(), ".import", ".tmp");
                try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                    w.write(sw.toString());
                }
                Files.move(tmp, output, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                        java.nio.file.StandardCopyOption.ATOMIC_MOVE);
                spec.commandLine().getErr().println("wrote " + output + ": " + r.catalog().size() + " sections of type "
                        + String.join(", ", t) + " (" + r.edition() + " edition; " + r.skipped() + " rows of other types skipped)");
            }
            return 0;
        }
    }

    /** {@code catalog export}. */
    @Command(name = "export", mixinStandardHelpOptions = true, description = "Write a catalog (default: the built-in one) as a catalog file, to edit into a custom catalog.")
    static final class Export implements Callable<Integer> {
        @Spec
        picocli.CommandLine.Model.CommandSpec spec;

        @Option(names = "--catalog", paramLabel = "FILE", description = "Catalog file (default: built-in W shapes).")
        Path catalog;

        @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "File to write (default: standard output).")
        Path output;

        @Override
        public Integer call() throws IOException {
            Catalog cat = Catalogs.load(catalog);
            StringWriter sw = new StringWriter();
            CatalogFile.write(cat, sw, true);
            if (output == null) {
                spec.commandLine().getOut().print(sw);
            } else {
                Files.writeString(output, sw.toString(), StandardCharsets.UTF_8);
            }
            return 0;
        }
    }

    static Map<String, Object> summary(Section s, UnitSystem us) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("section", s.designation());
        o.put("series", s.series());
        o.put("weight", us.weightPerLength(s.weight()));
        o.put("weightUnit", us.weightPerLength().symbol());
        o.put("d", us.smallLength().fromSi(s.depth()));
        o.put("bf", us.smallLength().fromSi(s.dims().bf()));
        o.put("tw", us.smallLength().fromSi(s.dims().tw()));
        o.put("tf", us.smallLength().fromSi(s.dims().tf()));
        o.put("kdes", us.smallLength().fromSi(s.dims().kdes()));
        for (Property p : Property.values()) {
            o.put(p.column(), unit(p, us).fromSi(p.of(s.props())));
        }
        o.put("rx", us.smallLength().fromSi(s.props().rx()));
        o.put("ry", us.smallLength().fromSi(s.props().ry()));
        o.put("rts", us.smallLength().fromSi(s.props().rts()));
        o.put("ho", us.smallLength().fromSi(s.ho()));
        o.put("h/tw", s.hOverTw());
        o.put("bf/2tf", s.bfOver2tf());
        return o;
    }

    static org.baywright.units.Unit unit(Property p, UnitSystem us) {
        return switch (p) {
            case A -> us.area();
            case IX, IY, J -> us.inertia();
            case ZX, SX, ZY, SY -> us.sectionModulus();
            case CW -> us.warping();
        };
    }

    static String n(double v) {
        return CalcFormat.sig(v);
    }

    static String q(double si, Quantity q, UnitSystem us) {
        return CalcFormat.value(si, q, us);
    }
}
