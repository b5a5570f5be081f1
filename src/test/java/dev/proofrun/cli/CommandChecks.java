package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;

/** Checks the command tests share: a refusal in one line, the first characteristic of {@code grade --json}, the report's text. */
final class CommandChecks {

    private CommandChecks() {
    }

    /**
     * Runs {@code args} and checks the refusal: exit 2, one line on standard error that holds {@code words} and
     * {@code option}, no stack trace, and {@code file} not written.
     */
    static void assertRefusedInOneLine(LastRun cli, String[] args, String words, String option, Path file) {
        assertEquals(2, cli.run(args), String.join(" ", args) + ": " + cli.out() + cli.err());
        String e = cli.err().trim();
        assertEquals(1, e.lines().count(), e);
        assertTrue(e.contains(words) && e.contains(option), e);
        assertFalse(e.contains("Exception"), e);
        assertFalse(Files.exists(file), e);
    }

    /** Runs {@code grade PLAN DATA --json} (exit 0) and returns its first characteristic. */
    static JsonNode firstGradedJson(LastRun cli, Path plan, Path data) throws Exception {
        assertEquals(0, cli.run("grade", plan.toString(), data.toString(), "--json"), cli.err());
        return new ObjectMapper().readTree(cli.out()).get("characteristics").get(0);
    }

    /** Runs {@code grade PLAN DATA --report PDF} (exit 0) and returns the report's text, runs of white space as one space. */
    static String reportText(LastRun cli, Path plan, Path data, Path pdf) throws Exception {
        assertEquals(0, cli.run("grade", plan.toString(), data.toString(), "--report", pdf.toString()), cli.err());
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(pdf))) {
            return new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
    }
}
