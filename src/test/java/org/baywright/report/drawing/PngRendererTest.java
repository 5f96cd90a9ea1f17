package org.baywright.report.drawing;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.GraphicsEnvironment;
import java.awt.image.BufferedImage;
import org.baywright.takedown.MemberResult;
import org.junit.jupiter.api.Test;

class PngRendererTest {
    private static final int DPI = 200;

    private static MemberResult member(String id) {
        return DrawingSamples.small().takedown().members().get("typical").stream().filter(m -> m.id().equals(id)).findFirst()
                .orElseThrow();
    }

    /** The image pixel of a plan point moved by (dxMm, dyMm) on the paper. */
    private static int rgbAt(BufferedImage img, FramingPlanDrawing d, double x, double y, double dxMm, double dyMm) {
        Pt p = d.viewport().toPaper(new Pt(x, y));
        double s = DPI / 25.4;
        int px = (int) Math.floor((p.x() + dxMm) * s);
        int py = (int) Math.floor((d.paper().height() - p.y() - dyMm) * s);
        return img.getRGB(px, py) & 0xffffff;
    }

    private static boolean close(int rgb, Rgb c, int tol) {
        return Math.abs((rgb >> 16 & 255) - c.r()) <= tol && Math.abs((rgb >> 8 & 255) - c.g()) <= tol
                && Math.abs((rgb & 255) - c.b()) <= tol;
    }

    private static boolean dark(int rgb) {
        return (rgb >> 16 & 255) < 90 && (rgb >> 8 & 255) < 90 && (rgb & 255) < 90;
    }

    @Test
    void rendersHeadlessAtTheChosenResolution() {
        FramingPlanDrawing d = SvgRendererTest.goldenDrawing();
        BufferedImage img = PngRenderer.render(d, DPI);
        assertAll(
                () -> assertTrue(GraphicsEnvironment.isHeadless(), "the test JVM runs headless"),
                () -> assertEquals(Math.round(420 / 25.4 * DPI), img.getWidth()),
                () -> assertEquals(Math.round(297 / 25.4 * DPI), img.getHeight()),
                () -> assertEquals(0xffffff, img.getRGB(3, 3) & 0xffffff, "paper outside the frame is white"));
    }

    @Test
    void aMemberIsDrawnAsADarkLineOnABandOfItsRatioColour() {
        FramingPlanDrawing d = SvgRendererTest.goldenDrawing();
        BufferedImage img = PngRenderer.render(d, DPI);
        MemberResult g = member("G-2-AB");
        double x = g.start().x() + (g.end().x() - g.start().x()) / 6;
        double y = g.start().y();
        Rgb band = Cividis.at(g.maxRatio());
        int centre = rgbAt(img, d, x, y, 0, 0);
        int inBand = rgbAt(img, d, x, y, 0, 0.7);
        int outside = rgbAt(img, d, x, y, 0, 1.6);
        assertAll(
                () -> assertTrue(dark(centre), Integer.toHexString(centre)),
                () -> assertTrue(close(inBand, band, 6), Integer.toHexString(inBand) + " vs " + band.hex()),
                () -> assertEquals(0xffffff, outside, Integer.toHexString(outside)));
    }

    @Test
    void theOverstressedOutlineIsDashedOnTheImage() {
        FramingPlanDrawing d = SvgRendererTest.goldenDrawing();
        BufferedImage img = PngRenderer.render(d, DPI);
        MemberResult g = member("G-1-AB");
        // walk along the outline's south edge (band half-width 1.1 mm) over the first third of the girder
        int darkRuns = 0;
        boolean wasDark = false;
        int samples = 300;
        for (int i = 0; i < samples; i++) {
            double x = g.start().x() + (g.end().x() - g.start().x()) * (0.05 + 0.25 * i / samples);
            boolean isDark = dark(rgbAt(img, d, x, g.start().y(), 0, -1.1));
            if (isDark && !wasDark) {
                darkRuns++;
            }
            wasDark = isDark;
        }
        assertTrue(darkRuns >= 5, "dashes along the outline: " + darkRuns);
        // a member that passes has no outline there
        MemberResult ok = member("G-1-BC");
        double x = ok.start().x() + (ok.end().x() - ok.start().x()) / 6;
        assertTrue(!dark(rgbAt(img, d, x, ok.start().y(), 0, -1.1)));
    }
}
