package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import org.baywright.analysis.DistributedLoad;
import org.baywright.analysis.Extreme;
import org.baywright.analysis.PointLoad;
import org.baywright.analysis.SimpleSpan;
import org.baywright.analysis.SpanLoad;
import org.baywright.calc.Quantity;
import org.baywright.design.BeamLoads;
import org.baywright.load.LoadCase;
import org.baywright.report.pdf.PageFlow.Rgb;
import org.baywright.report.pdf.PageFlow.Style;
import org.baywright.units.UnitSystem;

/**
 * The drawings of a member sheet, as vectors: the service loads case by case, and the shear and
 * moment diagrams of a factored combination, both computed by {@link SimpleSpan} (the statics the
 * design used).
 */
final class SpanDiagrams {
    /**
     * Samples are taken this fraction of the span either side of a point load, so the diagram shows the
     * jump in shear as a vertical step: far below a drawn line's width, far above rounding.
     */
    private static final double BESIDE = 1e-7;
    /** A diagram whose values span less than this is flat: its range is not divided by (no NaN scale). */
    private static final double FLAT = 1e-12;

    private static final Rgb LOAD_FILL = new Rgb(0.86f, 0.9f, 0.96f);
    private static final Rgb LOAD_EDGE = new Rgb(0.2f, 0.35f, 0.6f);
    private static final Rgb SHEAR_FILL = new Rgb(0.88f, 0.94f, 0.88f);
    private static final Rgb SHEAR_EDGE = new Rgb(0.15f, 0.45f, 0.2f);
    private static final Rgb MOMENT_FILL = new Rgb(0.97f, 0.9f, 0.85f);
    private static final Rgb MOMENT_EDGE = new Rgb(0.65f, 0.3f, 0.1f);

    private static final float ROW = 38f;

    private SpanDiagrams() {
    }

    /** Height the load diagram of these loads takes. */
    static float loadHeight(BeamLoads loads) {
        return loads.present().isEmpty() ? 0 : loads.present().size() * ROW + 14f;
    }

    /** The service loads of each case present, one strip per case, with the span below. */
    static void loads(PageFlow f, BeamLoads loads, UnitSystem us) {
        List<LoadCase> cases = new ArrayList<>(loads.present());
        if (cases.isEmpty()) {
            return;
        }
        float h = loadHeight(loads);
        f.ensure(h);
        Style label = f.small;
        Style tiny = new Style(f.fonts.regular, 6.3f, Rgb.TEXT, 7.5f);
        double span = loads.span();
        float x0 = f.left() + 34;
        float x1 = f.right() - 34;
        float top = f.y();
        for (int i = 0; i < cases.size(); i++) {
            LoadCase c = cases.get(i);
            float base = top - (i + 1) * ROW + 8;
            f.text(f.bold, f.left(), base + 2, c.symbol());
            f.line(x0, base, x1, base, 1.4f, Rgb.TEXT);
            support(f, x0, base);
            support(f, x1, base);
            List<DistributedLoad> dl = new ArrayList<>();
            TreeMap<Double, Double> points = new TreeMap<>();
            for (SpanLoad l : loads.of(c).loads()) {
                if (l instanceof DistributedLoad d && (d.wStart() != 0 || d.wEnd() != 0)) {
                    dl.add(d);
                } else if (l instanceof PointLoad p && p.force() != 0) {
                    points.merge(p.position(), p.force(), Double::sum);
                }
            }
            float profileTop = 16f;
            if (!dl.isEmpty()) {
                double[][] prof = profile(dl);
                double max = 0;
                int at = 0;
                for (int k = 0; k < prof[1].length; k++) {
                    if (Math.abs(prof[1][k]) > max) {
                        max = Math.abs(prof[1][k]);
                        at = k;
                    }
                }
                if (max > 0) {
                    float[] xs = new float[prof[0].length + 2];
                    float[] ys = new float[prof[0].length + 2];
                    xs[0] = sx(prof[0][0], span, x0, x1);
                    ys[0] = base + 1;
                    for (int k = 0; k < prof[0].length; k++) {
                        xs[k + 1] = sx(prof[0][k], span, x0, x1);
                        ys[k + 1] = base + 1 + (float) (prof[1][k] / max) * profileTop;
                    }
                    xs[xs.length - 1] = sx(prof[0][prof[0].length - 1], span, x0, x1);
                    ys[ys.length - 1] = base + 1;
                    f.polygon(xs, ys, LOAD_FILL, LOAD_EDGE, 0.6f);
                    String w = "w max " + Fmt.v(prof[1][at], Quantity.LINE_LOAD, us);
                    f.textRight(label, x1, base + profileTop + 3, w);
                }
            }
            for (var e : points.entrySet()) {
                float px = sx(e.getKey(), span, x0, x1);
                arrow(f, px, base + 28, base + 1.5f);
                String p = Fmt.v(e.getValue(), Quantity.FORCE, us);
                float w = f.textWidth(tiny, p);
                float tx = Math.min(Math.max(px + 2, f.left() + 14), f.right() - w);
                f.text(tiny, tx, base + 29, p);
            }
        }
        float dim = top - cases.size() * ROW - 2;
        f.line(x0, dim, x1, dim, 0.4f, Rgb.GREY);
        f.line(x0, dim - 3, x0, dim + 3, 0.4f, Rgb.GREY);
        f.line(x1, dim - 3, x1, dim + 3, 0.4f, Rgb.GREY);
        String l = "L = " + Fmt.v(span, Quantity.SPAN_LENGTH, us);
        float lw = f.textWidth(label, l);
        f.fillRect((x0 + x1) / 2 - lw / 2 - 3, dim - 4, lw + 6, 8, new Rgb(1, 1, 1));
        f.textCentre(label, (x0 + x1) / 2, dim - 2.5f, l);
        f.y(top - h);
    }

    /** Total intensity of several linear line loads: breakpoints and values, both sides of each jump. */
    static double[][] profile(List<DistributedLoad> loads) {
        java.util.TreeSet<Double> bs = new java.util.TreeSet<>();
        for (DistributedLoad d : loads) {
            bs.add(d.start());
            bs.add(d.end());
        }
        Double[] b = bs.toArray(new Double[0]);
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i + 1 < b.length; i++) {
            double a = b[i];
            double z = b[i + 1];
            double va = 0;
            double vz = 0;
            for (DistributedLoad d : loads) {
                if (d.start() <= a && d.end() >= z) {
                    va += d.intensityAt(a);
                    vz += d.intensityAt(z);
                }
            }
            pts.add(new double[] {a, va});
            pts.add(new double[] {z, vz});
        }
        double[][] out = new double[2][pts.size()];
        for (int i = 0; i < pts.size(); i++) {
            out[0][i] = pts.get(i)[0];
            out[1][i] = pts.get(i)[1];
        }
        return out;
    }

    private static float sx(double x, double span, float x0, float x1) {
        return x0 + (float) (x / span) * (x1 - x0);
    }

    private static void support(PageFlow f, float x, float base) {
        f.polygon(new float[] {x, x - 3.5f, x + 3.5f}, new float[] {base, base - 5.5f, base - 5.5f}, null, Rgb.TEXT, 0.6f);
    }

    private static void arrow(PageFlow f, float x, float from, float to) {
        f.line(x, from, x, to + 3.5f, 0.9f, Rgb.FAIL);
        f.polygon(new float[] {x, x - 2.2f, x + 2.2f}, new float[] {to, to + 4f, to + 4f}, Rgb.FAIL, null, 0);
    }

    /** Height of the shear and moment panels. */
    static float forceHeight() {
        return 98f;
    }

    /**
     * Shear and moment diagrams of {@code span} side by side, with their extreme values labelled.
     *
     */
    static void forces(PageFlow f, SimpleSpan span, UnitSystem us) {
        float h = forceHeight();
        f.ensure(h);
        float top = f.y();
        float gap = 18;
        float w = (f.width() - gap) / 2;
        double len = span.length();
        List<Double> xs = samples(span);
        double[] v = new double[xs.size()];
        double[] m = new double[xs.size()];
        for (int i = 0; i < xs.size(); i++) {
            v[i] = span.shear(xs.get(i));
            m[i] = span.moment(xs.get(i));
        }
        Extreme vmax = span.maxShear();
        Extreme mmax = span.maxMoment();
        String vu = Fmt.unit(Quantity.FORCE, us);
        String mu = Fmt.unit(Quantity.MOMENT, us);
        panel(f, f.left(), top, w, h, xs, v, len, false, "Shear V [" + vu + "]", SHEAR_FILL, SHEAR_EDGE);
        panel(f, f.left() + w + gap, top, w, h, xs, m, len, true,
                "Moment M [" + mu + "], drawn on the tension side", MOMENT_FILL, MOMENT_EDGE);
        f.text(f.smallGrey, f.left() + 1, top - h + 2, "V(0) = " + Fmt.v(span.shear(0), Quantity.FORCE, us)
                + ", V(L) = " + Fmt.v(span.shear(len), Quantity.FORCE, us) + "; |V|max = "
                + Fmt.v(vmax.value(), Quantity.FORCE, us));
        f.text(f.smallGrey, f.left() + w + gap + 1, top - h + 2, "Mmax = " + Fmt.v(mmax.value(), Quantity.MOMENT, us)
                + " at x = " + Fmt.v(mmax.position(), Quantity.SPAN_LENGTH, us));
        f.y(top - h);
    }

    private static List<Double> samples(SimpleSpan span) {
        double len = span.length();
        java.util.TreeSet<Double> s = new java.util.TreeSet<>();
        int n = 160;
        for (int i = 0; i <= n; i++) {
            s.add(len * i / n);
        }
        double eps = BESIDE * len;
        for (SpanLoad l : span.loads()) {
            if (l instanceof PointLoad p) {
                s.add(p.position());
                if (p.position() - eps > 0) {
                    s.add(p.position() - eps);
                }
            } else if (l instanceof DistributedLoad d) {
                s.add(d.start());
                s.add(d.end());
            }
        }
        s.add(span.maxMoment().position());
        return new ArrayList<>(s);
    }

    private static void panel(PageFlow f, float x, float top, float w, float h, List<Double> xs, double[] val, double len,
            boolean down, String title, Rgb fill, Rgb edge) {
        Style cap = new Style(f.fonts.bold, 7f, Rgb.TEXT, 9f);
        List<String> t = f.wrap(cap, title, w);
        f.text(cap, x, top - cap.size(), t.get(0));
        float plotTop = top - 16;
        float plotH = h - 34;
        double max = 0;
        double min = 0;
        for (double d : val) {
            max = Math.max(max, d);
            min = Math.min(min, d);
        }
        double range = Math.max(max - min, FLAT);
        // the zero line divides the plot in the ratio of the positive and negative parts
        float zero = down ? plotTop - (float) (-min / range) * plotH : plotTop - (float) (max / range) * plotH;
        float x0 = x + 4;
        float x1 = x + w - 4;
        float[] px = new float[xs.size() + 2];
        float[] py = new float[xs.size() + 2];
        px[0] = x0;
        py[0] = zero;
        for (int i = 0; i < xs.size(); i++) {
            px[i + 1] = x0 + (float) (xs.get(i) / len) * (x1 - x0);
            float dy = (float) (val[i] / range) * plotH;
            py[i + 1] = down ? zero - dy : zero + dy;
        }
        px[px.length - 1] = x1;
        py[py.length - 1] = zero;
        f.polygon(px, py, fill, edge, 0.8f);
        f.line(x0, zero, x1, zero, 0.7f, Rgb.TEXT);
        f.strokeRect(x, top - h + 10, w, h - 10 - 12, 0.3f, Rgb.RULE);
    }
}
