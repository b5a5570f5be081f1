package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line's outputs, byte for byte, against the stored record of them: what each command printed, its exit
 * code, and every file it wrote (text files in full, a PDF by its text, a workbook by the SHA-256 of each part). It guards refactorings that must
 * not change what a user sees; a change that means to alter an output regenerates that record with
 * {@code mvn -B -q test -Dtest=GoldenOutputTest -Dgolden.update=true} and says why in its commit.
 *
 * <p>The scenario is the demo plan (invented valve body) and an invented shaft's readings; the temporary
 * folder is written as {@code $DIR}, the time of a grade as {@code $WHEN}.
 */
class GoldenOutputTest {

    private static final Path STORED = Paths.get("src/test/resources/dev/proofrun/cli/golden-output.txt");

    @TempDir
    Path dir;

    private final StringBuilder seen = new StringBuilder();

    @Test
    void commandLineOutputsAreUnchanged() throws IOException {
        Path demo = dir.resolve("demo");
        String plan = demo.resolve("demo-valve-body.json").toString();
        String returned = demo.resolve("demo-valve-body-returned.csv").toString();
        Path shaft = EstimateCommandTest.shaftCsv(dir); // CapabilityAnalysisTest.SHAFT, invented

        run("demo", "--out", demo.toString());
        run("plan", "show", plan);
        run("plan", "show", plan, "--json");
        run("grade", plan, returned);
        run("grade", plan, returned, "--json");
        run("grade", plan, returned, "--report", dir.resolve("grade.pdf").toString());
        run("sheet", plan, "--out", dir.resolve("handout").toString());
        run("sheet", plan, "--out", dir.resolve("handout-letter").toString(), "--paper", "letter", "--draft");
        run("estimate", shaft.toString(), "--lsl", "11.97", "--usl", "12.03");
        run("estimate", shaft.toString(), "--lsl", "11.97", "--usl", "12.03", "--bound", "bissell", "--json");
        run("estimate", shaft.toString(), "--usl", "12.03", "--confidence", "0.99");
        run("estimate", shaft.toString(), "--usl", "12.03", "--confidence", "0.99999");
        run("size", "--target", "1.33", "--expected", "1.67");
        run("size", "--target", "1.33", "--expected", "1.67", "--bound", "bissell", "--json");
        run("size", "--target", "1.33", "--expected", "1.8", "--index", "cp", "--subgroup-size", "5");
        String made = dir.resolve("made.json").toString();
        run("plan", "new", "--out", made, "--id", "PR-2027-0042", "--part", "gear shaft", "--characteristic",
                "journal diameter", "--unit", "mm", "--lsl", "24.98", "--usl", "25.02", "--target", "1.33", "--expected",
                "1.8", "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin", "--shifts",
                "early=06:00-14:00,late=14:00-22:00,night=22:00-06:00", "--breaks", "09:30-09:45,18:00-18:30", "--rate",
                "80", "--start", "2027-03-01T06:00");
        run("plan", "show", made);
        run("plan", "new", "--out", dir.resolve("bad.json").toString(), "--part", "p", "--characteristic", "c", "--unit",
                "mm", "--usl", "1", "--target", "1.33", "--expected", "1.8", "--start", "2027-03-01T06:00", "--shifts",
                "early=06:00-25:00");
        run("estimate", dir.resolve("missing.csv").toString(), "--usl", "1");
        files();

        String got = seen.toString();
        if (Boolean.getBoolean("golden.update")) {
            Files.createDirectories(STORED.getParent());
            Files.writeString(STORED, got, StandardCharsets.UTF_8);
        }
        Files.writeString(Paths.get("target/golden-output.actual.txt"), got, StandardCharsets.UTF_8); // for diff(1)
        assertEquals(Files.readString(STORED, StandardCharsets.UTF_8), got);
    }

    private void run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        seen.append("$ proofrun ").append(hide(String.join(" ", args))).append('\n')
                .append("exit ").append(code).append('\n')
                .append("--out--\n").append(hide(out.toString()))
                .append("--err--\n").append(hide(err.toString())).append('\n');
    }

    /** Every file the commands wrote, in name order. */
    private void files() throws IOException {
        List<Path> all = new ArrayList<>();
        try (Stream<Path> s = Files.walk(dir)) {
            s.filter(Files::isRegularFile).filter(p -> !p.getFileName().toString().equals("shaft.csv")).sorted().forEach(all::add);
        }
        for (Path p : all) {
            String name = dir.relativize(p).toString().replace('\\', '/');
            byte[] bytes = Files.readAllBytes(p);
            if (name.endsWith(".pdf")) {
                seen.append("== ").append(name).append(" text\n").append(pdfText(bytes)).append('\n');
            } else if (name.endsWith(".xlsx")) {
                seen.append("== ").append(name).append(" parts\n").append(zipParts(p)).append('\n');
            } else {
                seen.append("== ").append(name).append('\n').append(hide(new String(bytes, StandardCharsets.UTF_8))).append('\n');
            }
        }
    }

    /** A PDF's text, page by page (its creation date and id differ on every run). */
    private String pdfText(byte[] bytes) throws IOException {
        try (PDDocument doc = Loader.loadPDF(bytes)) {
            return doc.getNumberOfPages() + " pages\n" + hide(new PDFTextStripper().getText(doc));
        }
    }

    /** A workbook's parts by SHA-256 of their content, but for the one that holds the time it was written. */
    private static String zipParts(Path file) throws IOException {
        StringBuilder sb = new StringBuilder();
        try (ZipFile zip = new ZipFile(file.toFile())) {
            for (ZipEntry e : Collections.list(zip.entries())) {
                byte[] part = zip.getInputStream(e).readAllBytes();
                sb.append(e.getName()).append(' ')
                        .append(e.getName().equals("docProps/core.xml") ? "(time written)" : sha256(part)).append('\n');
            }
        }
        return sb.toString();
    }

    private String hide(String s) {
        return s.replace(dir.toString(), "$DIR").replaceAll("Graded \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d", "Graded \\$WHEN");
    }

    private static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
