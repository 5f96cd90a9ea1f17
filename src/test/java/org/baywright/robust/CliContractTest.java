package org.baywright.robust;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import org.baywright.cli.BaywrightCommand;
import org.baywright.io.PlanFiles;
import org.baywright.plan.DesignSettings;
import org.baywright.plan.Floor;
import org.baywright.plan.LoadValues;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Plan;
import org.baywright.plan.Point;
import org.baywright.plan.RegularPlan;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The command-line contract of docs/cli-contract.md: exit code 0 when everything is sized, 1 when a
 * member is overstressed or unsupported, 2 for bad input (3 for a fault of Baywright); one line per
 * problem on standard error in the form {@code FILE: error: LOCATION (ID): message}; no stack trace
 * unless {@code --debug} (or {@code -Dbaywright.debug}).
 */
class CliContractTest {

    record Run(int code, String out, String err) {
        List<String> errLines() {
            return err.isEmpty() ? List.of() : List.of(err.split("\n"));
        }
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = BaywrightCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString().replace("\r\n", "\n"));
    }

    /** A problem line of a plan file: FILE: error|warning: [LOCATION] [(ID)]: message (location and id may be absent). */
    private static Pattern problemLine(Path file) {
        return Pattern.compile("^" + Pattern.quote(file.toString()) + ": (error|warning): (((\\S[^(]*?)( \\(.+?\\))?|\\(.+?\\)): )?\\S.*$");
    }

    private static void noStackTrace(Run r) {
        assertFalse(r.err().contains("\tat ") || r.err().contains("Exception:") || r.err().contains("Exception\n"),
                () -> "a stack trace without --debug:\n" + r.err());
    }

    /** Every line on standard error is a problem line of the file, or a one-line "baywright: …" message. */
    private static void readableLines(Run r, Path file) {
        Pattern p = problemLine(file);
        for (String line : r.errLines()) {
            assertTrue(p.matcher(line).matches() || line.startsWith("baywright: ") || line.startsWith("Try '")
                    || line.startsWith("wrote "), () -> "not a problem line: " + line + "\nin:\n" + r.err());
        }
        noStackTrace(r);
    }

    private static Plan regular(String units) {
        return RegularPlan.generate(new RegularPlan.Spec("Contract", units, List.of(9.0, 9.0), List.of(8.0), List.of(4.0, 4.0),
                true, 3.0, new LoadValues(2700, 500, 2400, 0, 0, 700), new LoadValues(1000, 300, 0, 1000, 0, 0),
                LoadValues.ZERO));
    }

    private static Plan withSettings(Plan p, DesignSettings s) {
        return new Plan(p.name(), p.units(), s, p.grid(), p.levels(), p.floors(), p.columns());
    }

    private static Plan withMember(Plan p, Member m) {
        List<Floor> floors = new ArrayList<>();
        for (Floor f : p.floors()) {
            List<Member> ms = new ArrayList<>(f.members());
            ms.add(m);
            floors.add(new Floor(f.id(), f.name(), f.roof(), f.slabEdge(), f.decks(), ms, f.infills(), f.openings(),
                    f.areaLoads(), f.lineLoads(), f.pointLoads()));
        }
        return new Plan(p.name(), p.units(), p.settings(), p.grid(), p.levels(), floors, p.columns());
    }

    private static Path save(Path dir, String name, Plan plan) throws IOException {
        Path f = dir.resolve(name);
        PlanFiles.write(plan, f);
        return f;
    }

    // ------------------------------------------------------------------ exit code 0

    @Test
    void zeroWhenEverythingIsSized(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("ok.bay.json");
        Run n = run("new", "--bays-x", "2@30ft", "--bays-y", "1@30ft", "--levels", "2@13ft", "-o", plan.toString());
        assertEquals(0, n.code(), n.err());
        for (String[] args : List.of(new String[] {"design", plan.toString()}, new String[] {"check", plan.toString()},
                new String[] {"design", plan.toString(), "--json", "-"})) {
            Run r = run(args);
            assertAll(String.join(" ", args),
                    () -> assertEquals(0, r.code(), r.err()),
                    () -> assertEquals("", r.err(), "nothing on standard error when all is well"),
                    () -> assertFalse(r.out().isBlank()));
        }
    }

    // ------------------------------------------------------------------ exit code 1

    @Test
    void oneWhenAMemberIsOverstressed(@TempDir Path dir) throws Exception {
        DesignSettings d = DesignSettings.defaults();
        // girders may only be W6: none of them can carry a 9 m girder
        Plan p = withSettings(regular("us"), d.withBeamSeries(d.beamSeries(), List.of("W6")));
        Path plan = save(dir, "weak.bay.json", p);
        Run r = run("design", plan.toString());
        assertEquals(1, r.code(), r.err());
        readableLines(r, plan);
        assertTrue(r.errLines().stream().anyMatch(l -> l.startsWith(plan + ": error: floor typical (G-1-AB): member G-1-AB: ")
                && l.contains("W6")), r.err());
        Run json = run("design", plan.toString(), "--json", "-");
        assertEquals(1, json.code());
        assertEquals(r.errLines(), json.errLines(), "the same problem lines with --json -");
        Run check = run("check", plan.toString());
        assertEquals(0, check.code(), "sizing is for design; check reports the framing: " + check.err());
    }

    @Test
    void oneWhenAMemberIsUnsupported(@TempDir Path dir) throws Exception {
        Plan p = withMember(regular("si"), new Member("B-loose", MemberKind.BEAM, new Point(2.1, 2.2), new Point(2.1, 5.9),
                Optional.empty()));
        Path plan = save(dir, "loose.bay.json", p);
        for (String command : List.of("design", "check")) {
            Run r = run(command, plan.toString());
            assertEquals(1, r.code(), command + ": " + r.err());
            readableLines(r, plan);
            assertTrue(r.errLines().stream().anyMatch(l -> l.startsWith(plan + ": error: floor typical (B-loose): ")
                    && l.contains("no support")), command + ": " + r.err());
        }
    }

    // ------------------------------------------------------------------ exit code 2

    @Test
    void twoForBadInputWithOneReadableLineEach(@TempDir Path dir) throws Exception {
        Path good = save(dir, "good.bay.json", regular("us"));
        Path broken = dir.resolve("broken.bay.json");
        Files.writeString(broken, "{\"format\": \"baywright-plan\", \"version\": 1, \"units\": \"us\", \"grid\": [");
        Path wrong = dir.resolve("wrong.bay.json");
        Files.writeString(wrong, PlanFiles.write(regular("us")).replace("\"units\": \"us\"", "\"units\": \"yards\"")
                .replaceFirst("(\"label\": \"B\", \"x\": )\"[^\"]*\"", "$1 30").replaceFirst("\"spliceEvery\": 2", "\"spliceEvery\": 2, \"colour\": 1"));
        List<String[]> cases = List.of(
                new String[] {"design", broken.toString()},
                new String[] {"check", wrong.toString()},
                new String[] {"design", dir.resolve("missing.bay.json").toString()},
                new String[] {"check", dir.toString()},
                new String[] {"design", good.toString(), "--units", "furlongs"},
                new String[] {"design", good.toString(), "--method", "guess"},
                new String[] {"design", good.toString(), "--allowance", "250"},
                new String[] {"design", good.toString(), "--json", dir.resolve("no/such/folder/out.json").toString()},
                new String[] {"design", good.toString(), "--takeoff", dir.toString()},
                new String[] {"design", good.toString(), "--json", good.toString()},
                new String[] {"design", good.toString(), "--schedule", dir.resolve("other.bay.json").toString()},
                new String[] {"design", good.toString(), "--no-such-option"},
                new String[] {"design"},
                new String[] {"frobnicate"},
                new String[] {"new", "--bays-x", "3@30yd", "--bays-y", "2@30ft", "-o", dir.resolve("n.bay.json").toString()},
                new String[] {"new", "--bays-x", "3@30ft", "--bays-y", "2@30ft", "-o", good.toString()},
                new String[] {"beam", "--span", "30", "--dead", "1klf"});
        byte[] goodBytes = Files.readAllBytes(good);
        for (String[] args : cases) {
            Run r = run(args);
            String what = String.join(" ", args);
            assertEquals(2, r.code(), () -> what + "\n" + r.err());
            assertFalse(r.err().isBlank(), what);
            Path file = args.length > 1 && List.of("design", "check").contains(args[0]) ? Path.of(args[1]) : good;
            readableLines(r, file);
        }
        assertArrayEquals(goodBytes, Files.readAllBytes(good), "no command overwrote the plan");
        Run w = run("check", wrong.toString());
        assertEquals(List.of(
                wrong + ": error: /grid/1/x (B): x: a quantity is text with its unit, not the bare number 30; use a number with "
                        + "ft, in, m, mm or cm, e.g. 35ft, 30'-6\", 420in, 10.5m, 250mm",
                wrong + ": error: /settings/colour: unknown field \"colour\" in the settings; the fields of the settings are method, "
                        + "fy, deflection, deflectionLiveLoad, beamSeries, girderSeries, columnSeries, maxBeamDepth, spliceEvery, liveLoadReduction, "
                        + "partition, girderArea, catalog, connectionEccentricity, composite",
                wrong + ": error: /units: units: \"yards\" is not a unit system; use \"us\" (feet, kips, psf) or \"si\" (metres, "
                        + "kN, kPa)"),
                w.errLines().stream().sorted().toList());
        Run missing = run("design", dir.resolve("missing.bay.json").toString());
        assertEquals(List.of(dir.resolve("missing.bay.json") + ": error: no such file"), missing.errLines());
    }

    @Test
    void newReplacesAPlanOnlyWhenForced(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("p.bay.json");
        String[] args = {"new", "--bays-x", "2@30ft", "--bays-y", "1@30ft", "-o", plan.toString()};
        assertEquals(0, run(args).code());
        Files.writeString(plan, Files.readString(plan).replace("New plan", "My edited plan"));
        byte[] mine = Files.readAllBytes(plan);
        Run again = run(args);
        assertEquals(2, again.code());
        assertTrue(again.err().contains("--force"), again.err());
        assertArrayEquals(mine, Files.readAllBytes(plan), "the user's plan is untouched");
        String[] forced = java.util.Arrays.copyOf(args, args.length + 1);
        forced[args.length] = "--force";
        assertEquals(0, run(forced).code());
        assertArrayEquals(mine, Files.readAllBytes(dir.resolve("p.bay.json.bak")), "the replaced plan is kept as .bak");
    }

    @Test
    void eachProblemIsOneLineWhateverTheFileHolds(@TempDir Path dir) throws Exception {
        Path plan = dir.resolve("odd.bay.json");
        String longId = "G".repeat(5000);
        Files.writeString(plan, "{\"format\": \"baywright-plan\", \"version\": 1, \"units\": \"us\", \"grid\": ["
                + "{\"label\": \"A\\nB\", \"x\": \"1e400ft\"}, {\"label\": \"A\\nB\", \"y\": \"0ft\"},"
                + "{\"label\": \"" + longId + "\", \"x\": \"" + "9".repeat(3000) + "ft\"}, {\"label\": \"\\u001b[31mred\", \"x\": 3}]}");
        int problems = PlanFiles.read(plan).problems().size();
        Run r = run("check", plan.toString());
        assertEquals(2, r.code());
        assertEquals(problems, r.errLines().size(), r.err());
        readableLines(r, plan);
        for (String line : r.errLines()) {
            assertTrue(line.length() < 2_000, () -> "a line too long to read: " + line.length());
            assertTrue(line.chars().noneMatch(Character::isISOControl), () -> "a control character in " + line);
        }
        assertTrue(r.err().contains("(A\\nB)"), r.err());
    }

    // ------------------------------------------------------------------ --debug

    @Test
    void stackTracesOnlyWithDebug(@TempDir Path dir) throws Exception {
        Path plan = save(dir, "good.bay.json", regular("us"));
        Run quiet = run("design", plan.toString(), "--takeoff", dir.toString());
        assertEquals(2, quiet.code());
        assertEquals(List.of("baywright: " + dir + ": Is a directory"), quiet.errLines());
        for (String[] args : List.of(new String[] {"--debug", "design", plan.toString(), "--takeoff", dir.toString()},
                new String[] {"design", plan.toString(), "--debug", "--takeoff", dir.toString()})) {
            Run loud = run(args);
            assertEquals(2, loud.code(), "--debug does not change the exit code");
            assertTrue(loud.err().startsWith("baywright: " + dir + ": Is a directory\n"), loud.err());
            assertTrue(loud.err().contains("\tat "), () -> "a stack trace with --debug: " + loud.err());
        }
        String before = System.getProperty("baywright.debug");
        System.setProperty("baywright.debug", "true");
        try {
            Run property = run("design", plan.toString(), "--takeoff", dir.toString());
            assertTrue(property.err().contains("\tat "), () -> "-Dbaywright.debug still works: " + property.err());
        } finally {
            if (before == null) {
                System.clearProperty("baywright.debug");
            } else {
                System.setProperty("baywright.debug", before);
            }
        }
    }

    @Test
    void internalErrorsAreOneLineAndExitThree() {
        for (String[] args : List.of(new String[] {"check", "x.bay.json"}, new String[] {"--debug", "check", "x.bay.json"},
                new String[] {"check", "--debug", "x.bay.json"})) {
            boolean debug = List.of(args).contains("--debug");
            CommandLine cl = new CommandLine(new BaywrightCommand());
            StringWriter err = new StringWriter();
            cl.setErr(new PrintWriter(err));
            CommandLine.ParseResult pr = cl.parseArgs(args);
            int code = new BaywrightCommand.ErrorHandler().handleExecutionException(new IllegalStateException("a bug"), cl, pr);
            String text = err.toString();
            assertEquals(3, code);
            assertTrue(text.startsWith("baywright: internal error: java.lang.IllegalStateException: a bug"), text);
            assertEquals(debug, text.contains("\tat "), () -> String.join(" ", args) + ":\n" + text);
            assertEquals(!debug, text.contains("run with --debug"), text);
        }
        StringWriter err = new StringWriter();
        assertEquals(3, BaywrightCommand.internalError(new StackOverflowError(), new PrintWriter(err), false));
        assertEquals(1, err.toString().lines().count(), err.toString());
    }
}
