package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A bad convention value gets the same one line from every command that reads it ({@link OptionValues}):
 * exit 2, nothing on standard output, no file written, the reader's file untouched. The expected lines are
 * the {@link OptionMessage} templates filled in by hand, with the enums' own words after the option.
 */
class OptionValuesCommandTest {

    @TempDir
    Path dir;

    private Path readings;
    private Path plan;
    private String readingsBefore;

    @BeforeEach
    void files() throws Exception {
        readings = dir.resolve("r.csv");
        // invented readings, eight individuals
        Files.writeString(readings, "value\n1.00\n1.20\n0.90\n1.10\n1.05\n0.95\n1.02\n0.98\n");
        readingsBefore = Files.readString(readings);
        plan = dir.resolve("p.json");
    }

    private List<String[]> everyCommand(String... extra) {
        List<String[]> out = new ArrayList<>();
        out.add(join(List.of("size", "--target", "1.33", "--expected", "1.8"), extra));
        out.add(join(List.of("estimate", readings.toString()), extra));
        out.add(join(List.of("plan", "new", "--out", plan.toString(), "--part", "p", "--characteristic", "c",
                "--unit", "mm", "--target", "1.33", "--expected", "1.8", "--subgroup-size", "5", "--subgroups", "25",
                "--zone", "UTC", "--start", "2027-03-01T06:00"), extra));
        return out;
    }

    private static String[] join(List<String> head, String... extra) {
        List<String> all = new ArrayList<>(head);
        all.addAll(List.of(extra));
        return all.toArray(new String[0]);
    }

    private void refusedAlike(String line, String[]... commands) throws Exception {
        for (String[] args : commands) {
            CommandRun r = CommandRun.run(args);
            String what = String.join(" ", args);
            assertEquals(2, r.code(), what);
            assertEquals("proofrun: " + line, r.err().strip(), what);
            assertEquals("", r.out(), what);
            assertFalse(Files.exists(plan), what);
            assertEquals(readingsBefore, Files.readString(readings), what);
        }
    }

    @Test
    void anUnknownIndexIsRefusedAlikeBySizeAndPlanNew() throws Exception {
        List<String[]> c = everyCommand("--lsl", "1", "--usl", "2", "--index", "cpq");
        refusedAlike("--index: unknown index 'cpq' (cp, cpu, cpl, cpk, pp, ppu, ppl or ppk)", c.get(0), c.get(2));
    }

    @Test
    void anUnknownSigmaMethodIsRefusedAlikeBySizeAndEstimate() throws Exception {
        List<String[]> c = everyCommand("--usl", "2", "--sigma", "rbr");
        refusedAlike("--sigma: unknown sigma method 'rbr' (rbar, sbar, pooled or mr)", c.get(0), c.get(1));
    }

    @Test
    void anUnknownBoundMethodIsRefusedAlikeBySizeAndEstimate() throws Exception {
        List<String[]> c = everyCommand("--usl", "2", "--bound", "approx");
        refusedAlike("--bound: unknown bound method 'approx' (exact or bissell)", c.get(0), c.get(1));
    }

    @Test
    void reversedOrMissingLimitsAreRefusedAlikeByEveryCommand() throws Exception {
        refusedAlike("--lsl 3.0 must be below --usl 2.0", everyCommand("--lsl", "3", "--usl", "2").toArray(String[][]::new));
        refusedAlike("--usl must be a finite number: Infinity",
                everyCommand("--usl", "Infinity").toArray(String[][]::new));
        List<String[]> none = everyCommand();
        // size needs no limits beside --expected; with --mean and --sd it does
        refusedAlike("give at least one specification limit: --lsl, --usl or both",
                join(List.of("size", "--target", "1.33", "--mean", "10", "--sd", "0.1")), none.get(1), none.get(2));
    }

    @Test
    void aConfidenceOutsideTheBoundsRangeIsRefusedAlikeByEveryCommand() throws Exception {
        // the range is CapabilityBounds.MIN_CONFIDENCE..MAX_CONFIDENCE, both ends excluded
        refusedAlike("--confidence must lie between 0.5 and 0.9999, got 0.5",
                everyCommand("--usl", "2", "--confidence", "0.5").toArray(String[][]::new));
        refusedAlike("--confidence must lie between 0.5 and 0.9999, got 0.9999",
                everyCommand("--usl", "2", "--confidence", "0.9999").toArray(String[][]::new));
    }

    @Test
    void specSidesAreReadOnce() throws Exception {
        String[] size = {"size", "--target", "1.33", "--expected", "1.8", "--spec"};
        refusedAlike("--spec: unknown specification sides 'both' (two-sided, upper or lower)", join(List.of(size), "both"));
        refusedAlike("--spec does not match the limits given", join(List.of(size), "upper", "--lsl", "1"));
    }

    /** Option values follow the one number rule (text.Decimals with a point), not Java's parser. */
    @Test
    void numbersInOptionsFollowTheOneRule() {
        for (String[] bad : new String[][] {{"0x1p-1", "'0x1p-1' is not a number"}, {"0.95d", "'0.95d' is not a number"},
            {"0,95", "'0,95' is not a number (use a decimal point: 0.95)"}}) {
            CommandRun r = CommandRun.run("size", "--target", "1.33", "--expected", "1.8", "--confidence", bad[0]);
            assertEquals(2, r.code(), bad[0]);
            assertEquals("proofrun size: Invalid value for option '--confidence': " + bad[1], r.err().lines().findFirst().orElse(""));
            assertEquals("", r.out(), bad[0]);
        }
        assertEquals(0.95, ProofrunCommand.optionNumber(" 0.95 "), 0.0);
        assertEquals(1.5e-3, ProofrunCommand.optionNumber("1.5e-3"), 0.0);
    }
}
