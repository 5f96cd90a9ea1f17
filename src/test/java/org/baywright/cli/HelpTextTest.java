package org.baywright.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/**
 * The summaries a user reads in {@code --help} are whole sentences: picocli shows the first
 * description line of each command in the list of commands, so that line must not be a sentence cut at
 * a hand-made line break. Found by a new user ("girders, column-line beams," / "then the").
 */
class HelpTextTest {
    @Test
    void everyCommandSummaryIsAWholeSentence() {
        CommandLine root = new CommandLine(new BaywrightCommand());
        List<Executable> checks = new ArrayList<>();
        walk(root, checks);
        assertTrue(checks.size() >= 10, "commands and subcommands found: " + checks.size());
        assertAll(checks);
    }

    private static void walk(CommandLine c, List<Executable> checks) {
        String[] description = c.getCommandSpec().usageMessage().description();
        String name = c.getCommandSpec().qualifiedName();
        if (description.length > 0) {
            String first = description[0].replace("%n", "").strip();
            checks.add(() -> assertTrue(first.endsWith(".") || first.endsWith(".)"),
                    () -> name + ": the summary shown in the list of commands ends mid-sentence: \"" + first + "\""));
        }
        for (String line : description) {
            checks.add(() -> assertTrue(line.isBlank() || line.replace("%n", "").strip().matches(".*[.:)]$"),
                    () -> name + ": a description paragraph ends mid-sentence: \"" + line + "\""));
        }
        c.getSubcommands().values().stream().distinct().forEach(s -> walk(s, checks));
    }

    @Test
    void theTopLevelHelpListsEachCommandWithItsWholeSummary() {
        StringWriter out = new StringWriter();
        int code = BaywrightCommand.execute(new String[] {"--help"}, new PrintWriter(out), new PrintWriter(new StringWriter()));
        String help = out.toString();
        assertTrue(code == 0, help);
        assertTrue(help.replaceAll("\\s+", " ").contains("column-line beams, infill beams at a maximum spacing"), help);
        assertTrue(help.replaceAll("\\s+", " ").contains("then the framing (supports, support cycles"), help);
    }
}
