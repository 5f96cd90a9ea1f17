package org.baywright.catalog;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;

/**
 * Reads the published AISC Shapes Database (v15.0 and later) exported to CSV with its own column
 * names ({@code AISC_Manual_Label, Type, W, d, bf, tw, tf, kdes, A, Ix, Zx, Sx, Iy, Zy, Sy, J, Cw})
 * and turns the rows of the chosen shape types into a {@link Catalog} of Baywright's schema, with
 * every property tabulated.
 *
 * <p>The US edition gives lb/ft, in, in², in³, in⁴, in⁶. The SI edition gives kg/m, mm, mm² and
 * scaled units: Ix, Iy in 10⁶ mm⁴; Zx, Sx, Zy, Sy in 10³ mm³; J in 10³ mm⁴; Cw in 10⁹ mm⁶. The
 * edition is recognised from the depths (every US depth is below 50 in; every SI depth above 90 mm)
 * unless given.
 *
 * <p>Known limitations: only doubly symmetric shapes with parallel flanges (W, HP, M) are imported;
 * S shapes (sloped flanges), channels, angles, tees and hollow sections are skipped and counted.
 */
public final class ShapesTableImport {
    /** Shape types this importer can represent. */
    public static final Set<String> SUPPORTED_TYPES = Set.of("W", "HP", "M");

    private ShapesTableImport() {
    }

    /** What an import produced. */
    public record Result(Catalog catalog, UnitSystem edition, int rowsRead, int skipped) {
    }

    /**
     * @param types the shape types to keep, e.g. {@code Set.of("W")}
     * @param edition US or SI, or null to recognise it from the depths
     */
    public static Result read(Path file, Set<String> types, UnitSystem edition) {
        for (String t : types) {
            if (!SUPPORTED_TYPES.contains(t)) {
                throw new CatalogException("shape type \"" + t + "\" cannot be imported; supported: W, HP, M");
            }
        }
        // the published CSV is plain ASCII apart from a few symbols; ISO-8859-1 reads any byte
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.ISO_8859_1)) {
            return read(r, file.toString(), types, edition);
        } catch (NoSuchFileException e) {
            throw new CatalogException(file + ": no such file");
        } catch (IOException e) {
            throw new CatalogException(file + ": cannot be read: " + e.getMessage(), e);
        }
    }

    static Result read(Reader reader, String src, Set<String> types, UnitSystem edition) throws IOException {
        BufferedReader in = new BufferedReader(reader);
        String headerLine = in.readLine();
        if (headerLine == null) {
            throw new CatalogException(src + ": empty file");
        }
        List<String> header = splitCsv(headerLine.replace("\uFEFF", ""));
        Map<String, Integer> idx = new HashMap<>();
        for (int i = 0; i < header.size(); i++) {
            idx.putIfAbsent(header.get(i).strip(), i);
        }
        String[] needed = {"AISC_Manual_Label", "Type", "W", "d", "bf", "tw", "tf", "kdes",
            "A", "Ix", "Zx", "Sx", "Iy", "Zy", "Sy", "J", "Cw"};
        for (String n : needed) {
            if (!idx.containsKey(n)) {
                throw new CatalogException(src + ":1: column \"" + n + "\" is missing; this does not look like the"
                        + " published shapes database exported to CSV (needed: " + String.join(", ", needed) + ")");
            }
        }
        List<String[]> rows = new ArrayList<>();
        List<Integer> lineNos = new ArrayList<>();
        String line;
        int lineNo = 1;
        int rowsRead = 0;
        int skipped = 0;
        double maxDepth = 0;
        while ((line = in.readLine()) != null) {
            lineNo++;
            if (line.isBlank()) {
                continue;
            }
            rowsRead++;
            List<String> cells = splitCsv(line);
            String type = cell(cells, idx.get("Type"));
            if (!types.contains(type)) {
                skipped++;
                continue;
            }
            String[] v = new String[needed.length];
            for (int k = 0; k < needed.length; k++) {
                v[k] = cell(cells, idx.get(needed[k]));
            }
            rows.add(v);
            lineNos.add(lineNo);
            try {
                maxDepth = Math.max(maxDepth, Double.parseDouble(v[3]));
            } catch (NumberFormatException e) {
                // reported below with its location
            }
        }
        UnitSystem ed = edition != null ? edition : (maxDepth > 60 ? UnitSystem.SI : UnitSystem.US);
        double[] factor = ed == UnitSystem.US
                ? new double[] {Units.PLF.toSi(1), Units.IN.toSi(1), Units.IN2.toSi(1), Units.IN4.toSi(1),
                    Units.IN3.toSi(1), Units.IN3.toSi(1), Units.IN4.toSi(1), Units.IN3.toSi(1), Units.IN3.toSi(1),
                    Units.IN4.toSi(1), Units.IN6.toSi(1)}
                : new double[] {Units.STANDARD_GRAVITY, 1e-3, 1e-6, 1e6 * 1e-12, 1e3 * 1e-9, 1e3 * 1e-9,
                    1e6 * 1e-12, 1e3 * 1e-9, 1e3 * 1e-9, 1e3 * 1e-12, 1e9 * 1e-18};
        List<Section> sections = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        Property[] props = {Property.A, Property.IX, Property.ZX, Property.SX, Property.IY, Property.ZY,
            Property.SY, Property.J, Property.CW};
        for (int r = 0; r < rows.size(); r++) {
            String[] v = rows.get(r);
            String where = src + ":" + lineNos.get(r) + ": " + v[0] + ": ";
            try {
                double[] n = new double[needed.length];
                for (int k = 2; k < needed.length; k++) {
                    try {
                        n[k] = Double.parseDouble(v[k]);
                    } catch (NumberFormatException e) {
                        throw new CatalogException(where + "column \"" + needed[k] + "\": \"" + v[k] + "\" is not a number");
                    }
                }
                double weight = n[2] * factor[0];
                double len = factor[1];
                IShapeDimensions dims = new IShapeDimensions(n[3] * len, n[4] * len, n[5] * len, n[6] * len, n[7] * len);
                Map<Property, Double> tab = new EnumMap<>(Property.class);
                for (int k = 0; k < props.length; k++) {
                    tab.put(props[k], n[8 + k] * factor[2 + k]);
                }
                sections.add(new Section(v[0], weight, dims, tab));
            } catch (CatalogException e) {
                problems.add(e.getMessage());
            } catch (IllegalArgumentException e) {
                problems.add(where + e.getMessage());
            }
        }
        if (!problems.isEmpty()) {
            throw new CatalogException(String.join("\n", problems));
        }
        if (sections.isEmpty()) {
            throw new CatalogException(src + ": no rows of type " + String.join(", ", types));
        }
        String name = String.join("/", types.stream().sorted().toList()) + " shapes imported from "
                + Path.of(src).getFileName() + " (" + ed + " edition)";
        return new Result(new Catalog(name, src, sections), ed, rowsRead, skipped);
    }

    private static String cell(List<String> cells, int i) {
        return i < cells.size() ? cells.get(i).strip() : "";
    }

    /** Splits one CSV line, honouring double quotes. */
    static List<String> splitCsv(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        cur.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cur.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        out.add(cur.toString());
        return out;
    }
}
