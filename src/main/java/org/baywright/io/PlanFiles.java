package org.baywright.io;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.core.io.JsonEOFException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.ThreadLocalRandom;
import org.baywright.plan.Plan;

/**
 * Reads and writes Baywright plan files ({@code .bay.json}, see {@code docs/plan-format.md}).
 *
 * <p>Reading never throws for bad content: a missing or unreadable file, bad JSON, an unknown field,
 * a wrong unit or a dangling reference all become located {@link org.baywright.plan.Problem}s, every
 * one of the file's problems at once where the file can be parsed at all. It is done in three steps:
 * the JSON is parsed strictly (no duplicate keys, no NaN, bounded nesting and sizes, no type
 * information), its shape is checked against the document records ({@link ShapeCheck}), and the
 * bound records become a plan ({@link PlanAssembler}).
 *
 * <p>Writing uses the plan's unit system and a stable layout: writing a plan read from a written file
 * gives the same bytes.
 */
public final class PlanFiles {
    /** The value of the {@code format} field of every plan file. */
    public static final String FORMAT = "baywright-plan";
    /** The current format version; files of later versions are refused. */
    public static final int VERSION = 1;
    /** The file name extension of plan files. */
    public static final String EXTENSION = ".bay.json";

    /** Deepest nesting of arrays and objects accepted (a plan needs 7). */
    static final int MAX_NESTING = 64;
    /** Longest string accepted, in characters. */
    static final int MAX_STRING = 1_000_000;
    /** Largest file accepted, in bytes (characters for text given directly). */
    static final long MAX_DOCUMENT = 50_000_000L;

    private static final JsonMapper MAPPER = JsonMapper.builder(JsonFactory.builder()
                    .streamReadConstraints(StreamReadConstraints.builder()
                            .maxNestingDepth(MAX_NESTING)
                            .maxStringLength(MAX_STRING)
                            .maxDocumentLength(MAX_DOCUMENT)
                            .maxNameLength(10_000)
                            .maxNumberLength(100)
                            .build())
                    .build())
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY)
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(MapperFeature.BLOCK_UNSAFE_POLYMORPHIC_BASE_TYPES)
            .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
            .defaultPropertyInclusion(JsonInclude.Value.construct(JsonInclude.Include.NON_NULL, JsonInclude.Include.NON_NULL))
            .build();

    private PlanFiles() {
    }

    /** Reads a plan file. A missing, unreadable, oversized or non-UTF-8 file is reported as a problem. */
    public static PlanReadResult read(Path file) {
        Problems problems = new Problems();
        String source = file.toString();
        byte[] bytes;
        try {
            if (Files.isDirectory(file)) {
                problems.error("io", "", "", source + ": is a folder, not a plan file");
                return failed(problems);
            }
            if (Files.size(file) > MAX_DOCUMENT) {
                problems.error("too-large", "", "", source + ": the file is " + Files.size(file)
                        + " bytes; plan files are limited to " + MAX_DOCUMENT + " bytes (50 MB)");
                return failed(problems);
            }
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            problems.error("io", "", "", source + ": no such file");
            return failed(problems);
        } catch (AccessDeniedException e) {
            problems.error("io", "", "", source + ": cannot be read (permission denied)");
            return failed(problems);
        } catch (IOException | SecurityException e) {
            problems.error("io", "", "", source + ": cannot be read: " + e.getMessage());
            return failed(problems);
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString();
        } catch (CharacterCodingException e) {
            problems.error("not-utf8", "", "", source + ": is not UTF-8 text; save the plan file as UTF-8");
            return failed(problems);
        }
        return read(text, source);
    }

    /** Reads a plan from JSON text; {@code sourceName} (a file name) is used in file-level messages. */
    public static PlanReadResult read(String json, String sourceName) {
        Problems problems = new Problems();
        try {
            Optional<Plan> plan = parse(json == null ? "" : json, sourceName == null ? "plan" : sourceName, problems);
            return new PlanReadResult(problems.hasErrors() ? Optional.empty() : plan, problems.all());
        } catch (RuntimeException e) {
            // a fault of this reader, not of the file: still reported, never thrown
            problems.error("internal", "", "", sourceName + ": could not be read because of an internal error ("
                    + e.getClass().getSimpleName() + ": " + e.getMessage() + "); please report it");
            return failed(problems);
        }
    }

    private static PlanReadResult failed(Problems problems) {
        return new PlanReadResult(Optional.empty(), problems.all());
    }

    private static Optional<Plan> parse(String json, String source, Problems problems) {
        if (json.length() > MAX_DOCUMENT) {
            problems.error("too-large", "", "", source + ": the plan is " + json.length()
                    + " characters long; plan files are limited to 50 MB");
            return Optional.empty();
        }
        String text = json.startsWith("\uFEFF") ? json.substring(1) : json;
        JsonNode root;
        try {
            root = MAPPER.readTree(text);
        } catch (JacksonException e) {
            problems.add(parseProblem(e, source));
            return Optional.empty();
        }
        if (root == null || root.isMissingNode()) {
            problems.error("empty", "", "", source + ": is empty; a plan file is a JSON object that starts with "
                    + "{\"format\": \"" + FORMAT + "\", \"version\": " + VERSION + ", …}");
            return Optional.empty();
        }
        if (!root.isObject()) {
            problems.error("not-a-plan", "", "", source + ": is not a Baywright plan: the file holds "
                    + ShapeCheck.describe(root) + " where a plan file holds one JSON object {\"format\": \"" + FORMAT + "\", …}");
            return Optional.empty();
        }
        ObjectNode object = (ObjectNode) root;
        if (!formatAndVersion(object, source, problems)) {
            return Optional.empty();
        }
        ObjectNode clean = new ShapeCheck(problems).root(object, PlanDocument.PlanDoc.class);
        PlanDocument.PlanDoc doc;
        try {
            doc = MAPPER.treeToValue(clean, PlanDocument.PlanDoc.class);
        } catch (JacksonException e) {
            throw new IllegalStateException("checked plan does not bind: " + e.getOriginalMessage(), e);
        }
        return new PlanAssembler(problems).assemble(doc);
    }

    /** Checks format and version; false when the rest of the file must not be read. */
    private static boolean formatAndVersion(ObjectNode root, String source, Problems problems) {
        JsonNode format = root.get("format");
        if (format == null) {
            problems.error("missing-field", "/format", "", "missing required field \"format\"; a plan file starts with "
                    + "{\"format\": \"" + FORMAT + "\", \"version\": " + VERSION + ", …}");
        } else if (!format.isTextual() || !format.asText().equals(FORMAT)) {
            problems.error("not-a-plan", "/format", "", source + ": is not a Baywright plan: its format is "
                    + ShapeCheck.describe(format) + ", where a plan file has \"format\": \"" + FORMAT + "\"");
            return false;
        }
        JsonNode version = root.get("version");
        if (version == null || version.isNull()) {
            problems.error("missing-field", "/version", "", "missing required field \"version\"; the current version is "
                    + VERSION + " (\"version\": " + VERSION + ")");
        } else if (!version.isIntegralNumber()) {
            problems.error("bad-version", "/version", "", "version: expected a whole number such as " + VERSION + ", got "
                    + ShapeCheck.describe(version));
        } else if (version.bigIntegerValue().compareTo(java.math.BigInteger.valueOf(VERSION)) > 0) {
            problems.error("newer-version", "/version", "", source + ": was written in plan format version "
                    + ShapeCheck.clip(version.asText()) + ", newer than the version this Baywright reads (" + VERSION
                    + "); open it with a newer Baywright");
            return false;
        } else if (version.bigIntegerValue().signum() <= 0) {
            problems.error("bad-version", "/version", "", "version: " + ShapeCheck.clip(version.asText())
                    + " is not a plan format version; versions start at 1 and the current version is " + VERSION);
        }
        return true;
    }

    /** A parse failure as a located problem: line and column, and the JSON pointer reached. */
    private static org.baywright.plan.Problem parseProblem(JacksonException e, String source) {
        JsonLocation loc = e.getLocation();
        String at = loc != null && loc.getLineNr() > 0
                ? " at line " + loc.getLineNr() + ", column " + loc.getColumnNr() : "";
        String pointer = "";
        if (e.getProcessor() instanceof JsonParser p && p.getParsingContext() != null) {
            pointer = p.getParsingContext().pathAsPointer().toString();
        }
        String original = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
        String lower = original.toLowerCase(Locale.ROOT);
        String kind;
        String message;
        if (e instanceof StreamConstraintsException) {
            if (lower.contains("nesting depth")) {
                kind = "too-deep";
                message = "arrays and objects are nested more than " + MAX_NESTING + " levels deep";
            } else if (lower.contains("string value length")) {
                kind = "too-long";
                message = "a text value is longer than " + MAX_STRING + " characters";
            } else if (lower.contains("document length")) {
                kind = "too-large";
                message = "the plan is larger than 50 MB";
            } else if (lower.contains("number value length")) {
                kind = "too-long";
                message = "a number has too many digits";
            } else {
                kind = "too-large";
                message = "the plan exceeds a size limit: " + original;
            }
        } else if (lower.contains("duplicate")) {
            kind = "duplicate-key";
            String key = quoted(original);
            message = "the key " + (key == null ? "" : "\"" + key + "\" ") + "appears twice in the same object; "
                    + "each key may appear once";
            if (key != null && !pointer.endsWith("/" + key)) {
                pointer = pointer.isEmpty() || !pointer.contains("/") ? Pointers.child(pointer, key)
                        : Pointers.child(pointer.substring(0, pointer.lastIndexOf('/')), key);
            }
        } else if (lower.contains("non-standard token") || lower.contains("nan") && lower.contains("token")) {
            kind = "not-a-number";
            message = "NaN and Infinity are not numbers in a plan file; write a finite number (" + original
                    .replaceAll(": enable .*", "") + ")";
        } else if (e instanceof JsonEOFException || lower.contains("end-of-input")) {
            kind = "truncated";
            message = "the file ends in the middle of the JSON (is it cut short?): " + clean(original);
        } else if (lower.contains("trailing token")) {
            kind = "syntax";
            message = "there is more text after the plan's closing }; a plan file holds one JSON object";
        } else {
            kind = "syntax";
            message = "is not valid JSON: " + clean(original);
        }
        return org.baywright.plan.Problem.error(kind, pointer, "", source + at + ": " + message);
    }

    /** A parser message without its notes on parser settings and sources. */
    private static String clean(String message) {
        return message.replaceAll("\\s*\\(start marker at .*", "").replaceAll("\\s*\\[Source: .*", "")
                .replaceAll(":? *\\(?(?:enable|disable) `[^`]*`.*", "");
    }

    /** The first text in quotes (single or double) of a parser message, or null. */
    private static String quoted(String message) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("['\"]([^'\"]*)['\"]").matcher(message);
        return m.find() ? m.group(1) : null;
    }

    /** The text of a plan file: UTF-8, {@code "\n"} line ends, keys in a fixed order. */
    public static String write(Plan plan) {
        return JsonLayout.write(MAPPER.valueToTree(PlanWriter.document(plan)));
    }

    /**
     * Writes a plan file safely: the text goes to a temporary file in the same folder, is forced to
     * disk and then atomically renamed over {@code file}, so the file always holds either the old or
     * the new plan. The previous file, if any, is kept as {@code file.bak}.
     */
    public static void write(Plan plan, Path file) throws IOException {
        byte[] bytes = write(plan).getBytes(StandardCharsets.UTF_8);
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        String name = target.getFileName().toString();
        Path temp = freshTemp(dir, name);
        try {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                ByteBuffer buf = ByteBuffer.wrap(bytes);
                while (buf.hasRemaining()) {
                    ch.write(buf);
                }
                ch.force(true);
            }
            if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                copyPermissions(target, temp);
                backup(target, dir.resolve(name + ".bak"), dir, name);
            }
            move(temp, target);
            forceFolder(dir);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    private static void backup(Path target, Path bak, Path dir, String name) throws IOException {
        Path temp = freshTemp(dir, name + ".bak");
        try {
            Files.copy(target, temp, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                ch.force(true);
            }
            move(temp, bak);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /** A new empty file next to the target, named so it is hidden and recognisable. */
    private static Path freshTemp(Path dir, String name) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path p = dir.resolve("." + name + "." + Long.toHexString(ThreadLocalRandom.current().nextLong() >>> 1) + ".tmp");
            try {
                Files.newByteChannel(p, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return p;
            } catch (FileAlreadyExistsException e) {
                if (attempt > 20) {
                    throw e;
                }
            }
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void copyPermissions(Path from, Path to) {
        try {
            Files.setPosixFilePermissions(to, Files.getPosixFilePermissions(from));
        } catch (UnsupportedOperationException | IOException e) {
            // not a POSIX file system: the temporary file keeps the default permissions
        }
    }

    /** Forces the rename to disk where the platform allows syncing a folder. */
    private static void forceFolder(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // not supported on this platform (e.g. Windows); the rename itself is atomic
        }
    }
}
