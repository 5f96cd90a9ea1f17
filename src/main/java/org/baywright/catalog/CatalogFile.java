package org.baywright.catalog;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.baywright.units.Dimension;
import org.baywright.units.Unit;
import org.baywright.units.Units;

/**
 * Baywright's catalog file: UTF-8 text, one section per line, comma-separated. Lines starting with
 * {@code #} are comments; the first must be {@code # baywright-catalog 1} and a {@code # name: …}
 * line names the catalog. The header row names the columns with their units in brackets:
 *
 * <pre>
 * designation,weight[plf],d[in],bf[in],tw[in],tf[in],kdes[in],A[in2],Ix[in4],Zx[in3],Sx[in3],Iy[in4],Zy[in3],Sy[in3],J[in4],Cw[in6]
 * </pre>
 *
 * The first seven columns are required; the property columns are optional and a cell may be empty
 * (not tabulated: the value is computed from the dimensions). An optional column
 * {@code designation[SI]} gives the designation of the same shape in the SI edition of the standard
 * (W460X52 for W18X35), which SI output prints; an empty cell means none. Any unit of the right kind is
 * accepted ({@code d[mm]}, {@code weight[kg/m]}, {@code Ix[mm4]}…). See {@code docs/catalog-format.md}.
 */
public final class CatalogFile {
    /** The first line of every catalog file. */
    public static final String MAGIC = "# baywright-catalog 1";
    /** The built-in US W-shape catalog, on the class path. */
    public static final String DEFAULT_RESOURCE = "catalogs/w-shapes-us.csv";

    private static final String[] DIM_COLUMNS = {"d", "bf", "tw", "tf", "kdes"};

    private CatalogFile() {
    }

    /** The built-in catalog of W shapes. */
    public static Catalog loadDefault() {
        InputStream in = CatalogFile.class.getClassLoader().getResourceAsStream(DEFAULT_RESOURCE);
        if (in == null) {
            throw new CatalogException("the built-in catalog " + DEFAULT_RESOURCE + " is missing from the class path");
        }
        try (Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            return read(r, "built-in " + DEFAULT_RESOURCE);
        } catch (IOException e) {
            throw new CatalogException("cannot read the built-in catalog: " + e.getMessage(), e);
        }
    }

    /** Reads a catalog file. */
    public static Catalog read(Path file) {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(r, file.toString());
        } catch (NoSuchFileException e) {
            throw new CatalogException(file + ": no such catalog file");
        } catch (IOException e) {
            throw new CatalogException(file + ": cannot be read: " + e.getMessage(), e);
        }
    }

    /** Reads a catalog from text; {@code sourceName} is used in messages. */
    public static Catalog read(Reader reader, String sourceName) throws IOException {
        BufferedReader in = reader instanceof BufferedReader b ? b : new BufferedReader(reader);
        String name = sourceName;
        String line;
        int lineNo = 0;
        boolean magicSeen = false;
        Column[] columns = null;
        List<Section> sections = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        while ((line = in.readLine()) != null) {
            lineNo++;
            if (lineNo == 1 && line.startsWith("\uFEFF")) {
                line = line.substring(1);
            }
            String t = line.strip();
            if (t.isEmpty()) {
                continue;
            }
            if (t.startsWith("#")) {
                if (lineNo == 1 && t.equals(MAGIC)) {
                    magicSeen = true;
                } else if (t.toLowerCase(Locale.ROOT).startsWith("# name:")) {
                    name = t.substring(7).strip();
                }
                continue;
            }
            if (!magicSeen) {
                throw new CatalogException(sourceName + ":1: not a Baywright catalog (the first line must be \""
                        + MAGIC + "\"; to read the published shapes table use 'baywright catalog import')");
            }
            if (columns == null) {
                columns = header(sourceName, lineNo, t);
                continue;
            }
            try {
                sections.add(row(sourceName, lineNo, columns, t));
            } catch (CatalogException e) {
                problems.add(e.getMessage());
            }
        }
        if (!magicSeen) {
            throw new CatalogException(sourceName + ": empty file, or not a Baywright catalog (first line \"" + MAGIC + "\")");
        }
        if (columns == null) {
            throw new CatalogException(sourceName + ": no header row (designation,weight[plf],d[in],…)");
        }
        if (!problems.isEmpty()) {
            throw new CatalogException(String.join("\n", problems));
        }
        if (sections.isEmpty()) {
            throw new CatalogException(sourceName + ": the catalog has no sections");
        }
        try {
            return new Catalog(name, sourceName, sections);
        } catch (IllegalArgumentException e) {
            throw new CatalogException(e.getMessage(), e);
        }
    }

    /** Writes a catalog in US customary columns (the default catalog's layout). */
    public static void write(Catalog catalog, Writer out, boolean withTabulated) throws IOException {
        out.write(MAGIC + "\n");
        out.write("# name: " + catalog.name() + "\n");
        out.write("# Units are in each column heading. An empty cell means \"not tabulated\": Baywright computes it from the dimensions.\n");
        boolean siNames = catalog.sections().stream().anyMatch(x -> !x.siDesignation().isEmpty());
        StringBuilder h = new StringBuilder("designation" + (siNames ? ",designation[SI]" : "")
                + ",weight[plf],d[in],bf[in],tw[in],tf[in],kdes[in]");
        Unit[] propUnits = {Units.IN2, Units.IN4, Units.IN3, Units.IN3, Units.IN4, Units.IN3, Units.IN3, Units.IN4, Units.IN6};
        if (withTabulated) {
            for (Property p : Property.values()) {
                h.append(',').append(p.column()).append('[').append(propUnits[p.ordinal()].aliases().get(0)).append(']');
            }
        }
        out.write(h.append('\n').toString());
        for (Section s : catalog.sections()) {
            StringBuilder b = new StringBuilder(s.designation());
            if (siNames) {
                b.append(',').append(s.siDesignation());
            }
            b.append(',').append(num(Units.PLF.fromSi(s.weight())));
            IShapeDimensions d = s.dims();
            for (double v : new double[] {d.d(), d.bf(), d.tw(), d.tf(), d.kdes()}) {
                b.append(',').append(num(Units.IN.fromSi(v)));
            }
            if (withTabulated) {
                for (Property p : Property.values()) {
                    Double v = s.tabulated().get(p);
                    b.append(',');
                    if (v != null) {
                        b.append(num(propUnits[p.ordinal()].fromSi(v)));
                    }
                }
            }
            out.write(b.append('\n').toString());
        }
    }

    /** Shortest decimal text that reads back to the value rounded to 6 significant figures. */
    static String num(double v) {
        String s = String.format(Locale.ROOT, "%.6g", v);
        if (s.contains("e") || s.contains("E")) {
            return new java.math.BigDecimal(s).stripTrailingZeros().toPlainString();
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    private record Column(String name, Unit unit, Property property, int dimIndex) {
    }

    /** The column index marker of the SI designation column, {@code designation[SI]}. */
    private static final int SI_NAME = -2;

    private static Column[] header(String src, int lineNo, String line) {
        String[] cells = line.split(",", -1);
        Column[] cols = new Column[cells.length];
        boolean[] have = new boolean[DIM_COLUMNS.length + 2];
        for (int i = 0; i < cells.length; i++) {
            String c = cells[i].strip();
            String base = c;
            String unitText = null;
            int lb = c.indexOf('[');
            if (lb >= 0) {
                if (!c.endsWith("]")) {
                    throw new CatalogException(src + ":" + lineNo + ": column heading \"" + c + "\" has an unclosed unit bracket");
                }
                base = c.substring(0, lb).strip();
                unitText = c.substring(lb + 1, c.length() - 1).strip();
            }
            if (base.equals("designation") && "SI".equals(unitText)) {
                cols[i] = new Column("designation[SI]", null, null, SI_NAME);
                continue;
            }
            if (base.equals("designation")) {
                cols[i] = new Column(base, null, null, -1);
                have[0] = true;
                continue;
            }
            Dimension dim;
            Property prop = null;
            int dimIndex = -1;
            if (base.equals("weight")) {
                dim = Dimension.LINE_LOAD;
                have[1] = true;
            } else if ((dimIndex = indexOf(DIM_COLUMNS, base)) >= 0) {
                dim = Dimension.LENGTH;
                have[2 + dimIndex] = true;
            } else {
                for (Property p : Property.values()) {
                    if (p.column().equals(base)) {
                        prop = p;
                    }
                }
                if (prop == null) {
                    throw new CatalogException(src + ":" + lineNo + ": unknown column \"" + base
                            + "\"; allowed: designation, weight, d, bf, tw, tf, kdes, A, Ix, Zx, Sx, Iy, Zy, Sy, J, Cw");
                }
                dim = prop.dimension();
            }
            if (unitText == null) {
                throw new CatalogException(src + ":" + lineNo + ": column \"" + base + "\" has no unit; write it as "
                        + base + "[unit], e.g. " + example(dim));
            }
            Unit u = unitFor(dim, unitText);
            if (u == null) {
                throw new CatalogException(src + ":" + lineNo + ": column \"" + base + "\": \"" + unitText
                        + "\" is not a unit of " + dim.label() + "; e.g. " + example(dim));
            }
            cols[i] = new Column(base, u, prop, dimIndex);
        }
        String[] required = {"designation", "weight", "d", "bf", "tw", "tf", "kdes"};
        for (int k = 0; k < required.length; k++) {
            if (!have[k]) {
                throw new CatalogException(src + ":" + lineNo + ": the header has no \"" + required[k]
                        + "\" column; required: designation, weight, d, bf, tw, tf, kdes");
            }
        }
        return cols;
    }

    private static Unit unitFor(Dimension dim, String text) {
        if (dim == Dimension.LINE_LOAD) {
            // weight may be given as a mass per length (kg/m) or a force per length (plf, kN/m)
            Unit mass = Units.find(Dimension.MASS_PER_LENGTH, text);
            if (mass != null && !text.equals("lb/ft")) {
                return new Unit(mass.symbol(), List.of(), Dimension.LINE_LOAD, mass.toSi() * Units.STANDARD_GRAVITY);
            }
        }
        return Units.find(dim, text);
    }

    private static String example(Dimension dim) {
        return switch (dim) {
            case LINE_LOAD -> "weight[plf] or weight[kg/m]";
            case LENGTH -> "d[in] or d[mm]";
            case AREA -> "A[in2] or A[mm2]";
            case SECTION_MODULUS -> "Zx[in3] or Zx[mm3]";
            case MOMENT_OF_INERTIA -> "Ix[in4] or Ix[mm4]";
            case WARPING_CONSTANT -> "Cw[in6] or Cw[mm6]";
            default -> dim.label();
        };
    }

    private static int indexOf(String[] a, String s) {
        for (int i = 0; i < a.length; i++) {
            if (a[i].equals(s)) {
                return i;
            }
        }
        return -1;
    }

    private static Section row(String src, int lineNo, Column[] cols, String line) {
        String[] cells = line.split(",", -1);
        if (cells.length != cols.length) {
            throw new CatalogException(src + ":" + lineNo + ": " + cells.length + " cells, but the header has "
                    + cols.length + " columns");
        }
        String designation = null;
        String siName = "";
        double weight = Double.NaN;
        double[] dims = new double[DIM_COLUMNS.length];
        Map<Property, Double> tab = new EnumMap<>(Property.class);
        for (int i = 0; i < cols.length; i++) {
            Column c = cols[i];
            String cell = cells[i].strip();
            if (c.unit() == null) {
                if (c.dimIndex() == SI_NAME) {
                    siName = cell;
                } else {
                    designation = cell;
                }
                continue;
            }
            if (cell.isEmpty()) {
                if (c.property() != null) {
                    continue;
                }
                throw new CatalogException(src + ":" + lineNo + ": " + (designation == null ? "" : designation + ": ")
                        + "column \"" + c.name() + "\" is empty; it is required");
            }
            double v;
            try {
                v = Double.parseDouble(cell);
            } catch (NumberFormatException e) {
                throw new CatalogException(src + ":" + lineNo + ": " + (designation == null ? "" : designation + ": ")
                        + "column \"" + c.name() + "\": \"" + cell + "\" is not a number");
            }
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new CatalogException(src + ":" + lineNo + ": " + (designation == null ? "" : designation + ": ")
                        + "column \"" + c.name() + "\": " + cell + " must be a positive number");
            }
            double si = c.unit().toSi(v);
            if (c.property() != null) {
                tab.put(c.property(), si);
            } else if (c.dimIndex() >= 0) {
                dims[c.dimIndex()] = si;
            } else {
                weight = si;
            }
        }
        if (designation == null || designation.isEmpty()) {
            throw new CatalogException(src + ":" + lineNo + ": the designation is empty");
        }
        try {
            return new Section(designation, siName, weight, new IShapeDimensions(dims[0], dims[1], dims[2], dims[3], dims[4]), tab);
        } catch (IllegalArgumentException e) {
            throw new CatalogException(src + ":" + lineNo + ": " + designation + ": " + e.getMessage(), e);
        }
    }
}
