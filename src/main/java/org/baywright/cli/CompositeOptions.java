package org.baywright.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.baywright.design.Bracing;
import org.baywright.design.CamberRule;
import org.baywright.design.CompositeBeam;
import org.baywright.design.CompositeCriteria;
import org.baywright.design.DeflectionLimits;
import org.baywright.design.SlabOnDeck;
import org.baywright.design.Steel;
import org.baywright.design.Studs;
import org.baywright.design.aisc360.DeckRibs;
import org.baywright.design.aisc360.StudPosition;
import org.baywright.design.aisc360.StudStrengthI8;
import org.baywright.load.DesignMethod;
import org.baywright.units.Dimension;
import org.baywright.units.Units;
import picocli.CommandLine.Option;

/**
 * The options of {@code beam --composite} (a picocli mixin of {@link BeamCommand}): the slab on deck,
 * the studs and the composite criteria, read into the engine's {@link CompositeBeam} and
 * {@link CompositeCriteria}. Every option but {@code --composite} is left null when not given, so the
 * command can refuse them without {@code --composite}; the defaults are stated in the help.
 */
final class CompositeOptions {

    @Option(names = "--composite", description = "Design a composite beam (AISC 360-16 Chapter I): a concrete slab on steel deck "
            + "with headed studs, the bare steel carrying the wet slab during construction. --dead is then the superimposed "
            + "dead load; the slab's weight over --spacing is added. Needs --spacing and the slab options below.")
    boolean on;

    @Option(names = "--spacing", paramLabel = "LENGTH", description = "With --composite: distance to the next beam on each side "
            + "(an interior beam), e.g. 10ft; the effective width (I3.1a) and the slab weight carried come from it.")
    String spacing;

    @Option(names = "--deck-height", paramLabel = "LENGTH", description = "With --composite: deck rib height h_r, e.g. 3in.")
    String deckHeight;

    @Option(names = "--rib-width", paramLabel = "LENGTH", description = "With --composite: average rib width w_r, e.g. 6in.")
    String ribWidth;

    @Option(names = "--rib-pitch", paramLabel = "LENGTH", description = "With --composite: rib pitch, centre to centre, e.g. 12in.")
    String ribPitch;

    @Option(names = "--ribs", paramLabel = "perpendicular|parallel", description = "With --composite: how the deck ribs run "
            + "relative to the beam (perpendicular: only the concrete above the deck counts, I3.2c(2); parallel: the ribs' "
            + "concrete too, I3.2c(3)).")
    String ribs;

    @Option(names = "--topping", paramLabel = "LENGTH", description = "With --composite: concrete above the top of the deck t_c, e.g. 4.5in.")
    String topping;

    @Option(names = "--concrete", paramLabel = "UNIT-WEIGHT", description = "With --composite: concrete unit weight w_c, e.g. 145pcf "
            + "(normal weight), 110pcf (lightweight), 22.8kN/m3.")
    String concrete;

    @Option(names = "--fc", paramLabel = "STRESS", description = "With --composite: concrete strength f'c, e.g. 4ksi, 28MPa.")
    String fc;

    @Option(names = "--slab-weight", paramLabel = "AREA-LOAD", description = "With --composite: the slab's weight, e.g. 75psf "
            + "(default: from the geometry, w_c·(t_c + h_r·w_r/pitch) + deck weight; common practice).")
    String slabWeight;

    @Option(names = "--deck-weight", paramLabel = "AREA-LOAD", description = "With --composite: the deck's own weight (default 2.5psf, "
            + "common practice).")
    String deckWeight;

    @Option(names = "--stud", paramLabel = "LENGTH", description = "With --composite: stud diameter (default 0.75in; Fu = 65 ksi, "
            + "common practice).")
    String stud;

    @Option(names = "--studs-per-rib", paramLabel = "N", description = "With --composite: studs per rib, or per row with the ribs "
            + "parallel (default 1).")
    String studsPerRib;

    @Option(names = "--stud-position", paramLabel = "weak|strong", description = "With --composite: stud position in a "
            + "perpendicular rib, for R_p of I8.2a (default weak, the safe assumption; common practice).")
    String studPosition;

    @Option(names = "--studs", paramLabel = "N", description = "With --composite and --section: check this many studs on the whole "
            + "beam, an even number: half of them between each support and midspan give ΣQn (I8.2c).")
    String studs;

    @Option(names = "--shored", description = "With --composite: the beam is shored during construction: every load on the "
            + "composite section, no construction stage, no camber (default unshored).")
    boolean shored;

    @Option(names = "--construction-live", paramLabel = "AREA-LOAD", description = "With --composite: construction live load on "
            + "the bare steel (default 20psf; ASCE/SEI 37, from memory).")
    String constructionLive;

    @Option(names = "--min-composite", paramLabel = "PERCENT", description = "With --composite: least degree of composite action "
            + "(default 25%%; common practice, after the AISC Commentary).")
    String minComposite;

    @Option(names = "--stud-weight", paramLabel = "WEIGHT", description = "With --composite: steel weight one stud is worth when "
            + "the search compares (section, studs) pairs (default 10lb; common practice).")
    String studWeight;

    @Option(names = "--camber", paramLabel = "on|off", description = "With --composite: camber the unshored beam (default on: "
            + "about 80 %% of the deflection under the wet slab and steel, rounded down to 1/4 in, none below 3/4 in or on "
            + "spans under 20 ft; common practice).")
    String camber;

    /** The default construction live load, 20 psf (ASCE/SEI 37, from memory). */
    static final double CONSTRUCTION_LIVE_PSF = 20;
    /** The default deck weight, 2.5 psf (common practice, CHECK-VALUES §10). */
    static final double DECK_WEIGHT_PSF = 2.5;

    /** The composite-only options given, by name (all but --composite itself). */
    List<String> given() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("--spacing", spacing);
        m.put("--deck-height", deckHeight);
        m.put("--rib-width", ribWidth);
        m.put("--rib-pitch", ribPitch);
        m.put("--ribs", ribs);
        m.put("--topping", topping);
        m.put("--concrete", concrete);
        m.put("--fc", fc);
        m.put("--slab-weight", slabWeight);
        m.put("--deck-weight", deckWeight);
        m.put("--stud", stud);
        m.put("--studs-per-rib", studsPerRib);
        m.put("--stud-position", studPosition);
        m.put("--studs", studs);
        m.put("--shored", shored ? "" : null);
        m.put("--construction-live", constructionLive);
        m.put("--min-composite", minComposite);
        m.put("--stud-weight", studWeight);
        m.put("--camber", camber);
        List<String> out = new ArrayList<>();
        m.forEach((k, v) -> {
            if (v != null) {
                out.add(k);
            }
        });
        return out;
    }

    /** Without --composite, a composite option is a mistake: refuse it by name. */
    void refuseWithoutComposite() {
        List<String> g = given();
        if (!on && !g.isEmpty()) {
            throw new BadInputException(g.get(0) + " applies to composite beams only: add --composite (or leave out "
                    + String.join(", ", g) + ")");
        }
    }

    private static String required(String option, String value) {
        if (value == null) {
            throw new BadInputException("--composite needs " + option + " (see 'baywright beam --help')");
        }
        return value;
    }

    /** Ribs perpendicular or parallel to the beam. */
    DeckRibs ribs() {
        String t = required("--ribs", ribs).trim().toLowerCase(Locale.ROOT);
        return switch (t) {
            case "perpendicular", "perp" -> DeckRibs.PERPENDICULAR;
            case "parallel", "par" -> DeckRibs.PARALLEL;
            default -> throw new BadInputException("--ribs: \"" + ribs + "\" is not allowed; use perpendicular or parallel");
        };
    }

    /** The tributary width and distance to each neighbour [m]. */
    double spacing() {
        return CliValues.quantity("--spacing", required("--spacing", spacing), Dimension.LENGTH, true);
    }

    SlabOnDeck slab() {
        double hr = CliValues.quantity("--deck-height", required("--deck-height", deckHeight), Dimension.LENGTH, true);
        double wr = CliValues.quantity("--rib-width", required("--rib-width", ribWidth), Dimension.LENGTH, true);
        double pitch = CliValues.quantity("--rib-pitch", required("--rib-pitch", ribPitch), Dimension.LENGTH, true);
        if (wr > pitch) {
            throw new BadInputException("--rib-width: \"" + ribWidth + "\" is wider than --rib-pitch \"" + ribPitch
                    + "\"; the average rib width is at most the pitch");
        }
        double tc = CliValues.quantity("--topping", required("--topping", topping), Dimension.LENGTH, true);
        double wc = unitWeight(required("--concrete", concrete));
        double f = CliValues.quantity("--fc", required("--fc", fc), Dimension.STRESS, true);
        if (f > Units.KSI.toSi(20)) {
            throw new BadInputException("--fc: \"" + fc + "\" is not a plausible concrete strength; e.g. 4ksi or 28MPa");
        }
        double deck = deckWeight == null ? Units.PSF.toSi(DECK_WEIGHT_PSF)
                : CliValues.quantity("--deck-weight", deckWeight, Dimension.AREA_LOAD, false);
        return new SlabOnDeck(hr, wr, pitch, deck, tc, wc, f);
    }

    /** w_c: 145pcf, 145lb/ft3, 22.8kN/m3 [N/m³]; between 70 and 170 pcf (lightweight to heavy normal weight). */
    private static double unitWeight(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT).replace(" ", "").replace("³", "3");
        double factor;
        String num;
        if (t.endsWith("pcf")) {
            factor = StudStrengthI8.PCF;
            num = t.substring(0, t.length() - 3);
        } else if (t.endsWith("lb/ft3")) {
            factor = StudStrengthI8.PCF;
            num = t.substring(0, t.length() - 6);
        } else if (t.endsWith("kn/m3")) {
            factor = 1000;
            num = t.substring(0, t.length() - 5);
        } else {
            throw new BadInputException("--concrete: \"" + text + "\" needs a unit weight with its unit, e.g. 145pcf, "
                    + "110lb/ft3 or 22.8kN/m3");
        }
        double v;
        try {
            v = Double.parseDouble(num) * factor;
        } catch (NumberFormatException e) {
            throw new BadInputException("--concrete: \"" + text + "\" is not a unit weight; e.g. 145pcf, 110lb/ft3 or 22.8kN/m3", e);
        }
        if (!(v >= 70 * StudStrengthI8.PCF && v <= 170 * StudStrengthI8.PCF)) {
            throw new BadInputException("--concrete: \"" + text + "\" is not a structural concrete unit weight; use 70 to "
                    + "170 pcf (11 to 26.7 kN/m3)");
        }
        return v;
    }

    Studs studs() {
        Studs s = Studs.defaults();
        double d = stud == null ? s.diameter() : CliValues.quantity("--stud", stud, Dimension.LENGTH, true);
        int n = studsPerRib == null ? 1 : wholeNumber("--studs-per-rib", studsPerRib, 1, 3,
                "a number of studs per rib; use 1, 2 or 3");
        StudPosition p = StudPosition.WEAK;
        if (studPosition != null) {
            p = switch (studPosition.trim().toLowerCase(Locale.ROOT)) {
                case "weak" -> StudPosition.WEAK;
                case "strong" -> StudPosition.STRONG;
                default -> throw new BadInputException("--stud-position: \"" + studPosition
                        + "\" is not allowed; use weak or strong");
            };
        }
        return new Studs(d, s.fu(), n, p);
    }

    /** The studs per half span --studs asks for, or -1 when not given. */
    int studsPerHalf(boolean sectionGiven) {
        if (studs == null) {
            return -1;
        }
        if (!sectionGiven) {
            throw new BadInputException("--studs needs --section: a stud count is checked on a given section (without both, "
                    + "the search chooses section and studs)");
        }
        int n = wholeNumber("--studs", studs, 0, 10000, "a number of studs; use a whole number such as 46");
        if (n % 2 != 0) {
            throw new BadInputException("--studs: \"" + studs + "\" is odd; give the studs on the whole beam as an even number "
                    + "(half of them between each support and midspan)");
        }
        return n / 2;
    }

    private static int wholeNumber(String option, String text, int min, int max, String what) {
        try {
            int v = Integer.parseInt(text.trim());
            if (v >= min && v <= max) {
                return v;
            }
        } catch (NumberFormatException e) {
            // fall through to the message
        }
        throw new BadInputException(option + ": \"" + text + "\" is not " + what);
    }

    /** The composite beam: an interior beam at --spacing, --dead and --live as line loads over that width. */
    CompositeBeam beam(double span, double deadLine, double liveLine) {
        double s = spacing();
        double cl = constructionLive == null ? Units.PSF.toSi(CONSTRUCTION_LIVE_PSF)
                : CliValues.quantity("--construction-live", constructionLive, Dimension.AREA_LOAD, false);
        CompositeBeam b;
        try {
            b = CompositeBeam.interior(span, s, ribs(), slab(), studs(), deadLine / s, liveLine / s, cl);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("--composite: " + e.getMessage(), e);
        }
        if (slabWeight != null) {
            b = b.withSlabWeight(CliValues.quantity("--slab-weight", slabWeight, Dimension.AREA_LOAD, true));
        }
        return b;
    }

    /** The criteria: the beam command's method, steel, limits and self-weight, with the composite options. */
    CompositeCriteria criteria(DesignMethod m, Steel steel, DeflectionLimits dl, boolean selfWeight, Bracing construction) {
        CompositeCriteria c = CompositeCriteria.defaults().withMethod(m).withDeflection(dl).withSelfWeight(selfWeight)
                .withShored(shored);
        c = new CompositeCriteria(c.method(), steel, c.minDegree(), c.studWeight(), c.camber(), c.deflection(), c.shored(),
                construction == null ? c.constructionBracing() : construction, c.selfWeight());
        if (minComposite != null) {
            c = c.withMinDegree(percent("--min-composite", minComposite));
        }
        if (studWeight != null) {
            c = c.withStudWeight(CliValues.quantity("--stud-weight", studWeight, Dimension.FORCE, false));
        }
        if (camber != null) {
            c = c.withCamber(switch (camber.trim().toLowerCase(Locale.ROOT)) {
                case "on" -> CamberRule.defaults();
                case "off" -> CamberRule.none();
                default -> throw new BadInputException("--camber: \"" + camber + "\" is not allowed; use on or off");
            });
        }
        return c;
    }

    /** "25%", "25 %" or "25" → 0.25; 0 to 100. */
    private static double percent(String option, String text) {
        String t = text.trim();
        if (t.endsWith("%")) {
            t = t.substring(0, t.length() - 1).trim();
        }
        try {
            double v = Double.parseDouble(t);
            if (v >= 0 && v <= 100) {
                return v / 100;
            }
        } catch (NumberFormatException e) {
            // fall through to the message
        }
        throw new BadInputException(option + ": \"" + text + "\" is not a percentage; use 0% to 100%, e.g. 25%");
    }
}
