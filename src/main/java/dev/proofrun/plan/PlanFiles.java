package dev.proofrun.plan;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.core.util.Separators;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.databind.json.JsonMapper;
import dev.proofrun.text.AtomicFile;
import dev.proofrun.text.Location;
import dev.proofrun.text.Token;
import dev.proofrun.text.UserException;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;

/**
 * Plan files: JSON, UTF-8, one plan per file, format version {@value PlanJson#VERSION}.
 *
 * <ul>
 * <li><b>Reading</b> refuses an empty, truncated or malformed file, another format, an unknown version,
 * unknown fields and bad values with a one-line message naming the file and the JSON path of the problem.
 * Nothing in the file picks a class: the mapper has no default typing and reads fixed records only.</li>
 * <li><b>Fingerprint</b>: the first 12 hex digits of SHA-256 over the canonical form — the plan written as
 * compact JSON (UTF-8, the fixed property order of {@link PlanJson}, no whitespace, numbers as Java's
 * shortest round-trip decimal) with {@code state} and {@code revision} left out; everything else, including
 * {@code supersedes} and {@code revisionNumber} (written only from 2 up), is in. The layout of the file does not matter; a changed value does.</li>
 * <li><b>An issued plan that was edited</b> no longer matches its revision: {@link #read} refuses it,
 * {@link #inspect} reports it, {@link #issue(Path)} issues the change as a new revision that names the old
 * one in {@code supersedes}.</li>
 * <li><b>Saving</b> writes a temporary file beside the target, forces it to disk, copies the previous file
 * to {@code NAME.bak}, then moves the new file over the target (atomically where the file system can).
 * An issued plan file is only ever replaced by its successor revision.</li>
 * </ul>
 */
public final class PlanFiles {

    /** Length of the revision fingerprint in hex digits. */
    public static final int FINGERPRINT_LENGTH = 12;

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
            .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
            .disable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION) // a key said twice is refused (JsonTrouble)
            .build();

    private static final DefaultPrettyPrinter PRETTY = new DefaultPrettyPrinter(Separators.createDefaultInstance()
            .withObjectFieldValueSpacing(Separators.Spacing.AFTER))
            .withObjectIndenter(new DefaultIndenter("  ", "\n"))
            .withArrayIndenter(new DefaultIndenter("  ", "\n"));

    private PlanFiles() {
    }

    /** How a plan file stands; its {@link Token#token() token} is the word {@code plan show --json} writes. */
    public enum Integrity implements Token {
        /** A draft: no revision to check. */
        DRAFT,
        /** Issued, and the content still gives the recorded revision. */
        INTACT,
        /** Issued, but the content was changed afterwards. */
        CHANGED_AFTER_ISSUE
    }

    /**
     * A plan as found on disk.
     *
     * @param plan      the plan as read (for a changed issued plan: the changed content, still marked issued)
     * @param integrity how it stands
     * @param computed  the fingerprint of the content as found
     */
    public record Inspection(StudyPlan plan, Integrity integrity, String computed) {
    }

    /**
     * Reads a plan for use (sheets, grading, showing).
     *
     * @throws UserException if the file is unreadable or malformed, or an issued plan was changed after issue
     */
    public static StudyPlan read(Path path) {
        Inspection in = inspect(path);
        if (in.integrity() == Integrity.CHANGED_AFTER_ISSUE) {
            throw new UserException(Location.file(path.toString()), PlanMessage.EDITED_AFTER_ISSUE,
                    in.plan().revision().orElseThrow(), in.computed());
        }
        return in.plan();
    }

    /**
     * Reads a plan for use as {@link #read} does, but checks an issued plan's revision on another thread:
     * the caller can work with {@link Pending#plan()} meanwhile (grading reads the returned file) and calls
     * {@link Pending#confirm()} before it reports anything or lets a refusal of its own out.
     *
     * @throws UserException if the file is unreadable or malformed
     */
    public static Pending readPending(Path path) {
        Location where = Location.file(path.toString());
        byte[] bytes = bytesOf(path, where);
        StudyPlan plan = PlanCodec.fromJson(parse(bytes, where), where);
        FutureTask<String> computed = null;
        if (plan.isIssued()) { // a draft has no revision to check
            computed = new FutureTask<>(() -> fingerprint(plan));
            Thread t = new Thread(computed, "proofrun-fingerprint");
            t.setDaemon(true);
            t.start();
        }
        return new Pending(plan, computed, path);
    }

    /** A plan read by {@link #readPending}, its revision still being checked. */
    public static final class Pending {

        private final StudyPlan plan;
        private final FutureTask<String> computed;
        private final Path path;

        private Pending(StudyPlan plan, FutureTask<String> computed, Path path) {
            this.plan = plan;
            this.computed = computed;
            this.path = path;
        }

        /** The plan as read; not yet known to match its revision. */
        public StudyPlan plan() {
            return plan;
        }

        /**
         * Waits for the check.
         *
         * @return the plan
         * @throws UserException as {@link #read}: an issued plan changed after issue
         */
        public StudyPlan confirm() {
            if (computed == null) {
                return plan;
            }
            String fingerprint;
            try {
                fingerprint = computed.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while checking the plan's revision", e);
            } catch (ExecutionException e) {
                if (e.getCause() instanceof RuntimeException r) {
                    throw r;
                }
                throw new IllegalStateException(e.getCause());
            }
            if (!plan.revision().orElseThrow().equals(fingerprint)) {
                throw new UserException(Location.file(path.toString()), PlanMessage.EDITED_AFTER_ISSUE,
                        plan.revision().orElseThrow(), fingerprint);
            }
            return plan;
        }
    }

    /** Reads a plan and says whether an issued one still matches its revision. */
    public static Inspection inspect(Path path) {
        Location where = Location.file(path.toString());
        return inspect(bytesOf(path, where), where);
    }

    private static byte[] bytesOf(Path path, Location where) {
        try {
            return Files.readAllBytes(path);
        } catch (IOException e) {
            throw new UserException(where, PlanMessage.CANNOT_READ, describe(e));
        }
    }

    /** Reads plan bytes (from a file named by {@code where}). */
    public static Inspection inspect(byte[] bytes, Location where) {
        StudyPlan plan = PlanCodec.fromJson(parse(bytes, where), where);
        String computed = fingerprint(plan);
        if (!plan.isIssued()) {
            return new Inspection(plan, Integrity.DRAFT, computed);
        }
        return new Inspection(plan, plan.revision().orElseThrow().equals(computed)
                ? Integrity.INTACT : Integrity.CHANGED_AFTER_ISSUE, computed);
    }

    /** The bytes of the plan file: pretty JSON, two-space indent, LF line ends, final newline. */
    public static byte[] toBytes(StudyPlan plan) {
        try {
            String text = MAPPER.writer(PRETTY).writeValueAsString(PlanCodec.toJson(plan));
            return (text + "\n").getBytes(StandardCharsets.UTF_8);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("plan could not be written as JSON", e);
        }
    }

    /** The canonical form the fingerprint is taken over: compact JSON without state and revision. */
    public static byte[] canonical(StudyPlan plan) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        writeCanonical(plan, out);
        return out.toByteArray();
    }

    /** First {@value #FINGERPRINT_LENGTH} hex digits of SHA-256 over {@link #canonical}. */
    public static String fingerprint(StudyPlan plan) {
        MessageDigest sha;
        try {
            sha = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java", e);
        }
        // the canonical bytes go straight into the digest as the generator flushes them (a plan of 200,000
        // slots is about 20 MB of them, never held whole); the same writer as canonical, so the same bytes
        writeCanonical(plan, new OutputStream() {
            @Override
            public void write(int b) {
                sha.update((byte) b);
            }

            @Override
            public void write(byte[] b, int off, int len) {
                sha.update(b, off, len);
            }
        });
        return HexFormat.of().formatHex(sha.digest()).substring(0, FINGERPRINT_LENGTH);
    }

    private static void writeCanonical(StudyPlan plan, OutputStream out) {
        PlanJson.File f = PlanCodec.toJson(plan);
        PlanJson.File content = new PlanJson.File(f.format(), f.formatVersion(), f.id(), null, null, f.revisionNumber(),
                f.supersedes(),
                f.part(), f.people(), f.design(), f.stages(), f.characteristics(), f.calendar(), f.span(), f.spacing(), f.seed(),
                f.schedule());
        try {
            MAPPER.writeValue(out, content);
        } catch (IOException e) {
            throw new IllegalStateException("plan could not be written as JSON", e);
        }
    }

    /** The plan issued: frozen, with its fingerprint as revision. An issued plan is returned unchanged. */
    public static StudyPlan issue(StudyPlan plan) {
        return plan.isIssued() ? plan : plan.issuedAs(fingerprint(plan));
    }

    /**
     * Issues the plan in a file. A draft is issued and saved (the draft kept as {@code .bak}); an intact
     * issued plan is left as it is; an issued plan changed after issue becomes a new revision that
     * supersedes the recorded one (the file as found kept as {@code .bak}).
     *
     * @return the issued plan now in the file
     * @throws UserException if the file cannot be read or written
     */
    public static StudyPlan issue(Path path) {
        Inspection in = inspect(path);
        switch (in.integrity()) {
            case INTACT:
                return in.plan();
            case CHANGED_AFTER_ISSUE: {
                StudyPlan next = issue(in.plan().reopen());
                save(path, next);
                return next;
            }
            case DRAFT:
            default: {
                StudyPlan issued = issue(in.plan());
                save(path, issued);
                return issued;
            }
        }
    }

    /**
     * Saves a plan. An existing issued plan is only replaced by a plan issued as its successor (supersedes
     * its revision) or by the same revision; a file that is not a plan is never replaced.
     *
     * @throws UserException if the target is protected or cannot be written
     */
    public static void write(Path path, StudyPlan plan) {
        if (Files.exists(path)) {
            Inspection old;
            try {
                old = inspect(path);
            } catch (UserException e) {
                throw new UserException(Location.file(path.toString()), PlanMessage.NOT_A_PLAN_FILE_TO_REPLACE, path);
            }
            if (old.plan().isIssued()) {
                String rev = old.plan().revision().orElseThrow();
                boolean same = plan.revision().map(rev::equals).orElse(false) && old.integrity() == Integrity.INTACT;
                boolean successor = plan.isIssued() && plan.supersedes().map(rev::equals).orElse(false);
                if (!same && !successor) {
                    throw new UserException(Location.file(path.toString()), PlanMessage.ISSUED_FILE_PROTECTED, path, rev);
                }
            }
        }
        save(path, plan);
    }

    private static void save(Path path, StudyPlan plan) {
        byte[] bytes = toBytes(plan);
        Path target = path.toAbsolutePath();
        // a new file gets the ordinary permissions (umask), a replaced one keeps the old file's (AtomicFile)
        try (AtomicFile.Pending file = AtomicFile.begin(target)) {
            file.write(out -> out.write(bytes));
            if (Files.exists(target)) {
                Files.copy(target, target.resolveSibling(target.getFileName() + ".bak"), StandardCopyOption.REPLACE_EXISTING,
                        StandardCopyOption.COPY_ATTRIBUTES);
            }
            file.commit();
        } catch (IOException e) {
            throw new UserException(Location.file(path.toString()), PlanMessage.CANNOT_WRITE, describe(e));
        }
    }

    private static PlanJson.File parse(byte[] bytes, Location where) {
        // A well-formed plan is read once, straight into the records. Anything else (or a header that is not
        // this format and version) is read again below as a tree first, so every refusal is the one it was
        // when every file was read twice; PlanFilesTest covers both ways.
        try {
            PlanJson.File f = MAPPER.readValue(bytes, PlanJson.File.class);
            if (f != null && PlanJson.FORMAT.equals(f.format()) && f.formatVersion() != null
                    && f.formatVersion() == PlanJson.VERSION) {
                return f;
            }
        } catch (IOException e) {
            // refused below with the message of the checked reading
        }
        return parseChecked(bytes, where);
    }

    private static PlanJson.File parseChecked(byte[] bytes, Location where) {
        JsonNode tree;
        try {
            tree = MAPPER.readTree(bytes);
        } catch (JsonProcessingException e) {
            throw JsonTrouble.of(e, where, bytes);
        } catch (IOException e) {
            throw new UserException(where, PlanMessage.CANNOT_READ, describe(e));
        }
        if (tree == null || tree.isMissingNode()) {
            throw new UserException(where, PlanMessage.EMPTY_FILE);
        }
        if (!tree.isObject()) {
            throw new UserException(where, PlanMessage.WRONG_TYPE, "$", "an object");
        }
        JsonNode format = tree.get("format");
        if (format == null || !format.isTextual() || !PlanJson.FORMAT.equals(format.asText())) {
            throw new UserException(where, PlanMessage.NOT_A_PLAN, format == null ? "missing" : format.toString());
        }
        JsonNode version = tree.get("formatVersion");
        if (version == null || !version.isInt() || version.asInt() != PlanJson.VERSION) {
            throw new UserException(where, PlanMessage.UNKNOWN_VERSION, version == null ? "missing" : version.toString(),
                    PlanJson.VERSION);
        }
        try {
            return MAPPER.readValue(bytes, PlanJson.File.class);
        } catch (UnrecognizedPropertyException e) {
            throw new UserException(where, PlanMessage.UNKNOWN_FIELD, JsonPaths.of(e.getPath()), e.getPropertyName());
        } catch (MismatchedInputException e) {
            String wanted = e.getTargetType() == null ? "another kind of value" : JsonPaths.kind(e.getTargetType());
            throw new UserException(where, PlanMessage.WRONG_TYPE, JsonPaths.of(e.getPath()), wanted);
        } catch (JsonMappingException e) {
            // the records take any value of their type; what is left is a value of the wrong kind
            throw new UserException(where, PlanMessage.WRONG_TYPE, JsonPaths.of(e.getPath()), "another kind of value");
        } catch (JsonProcessingException e) {
            throw JsonTrouble.of(e, where, bytes);
        } catch (IOException e) {
            throw new UserException(where, PlanMessage.CANNOT_READ, describe(e));
        }
    }

    /** What went wrong with the file, in words (the file's name is already in front of the message). */
    private static String describe(IOException e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return m.equalsIgnoreCase("Is a directory") ? "it is a folder, not a file" : m;
    }
}
