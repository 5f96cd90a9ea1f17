package org.baywright.ui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.baywright.takedown.MemberResult;
import org.baywright.units.UnitSystem;
import org.baywright.units.Units;
import org.junit.jupiter.api.Test;

/**
 * A composite member as the editor shows it: its plan notation and its Properties rows, on the bare-steel demo with one member given a hand-made composite result ({@link CompositeFixture}: AISC Design Examples V15, Example I.1).
 */
class CompositeReadoutsTest {
    private final EditorModel model = new EditorModel(TaskRunner.direct());

    /** The demo framed in bare steel (its composite twin is the demo itself): every member's own result is bare. */
    static final java.nio.file.Path BARE = java.nio.file.Path.of("plans/examples/harbourview-offices-bare-steel.bay.json");

    CompositeReadoutsTest() {
        assertTrue(model.open(BARE).opened());
        assertTrue(model.currentMembers().stream().noneMatch(MemberResult::isComposite), "a bare-steel plan");
    }

    private MemberResult aBeam() {
        return model.currentMembers().stream().filter(m -> m.kind() == org.baywright.plan.MemberKind.BEAM && !m.section().isEmpty()
                && !m.id().contains("/")).findFirst().orElseThrow();
    }

    /** Camber as the drawings write it (MemberLabels: eighths of an inch, whole millimetres; common practice). */
    @Test
    void camberIsWrittenAsOnTheDrawings() {
        assertAll(() -> assertEquals("3/4\"", Readouts.camber(Units.IN.toSi(0.75), UnitSystem.US)),
                () -> assertEquals("1 1/4\"", Readouts.camber(Units.IN.toSi(1.25), UnitSystem.US)),
                () -> assertEquals("2\"", Readouts.camber(Units.IN.toSi(2), UnitSystem.US)),
                () -> assertEquals("19 mm", Readouts.camber(Units.IN.toSi(0.75), UnitSystem.SI)));
    }

    /**
     * The plan notation: size, studs in brackets, camber (common practice, e.g. W16X26 (16) c=3/4"); DE I.1
     * gives 46 studs and a camber of 2 in (CHECK-VALUES §7, COMPUTED); bare steel is the size alone.
     */
    @Test
    void aCompositeMembersNotationHasItsStudsAndCamber() {
        MemberResult bare = aBeam();
        MemberResult m = CompositeFixture.composite(bare);
        assertAll(() -> assertEquals(bare.section(), Readouts.planNotation(bare, UnitSystem.US, false)),
                () -> assertEquals(bare.section() + " (46) c=2\"", Readouts.planNotation(m, UnitSystem.US, false)),
                () -> assertEquals("[" + bare.section() + "] (46) c=51 mm", Readouts.planNotation(m, UnitSystem.SI, true)));
    }

    /**
     * The Properties rows of DE I.1 (CHECK-VALUES §7): b_eff = 120 in (span/8 = 67.5 in a side is more than half
     * the 10 ft spacing, 60 in), Q_n = 17.2 kips, 46 studs, 23 a side, PNA in the slab or the flange, camber 2 in.
     */
    @Test
    void aCompositeMembersRowsAreItsDesign() {
        MemberResult m = CompositeFixture.composite(aBeam());
        Map<String, String> rows = new java.util.LinkedHashMap<>();
        for (Readouts.Row r : Readouts.composite(m, UnitSystem.US)) {
            rows.put(r.label(), r.value());
        }
        var d = m.composite().design();
        assertAll(() -> assertTrue(rows.get("Effective width b_eff").startsWith("120.0 in  (left 60.0 in, right 60.0 in"),
                        rows.get("Effective width b_eff")),
                () -> assertEquals("46 (23 each side of mid-span)", rows.get("Studs")),
                () -> assertTrue(rows.get("Stud strength Q_n").startsWith("17.2"), rows.get("Stud strength Q_n")),
                () -> assertEquals(String.format(java.util.Locale.ROOT, "%.1f kip", 23 * Units.KIPS.fromSi(d.qn())),
                        rows.get("ΣQ_n")),
                () -> assertTrue(rows.get("Composite action").endsWith("% of full"), rows.get("Composite action")),
                () -> assertTrue(rows.get("Plastic neutral axis").startsWith("in the "), rows.get("Plastic neutral axis")),
                () -> assertTrue(rows.get("Camber").startsWith("2\""), rows.get("Camber")),
                () -> assertTrue(rows.get("I_LB").endsWith("in⁴ (Commentary Eq. C-I3-1)"), rows.get("I_LB")),
                () -> assertTrue(rows.get("Construction stage").startsWith(Readouts.ratio(d.constructionRatio())),
                        rows.get("Construction stage")),
                () -> assertTrue(rows.get("Bare steel instead").startsWith(m.section()), rows.get("Bare steel instead")),
                () -> assertEquals(List.of(), Readouts.composite(aBeam(), UnitSystem.US), "bare steel: no composite rows"));
    }

}
