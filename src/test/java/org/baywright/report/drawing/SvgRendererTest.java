package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

/**
 * The SVG writer, with a golden file for the small test plan.
 *
 * <p>The golden file {@code src/test/resources/golden/framing-plan-small.svg} is compared byte for byte.
 * After a deliberate change to the drawing (or to the engine's results for the small plan), regenerate it
 * with {@code mvn test -Dtest=SvgRendererTest -Dbaywright.updateGolden=true}: the test then rewrites the file
 * and fails once on purpose; review the change with {@code git diff} (and by opening the SVG), then run the
 * tests again without the property.
 */
class SvgRendererTest {
    static final String UPDATE_PROPERTY = "baywright.updateGolden";
    private static final Path GOLDEN = Path.of("src/test/resources/golden/framing-plan-small.svg");

    static FramingPlanDrawing goldenDrawing() {
        return FramingPlanDrawing.of(DrawingSamples.small(), "Level 2",
                DrawingOptions.defaults().withPaper(Paper.ISO_A3).withDate("2025-03-14"));
    }

    @Test
    void theSmallPlanMatchesItsGoldenFile() throws IOException {
        String svg = SvgRenderer.render(goldenDrawing());
        if (Boolean.getBoolean(UPDATE_PROPERTY)) {
            Files.createDirectories(GOLDEN.getParent());
            Files.writeString(GOLDEN, svg, StandardCharsets.UTF_8);
            fail("rewrote " + GOLDEN + " because -D" + UPDATE_PROPERTY + " is set: review the change (git diff), then run"
                    + " the tests again without the property");
        }
        assertTrue(Files.exists(GOLDEN), GOLDEN + " is missing; create it with -D" + UPDATE_PROPERTY + "=true");
        String expected = Files.readString(GOLDEN, StandardCharsets.UTF_8);
        if (!expected.equals(svg)) {
            String[] e = expected.split("\n", -1);
            String[] a = svg.split("\n", -1);
            int i = 0;
            while (i < Math.min(e.length, a.length) && e[i].equals(a[i])) {
                i++;
            }
            fail("the SVG differs from " + GOLDEN + " at line " + (i + 1) + "\n expected: "
                    + (i < e.length ? clip(e[i]) : "(end of file)") + "\n   actual: " + (i < a.length ? clip(a[i]) : "(end of file)")
                    + "\nIf the change is deliberate, regenerate with -D" + UPDATE_PROPERTY + "=true (see this class's Javadoc).");
        }
    }

    private static String clip(String line) {
        return line.length() <= 240 ? line : line.substring(0, 240) + "…";
    }

    @Test
    void theOutputIsWellFormedSvgWithEveryTextOfTheModel() throws Exception {
        FramingPlanDrawing d = goldenDrawing();
        String svg = SvgRenderer.render(d);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        assertAll(
                () -> assertEquals("svg", doc.getDocumentElement().getLocalName()),
                () -> assertEquals("http://www.w3.org/2000/svg", doc.getDocumentElement().getNamespaceURI()),
                () -> assertEquals("1.1", doc.getDocumentElement().getAttribute("version")),
                () -> assertEquals("420mm", doc.getDocumentElement().getAttribute("width")),
                () -> assertEquals("0 0 420 297", doc.getDocumentElement().getAttribute("viewBox")),
                () -> assertEquals(d.texts().size(), doc.getElementsByTagName("text").getLength()),
                () -> assertEquals(d.title(), doc.getElementsByTagName("title").item(0).getTextContent()));
        for (MemberResult m : DrawingSamples.small().takedown().members().get("typical")) {
            if (!m.section().isEmpty()) {
                assertTrue(svg.contains(">" + m.section() + "<") || svg.contains(">[" + m.section() + "]<"), m.id());
            }
        }
    }

    @Test
    void outputIsTheSameWhateverTheDefaultLocale() {
        Locale saved = Locale.getDefault();
        String plain = SvgRenderer.render(goldenDrawing());
        try {
            Locale.setDefault(Locale.GERMANY);
            String german = SvgRenderer.render(goldenDrawing());
            assertEquals(plain, german);
        } finally {
            Locale.setDefault(saved);
        }
        String numbers = plain.replaceAll("#[0-9a-f]{6}", "");
        assertFalse(Pattern.compile("=\"[^\"]*\\d[eE][-+]?\\d").matcher(numbers).find(), "no exponents");
    }

    @Test
    void numbersAreWrittenWithAtMostTwoDecimalsAndNoNegativeZero() {
        assertAll(
                () -> assertEquals("0", Num.mm(-0.001)),
                () -> assertEquals("0", Num.mm(-0.0)),
                () -> assertEquals("12.5", Num.mm(12.5)),
                () -> assertEquals("12.35", Num.mm(12.345678)),
                () -> assertEquals("-3", Num.mm(-3.0001)),
                () -> assertEquals("100000", Num.mm(1e5)),
                () -> assertEquals("0.01", Num.mm(0.0088)));
    }

    @Test
    void textIsEscaped() {
        assertEquals("a &amp; b &lt;c&gt; &quot;d&quot; &apos;e&apos;", SvgRenderer.esc("a & b <c> \"d\" 'e'"));
    }

    @Test
    void layersAreGroupsInDrawingOrder() {
        String svg = SvgRenderer.render(goldenDrawing());
        List<String> ids = new ArrayList<>();
        Matcher m = Pattern.compile("<g id=\"([a-z-]+)\">").matcher(svg);
        while (m.find()) {
            ids.add(m.group(1));
        }
        // deck spans and line and point loads are drawn on the screen only (PlanPicture.Style#loadsAndDecks); the bay
        // layer only when asked for (DrawingOptions#bays) and the run has bays
        List<String> expected = Arrays.stream(Layer.values()).filter(l -> l != Layer.DECKS && l != Layer.LOADS && l != Layer.BAYS)
                .map(Layer::id).toList();
        assertEquals(expected, ids);
    }
}
