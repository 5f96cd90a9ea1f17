package org.baywright.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.baywright.catalog.Catalog;
import org.baywright.catalog.CatalogFile;
import org.baywright.catalog.Section;
import org.baywright.testing.ReferenceShapes;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CatalogCommandTest {
    @Test
    void listBySeries() throws Exception {
        BeamCommandTest.Run r = BeamCommandTest.run("catalog", "list", "--series", "W18", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        // W18 series: 23 shapes, W18X35 to W18X311 (AISC Shapes Database v15.0, FOUND by counting its W18 rows)
        assertEquals(23, j.get("sections").size());
        assertEquals("W18X35", j.get("sections").get(0).get("section").asText());
        BeamCommandTest.Run text = BeamCommandTest.run("catalog", "list", "--series", "W18");
        assertTrue(text.out().contains("W18X50"), text.out());
    }

    @Test
    void showOneSection() throws Exception {
        BeamCommandTest.Run r = BeamCommandTest.run("catalog", "show", "w18x50", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        // W18X50: d = 18.0 in, Zx = 101 in³, Sx = 88.9 in³ (AISC Shapes Database v15.0, FOUND)
        assertAll(
                () -> assertEquals("W18X50", j.get("section").asText()),
                () -> assertEquals(18.0, j.get("d").asDouble(), 1e-9),
                () -> assertEquals(101, j.get("Zx").asDouble(), 1e-9),
                () -> assertEquals(88.9, j.get("Sx").asDouble(), 1e-9),
                () -> assertEquals(101, j.get("computedFromDimensions").get("Zx").asDouble(), 1.5));
        BeamCommandTest.Run missing = BeamCommandTest.run("catalog", "show", "W18X51");
        assertEquals(2, missing.code());
    }

    @Test
    void importThePublishedTableAndReadItBack(@TempDir Path dir) throws Exception {
        ReferenceShapes.assumePresent();
        Path out = dir.resolve("imported.csv");
        BeamCommandTest.Run r = BeamCommandTest.run("catalog", "import", ReferenceShapes.US.toString(), "-o", out.toString());
        assertEquals(0, r.code(), r.err());
        Catalog imported = CatalogFile.read(out);
        Catalog builtIn = CatalogFile.loadDefault();
        assertEquals(283, imported.size());
        for (Section s : builtIn.sections()) {
            Section t = imported.find(s.designation()).orElseThrow();
            assertEquals(s.props().zx(), t.props().zx(), 1e-12 * s.props().zx(), s.designation());
            assertEquals(s.props().cw(), t.props().cw(), 1e-9 * s.props().cw(), s.designation());
        }
        // the SI edition gives the same shapes (W460X74 is the SI name of W18X50; FOUND in the SI table)
        Path si = dir.resolve("si.csv");
        BeamCommandTest.Run r2 = BeamCommandTest.run("catalog", "import", ReferenceShapes.SI.toString(), "-o", si.toString());
        assertEquals(0, r2.code(), r2.err());
        Section w460 = CatalogFile.read(si).find("W460X74").orElseThrow();
        Section w18 = builtIn.find("W18X50").orElseThrow();
        assertEquals(w18.props().zx(), w460.props().zx(), 0.01 * w18.props().zx());
        assertEquals(w18.depth(), w460.depth(), 0.001);
    }

    @Test
    void importRejectsAFileThatIsNotTheShapesTable(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("x.csv");
        Files.writeString(f, "a,b,c\n1,2,3\n");
        BeamCommandTest.Run r = BeamCommandTest.run("catalog", "import", f.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("AISC_Manual_Label"), r.err());
    }

    @Test
    void exportRoundTrips(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("copy.csv");
        assertEquals(0, BeamCommandTest.run("catalog", "export", "-o", out.toString()).code());
        Catalog copy = CatalogFile.read(out);
        Catalog builtIn = CatalogFile.loadDefault();
        assertEquals(builtIn.size(), copy.size());
        for (Section s : builtIn.sections()) {
            Section c = copy.find(s.designation()).orElseThrow();
            assertEquals(s.props().ix(), c.props().ix(), 1e-6 * s.props().ix());
            assertEquals(s.dims(), new org.baywright.catalog.IShapeDimensions(c.dims().d(), c.dims().bf(), c.dims().tw(),
                    c.dims().tf(), c.dims().kdes()));
        }
    }
}
