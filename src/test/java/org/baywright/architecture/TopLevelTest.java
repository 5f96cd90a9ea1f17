package org.baywright.architecture;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The project's top level is fixed by the design card (docs/architecture.md, "The top level"): exactly
 * {@link #CARD}, dotfiles aside ({@code .ci/}, {@code .gitignore}). Anything else belongs inside one of
 * them: benchmarks in {@code src/test/java/org/baywright/bench} (run through the {@code bench} Maven
 * profile), packaging resources under {@code src/package/}, notes under {@code docs/}.
 *
 * <p>The entries checked are the first path segments of the files git tracks ({@code git ls-files}),
 * so build output and a developer's untracked scratch files do not count. Where git cannot answer (no
 * git on the machine, a source archive without {@code .git}, a repository git refuses to read), the
 * project folder is listed instead, without {@code target/} and dotfiles.
 */
class TopLevelTest {
    /** The card's top level. */
    static final Set<String> CARD = Set.of("README.md", "DEVELOPERS.md", "LICENSE", "pom.xml", "src", "plans", "catalogs",
            "docs");

    @Test
    void theTopLevelHoldsExactlyTheCardsEntries() throws IOException {
        Path root = projectRoot();
        Set<String> entries = trackedTopLevel(root).orElseGet(() -> listedTopLevel(root));
        Set<String> extra = unexpected(entries);
        Set<String> missing = new TreeSet<>(CARD);
        missing.removeAll(entries);
        assertAll(
                () -> assertTrue(extra.isEmpty(), () -> "top-level entries not on the design card: " + extra
                        + "; the card allows " + new TreeSet<>(CARD) + " and dotfiles (see docs/architecture.md)"),
                () -> assertTrue(missing.isEmpty(), () -> "the card's top-level entries missing: " + missing));
    }

    @Test
    void aFolderBesideTheCardsEntriesIsCaught() {
        // the check itself, on paths as git lists them: a loose scripts folder fails, dotfiles and nested paths do not
        List<String> paths = List.of("README.md", "pom.xml", "src/main/java/org/baywright/Launcher.java",
                "bench/run-sizing", "bench/run-study", ".ci/run", ".gitignore", "docs/architecture.md", "notes.txt");
        assertEquals(Set.of("bench", "notes.txt"), unexpected(topLevelOf(paths)));
    }

    /** The entries of {@code entries} that are neither on the card nor dotfiles, sorted. */
    static Set<String> unexpected(Collection<String> entries) {
        Set<String> out = new TreeSet<>();
        for (String e : entries) {
            if (!e.startsWith(".") && !CARD.contains(e)) {
                out.add(e);
            }
        }
        return out;
    }

    /** The first segments of repository-relative paths ({@code /}-separated, as git prints them). */
    static Set<String> topLevelOf(Collection<String> paths) {
        Set<String> out = new TreeSet<>();
        for (String p : paths) {
            if (!p.isEmpty()) {
                int slash = p.indexOf('/');
                out.add(slash < 0 ? p : p.substring(0, slash));
            }
        }
        return out;
    }

    /** The folder holding the project's pom.xml: the working folder of the test run, or one above it. */
    private static Path projectRoot() {
        Path dir = Path.of("").toAbsolutePath();
        for (Path d = dir; d != null; d = d.getParent()) {
            if (Files.isRegularFile(d.resolve("pom.xml")) && Files.isDirectory(d.resolve("src/main/java/org/baywright"))) {
                return d;
            }
        }
        throw new IllegalStateException("no Baywright project folder at or above " + dir);
    }

    /** The top level of what git tracks in {@code root}, or empty when git cannot tell. */
    private static Optional<Set<String>> trackedTopLevel(Path root) {
        Process git;
        try {
            // paths relative to root (also when root is a folder inside some other repository); -z: names unquoted
            git = new ProcessBuilder("git", "ls-files", "-z", "--cached", "--", ".")
                    .directory(root.toFile()).redirectError(ProcessBuilder.Redirect.DISCARD).start();
        } catch (IOException noGit) {
            return Optional.empty();
        }
        try {
            git.getOutputStream().close();
            byte[] out = readAll(git.getInputStream());
            if (!git.waitFor(60, TimeUnit.SECONDS) || git.exitValue() != 0) {
                return Optional.empty();
            }
            List<String> paths = List.of(new String(out, StandardCharsets.UTF_8).split("\0"));
            return paths.isEmpty() ? Optional.empty() : Optional.of(topLevelOf(paths));
        } catch (IOException | InterruptedException e) {
            if (e instanceof InterruptedException) {
                Thread.currentThread().interrupt();
            }
            return Optional.empty();
        } finally {
            git.destroy();
        }
    }

    private static byte[] readAll(InputStream in) throws IOException {
        try (in; ByteArrayOutputStream buf = new ByteArrayOutputStream()) {
            in.transferTo(buf);
            return buf.toByteArray();
        }
    }

    /** Without git: the folder's entries, less build output ({@code target}) and dotfiles. */
    private static Set<String> listedTopLevel(Path root) {
        Set<String> out = new TreeSet<>();
        try (Stream<Path> s = Files.list(root)) {
            s.map(p -> p.getFileName().toString()).filter(n -> !n.equals("target") && !n.startsWith(".")).forEach(out::add);
        } catch (IOException e) {
            throw new IllegalStateException("cannot list " + root, e);
        }
        return out;
    }
}
