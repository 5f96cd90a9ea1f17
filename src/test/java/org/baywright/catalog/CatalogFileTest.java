package org.baywright.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

class CatalogFileTest {
    private static Catalog read(String text) throws Exception {
        return CatalogFile.read(new StringReader(text), "test.csv");
    }

    @Test
    void readsDimensionsOnlyAndComputesTheRest() throws Exception {
        Catalog c = read("# baywright-catalog 1\n# name: mine\ndesignation,weight[kg/m],d[mm],bf[mm],tw[mm],tf[mm],kdes[mm]\n"
                + "W460X74,74,457,190,9,14.5,24.7\n");
        Section s = c.find("W460X74").orElseThrow();
        assertEquals("mine", c.name());
        assertEquals(74 * Units.STANDARD_GRAVITY, s.weight(), 1e-9);
        assertEquals(s.computed(), s.props());
        assertTrue(s.tabulated().isEmpty());
    }

    @Test
    void problemsAreLocated() {
        CatalogException e = assertThrows(CatalogException.class, () -> read("# baywright-catalog 1\n"
                + "designation,weight[plf],d[in],bf[in],tw[in],tf[in],kdes[in]\nW18X50,50,18.0,7.50,0.3x55,0.570,0.972\n"
                + "W18X46,46,18.1,6.06,0.360,-0.605,1.01\n"));
        assertTrue(e.getMessage().contains("test.csv:3: W18X50: column \"tw\": \"0.3x55\" is not a number"), e.getMessage());
        assertTrue(e.getMessage().contains("test.csv:4: W18X46: column \"tf\""), e.getMessage());
        CatalogException unit = assertThrows(CatalogException.class, () -> read("# baywright-catalog 1\n"
                + "designation,weight[plf],d[yd],bf[in],tw[in],tf[in],kdes[in]\n"));
        assertTrue(unit.getMessage().contains("\"yd\" is not a unit of length"), unit.getMessage());
        CatalogException magic = assertThrows(CatalogException.class, () -> read("designation,weight\n"));
        assertTrue(magic.getMessage().contains("not a Baywright catalog"), magic.getMessage());
        CatalogException twice = assertThrows(CatalogException.class, () -> read("# baywright-catalog 1\n"
                + "designation,weight[plf],d[in],bf[in],tw[in],tf[in],kdes[in]\nW18X50,50,18.0,7.50,0.355,0.570,0.972\n"
                + "w18x50,50,18.0,7.50,0.355,0.570,0.972\n"));
        assertTrue(twice.getMessage().contains("appears twice"), twice.getMessage());
        CatalogException missing = assertThrows(CatalogException.class, () -> read("# baywright-catalog 1\n"
                + "designation,weight[plf],d[in],bf[in],tw[in],tf[in]\n"));
        assertTrue(missing.getMessage().contains("\"kdes\""), missing.getMessage());
    }

    @Test
    void searchOrderIsWeightThenDepth() {
        Catalog c = CatalogFile.loadDefault();
        // equal nominal weight 26 lb/ft: W10X26 (d 10.3), W12X26 (12.2), W14X26 (13.9), W16X26 (15.7) — shallower first
        java.util.List<String> w26 = c.sections().stream().filter(s -> Math.abs(Units.PLF.fromSi(s.weight()) - 26) < 1e-9)
                .map(Section::designation).toList();
        assertEquals(java.util.List.of("W10X26", "W12X26", "W14X26", "W16X26"), w26);
    }
}
