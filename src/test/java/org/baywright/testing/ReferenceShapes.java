package org.baywright.testing;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The published AISC Shapes Database v15.0 (US edition) as a test oracle, read from
 * {@code ../shared/reference/} beside the project. It is not part of the project: tests that need
 * it skip, saying why, where it is absent (a user's clone has no {@code ../shared}).
 */
public final class ReferenceShapes {
    public static final Path US = Path.of("..", "shared", "reference", "aisc-shapes-v15.0-US.csv");
    public static final Path SI = Path.of("..", "shared", "reference", "aisc-shapes-v15.0-SI.csv");

    private static Map<String, Map<String, String>> cache;

    private ReferenceShapes() {
    }

    /** Skips the calling test unless the reference table is present. */
    public static void assumePresent() {
        assumeTrue(Files.isRegularFile(US), "skipped: the AISC Shapes Database v15.0 reference table is not at "
                + US.toAbsolutePath().normalize() + " (it lives in the team's shared folder, not in the project)");
    }

    /** W-shape rows by AISC_Manual_Label, each a map of column name to cell text. */
    public static synchronized Map<String, Map<String, String>> wShapes() {
        assumePresent();
        if (cache == null) {
            cache = read(US, "W");
        }
        return cache;
    }

    /** A numeric cell of a W shape. */
    public static double value(String label, String column) {
        Map<String, String> row = wShapes().get(label);
        if (row == null) {
            throw new IllegalArgumentException("no W shape " + label + " in the reference table");
        }
        return Double.parseDouble(row.get(column));
    }

    static Map<String, Map<String, String>> read(Path file, String type) {
        Map<String, Map<String, String>> out = new LinkedHashMap<>();
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.ISO_8859_1)) {
            String[] header = r.readLine().replace("\uFEFF", "").split(",", -1);
            Map<String, Integer> idx = new HashMap<>();
            for (int i = 0; i < header.length; i++) {
                idx.putIfAbsent(header[i], i);
            }
            String line;
            while ((line = r.readLine()) != null) {
                String[] cells = line.split(",", -1);
                if (cells.length <= idx.get("Type") || !cells[idx.get("Type")].equals(type)) {
                    continue;
                }
                Map<String, String> row = new HashMap<>();
                for (Map.Entry<String, Integer> e : idx.entrySet()) {
                    row.put(e.getKey(), e.getValue() < cells.length ? cells[e.getValue()] : "");
                }
                out.put(cells[idx.get("AISC_Manual_Label")], row);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }

    private static Map<String, Map<String, String>> siCache;

    /**
     * W-shape rows of the SI edition, keyed by the US label of the same shape. The two editions list
     * the same shapes in the same order, one row each, so the k-th W row of one is the k-th of the
     * other; the caller can check the pairing by the depth (d in mm = 25.4 × d in in, to rounding).
     */
    public static synchronized Map<String, Map<String, String>> wShapesSiByUsLabel() {
        assumePresent();
        assumeTrue(Files.isRegularFile(SI), "skipped: the SI edition of the AISC Shapes Database v15.0 is not at "
                + SI.toAbsolutePath().normalize());
        if (siCache == null) {
            List<String> us = labels();
            List<Map<String, String>> si = new ArrayList<>(read(SI, "W").values());
            if (si.size() != us.size()) {
                throw new IllegalStateException("the US and SI editions list " + us.size() + " and " + si.size() + " W shapes");
            }
            Map<String, Map<String, String>> m = new LinkedHashMap<>();
            for (int k = 0; k < us.size(); k++) {
                m.put(us.get(k), si.get(k));
            }
            siCache = m;
        }
        return siCache;
    }

    /** Labels in file order. */
    public static List<String> labels() {
        return new ArrayList<>(wShapes().keySet());
    }
}
