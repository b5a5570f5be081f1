package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class EstimateCommandTest {

    @TempDir
    Path dir;

    private final LastRun cli = new LastRun();

    /** The shaft demo data of CapabilityAnalysisTest in the x1..x4 layout. */
    private Path shaft() throws IOException {
        return shaftCsv(dir);
    }

    /** The shaft readings written as {@code shaft.csv} in {@code dir}; the golden-output harness uses them too. */
    static Path shaftCsv(Path dir) throws IOException {
        StringBuilder sb = new StringBuilder("slot,x1,x2,x3,x4\n");
        int i = 1;
        for (double[] g : dev.proofrun.capability.CapabilityAnalysisTest.SHAFT) {
            sb.append("S").append(i++);
            for (double x : g) {
                sb.append(',').append(x);
            }
            sb.append('\n');
        }
        Path p = dir.resolve("shaft.csv");
        Files.writeString(p, sb);
        return p;
    }

    @Test
    void textReportShowsIndicesBoundsAndTheCaution() throws IOException {
        assertEquals(0, cli.run("estimate", shaft().toString(), "--lsl", "11.97", "--usl", "12.03"), cli.err());
        String text = cli.out();
        assertTrue(text.contains("40 readings in 10 subgroups of 4"), text);
        assertTrue(text.contains("Cpk"), text);
        assertTrue(text.contains("1.596"), text); // Cpk, see CapabilityAnalysisTest
        assertTrue(text.contains("Caution:"), text);
        assertEquals("", cli.err());
    }

    @Test
    void jsonHasTheAgreedKeysAndNulls() throws IOException {
        assertEquals(0, cli.run("estimate", shaft().toString(), "--usl", "12.03", "--json", "--bound", "bissell"));
        JsonNode j = new ObjectMapper().readTree(cli.out());
        List<String> keys = new ArrayList<>();
        j.fieldNames().forEachRemaining(keys::add);
        assertEquals(List.of("readings", "subgroups", "subgroupSize", "mean", "sigmaWithin", "sigmaOverall",
                "sigmaMethod", "cp", "cpu", "cpl", "cpk", "pp", "ppu", "ppl", "ppk", "cpm", "confidence", "bound",
                "lower", "degreesOfFreedom", "ppm", "normality"), keys);
        assertTrue(j.get("cp").isNull());
        assertTrue(j.get("cpm").isNull());
        assertEquals(40, j.get("readings").asInt());
        assertEquals("bissell", j.get("bound").asText());
        // one-sided: exact noncentral-t bound, SciPy 1.17.1 (see CapabilityAnalysisTest)
        assertEquals(1.395889270151466, j.get("lower").get("ppk").asDouble(), 1e-7);
    }

    @Test
    void nominalSetsTheCpmTarget() throws IOException {
        assertEquals(0, cli.run("estimate", shaft().toString(), "--lsl", "11.97", "--usl", "12.03", "--nominal", "12.004",
                "--json", "--sigma", "pooled", "--confidence", "0.9"));
        JsonNode j = new ObjectMapper().readTree(cli.out());
        assertEquals("pooled", j.get("sigmaMethod").asText());
        assertEquals(30, j.get("degreesOfFreedom").get("within").asDouble(), 0);
        assertEquals(0.9, j.get("confidence").asDouble(), 0);
        assertFalse(j.get("cpm").isNull());
    }

    private void refused(String expected, String... args) {
        assertEquals(2, cli.run(args), cli.out());
        String e = cli.err();
        assertTrue(e.contains(expected), e);
        assertEquals(1, e.strip().lines().count(), "one line: " + e);
        assertFalse(e.contains("Exception") || e.contains("\tat "), e);
        assertEquals("", cli.out(), "no partial output");
    }

    @Test
    void missingFile() {
        refused("none.csv: file not found", "estimate", dir.resolve("none.csv").toString(), "--usl", "1");
    }

    /** Files that are not readings: the file's name, its content, the options, the words of the refusal. */
    static Stream<Arguments> badFiles() {
        return Stream.of(
                Arguments.of("h.csv", "1.0\n2.0\n", List.of("--usl", "3"), "h.csv, row 1: no header"),
                Arguments.of("n.csv", "value\n1.0\n2,0\n", List.of("--usl", "3"), "n.csv, row 3: 2 cells but the header has 1"),
                Arguments.of("m.csv", "value\n1.0\n2.0 mm\n", List.of("--usl", "3"),
                        "m.csv, row 3, column value: not a number: '2.0 mm'"),
                Arguments.of("e.csv", "", List.of("--usl", "3"), "e.csv: the file is empty"),
                Arguments.of("one.csv", "value\n1.0\n", List.of("--usl", "3"), "one.csv: need at least 2 readings, found 1"),
                Arguments.of("u.csv", "x1,x2,x3\n1,2,3\n2,3,\n1,2,2\n", List.of("--usl", "9", "--sigma", "rbar"),
                        "R-bar/d2 needs equal subgroup sizes"));
    }

    @ParameterizedTest(name = "{0}: {3}")
    @MethodSource("badFiles")
    void aBadFileIsRefused(String name, String content, List<String> options, String expected) throws IOException {
        Path p = Files.writeString(dir.resolve(name), content);
        refused(expected, args(p, options));
    }

    /** Bad options on the shaft's good readings: the options, the words of the refusal. */
    static Stream<Arguments> badOptions() {
        return Stream.of(
                Arguments.of(List.of("--lsl", "12.03", "--usl", "11.97"), "--lsl 12.03 must be below --usl 11.97"),
                Arguments.of(List.of(), "give at least one specification limit"),
                Arguments.of(List.of("--usl", "12.03", "--sigma", "foo"), "unknown sigma method 'foo'"),
                Arguments.of(List.of("--usl", "12.03", "--confidence", "1.5"), "confidence must lie between 0.5 and 0.9999"));
    }

    @ParameterizedTest(name = "{0}: {1}")
    @MethodSource("badOptions")
    void aBadOptionIsRefused(List<String> options, String expected) throws IOException {
        refused(expected, args(shaft(), options));
    }

    private static String[] args(Path file, List<String> options) {
        List<String> a = new ArrayList<>(List.of("estimate", file.toString()));
        a.addAll(options);
        return a.toArray(new String[0]);
    }

    @Test
    void roundingIsNamedAsTheLikelyCauseOfARejectedNormalityTest() throws IOException {
        // invented hardness readings: 500 normal readings (mean 61, sd 0.3 HRC, seeded) read to 0.1 HRC, so they
        // take about 17 values and the ties make Anderson-Darling reject; spread over the step they do not
        org.apache.commons.rng.UniformRandomProvider rng =
                org.apache.commons.rng.simple.RandomSource.XO_RO_SHI_RO_128_PP.create(5L);
        org.apache.commons.rng.sampling.distribution.ZigguratSampler.NormalizedGaussian g =
                org.apache.commons.rng.sampling.distribution.ZigguratSampler.NormalizedGaussian.of(rng);
        StringBuilder rounded = new StringBuilder("value\n");
        StringBuilder raw = new StringBuilder("value\n");
        for (int i = 0; i < 500; i++) {
            double x = 61 + 0.3 * g.sample();
            rounded.append(java.math.BigDecimal.valueOf(Math.round(x * 10) / 10.0).toPlainString()).append('\n');
            raw.append(x).append('\n');
        }
        Path p = Files.writeString(dir.resolve("hrc.csv"), rounded);
        assertEquals(0, cli.run("estimate", p.toString(), "--lsl", "58", "--usl", "64"), cli.err());
        assertTrue(cli.out().contains("The readings do not look normal"), cli.out());
        assertTrue(cli.out().contains("The readings lie on a grid of 0.1"), cli.out());
        assertTrue(cli.out().contains("rounding by the gauge is the likely cause"), cli.out());
        Path q = Files.writeString(dir.resolve("raw.csv"), raw);
        assertEquals(0, cli.run("estimate", q.toString(), "--lsl", "58", "--usl", "64"), cli.err());
        assertTrue(!cli.out().contains("rounding by the gauge"), cli.out());
    }
}
