package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.PlanFiles;
import dev.proofrun.stats.ShapeFamily;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The shape a characteristic is planned with: {@code plan new --shape}, the CSV column, the plan file, {@code plan show}. */
class PlanShapeCommandTest {

    @TempDir
    Path dir;

    private final LastRun cli = new LastRun();

    private static final UpperLimitPlan PLAN =
            new UpperLimitPlan("PR-2027-0077", "pump lid", "face flatness", "0.05", "2027-03-01T06:00");

    private String[] single(Path file, String... extra) {
        return PLAN.args(file, extra);
    }

    @Test
    void aDeclaredShapeIsWrittenShownAndRead() throws Exception {
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(single(file, "--shape", "lognormal")), cli.err());
        // plan new sizes with the normal model; it says so for a skewed shape
        assertTrue(cli.out().contains("C1 is planned lognormal, but its power here is the normal model's"), cli.out());
        assertTrue(Files.readString(file).contains("\"shape\": \"lognormal\""), Files.readString(file));
        assertEquals(ShapeFamily.LOGNORMAL, PlanFiles.read(file).characteristics().get(0).shape());
        assertEquals(0, cli.run("plan", "show", file.toString()));
        assertTrue(cli.out().contains("lognormal"), cli.out());
    }

    @Test
    void theNormalShapeIsLeftOutOfTheFile() throws Exception {
        // plans written before shapes existed must keep their bytes and revision
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(single(file)), cli.err());
        assertFalse(Files.readString(file).contains("\"shape\""));
        assertEquals(ShapeFamily.NORMAL, PlanFiles.read(file).characteristics().get(0).shape());
    }

    @Test
    void anUnknownShapeIsRefusedWithTheNames() {
        Path file = dir.resolve("p.json");
        assertEquals(2, cli.run(single(file, "--shape", "gamma")));
        String e = cli.err().trim();
        assertTrue(e.contains("--shape") && e.contains("normal, lognormal, weibull, folded-normal, lognormal3 or weibull3"), e);
        assertEquals(1, e.lines().count(), e);
        assertFalse(Files.exists(file));
    }

    @Test
    void theCharacteristicsCsvHasAShapeColumn() throws Exception {
        Path csv = dir.resolve("chars.csv");
        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected,shape\n"
                + "D1,bore,mm,10,9.98,10.02,1.33,1.8,\n"
                + "R4,roughness,um,,,0.8,1.33,1.8,weibull\n", StandardCharsets.UTF_8);
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run("plan", "new", "--out", file.toString(), "--part", "lid", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin", "--start", "2027-03-01T06:00"),
                cli.err());
        assertEquals(List.of(ShapeFamily.NORMAL, ShapeFamily.WEIBULL),
                PlanFiles.read(file).characteristics().stream().map(c -> c.shape()).toList());
        assertEquals(0, cli.run("size", "--characteristics", csv.toString()), cli.err());
        assertTrue(cli.out().contains("warning: R4 is planned weibull, but its power here is the normal model's"),
                cli.out());

        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected,shape\n"
                + "R4,roughness,um,,,0.8,1.33,1.8,skewed\n", StandardCharsets.UTF_8);
        assertEquals(2, cli.run("size", "--characteristics", csv.toString()));
        String e = cli.err().trim();
        assertTrue(e.contains("chars.csv") && e.contains("row 2") && e.contains("shape")
                && e.contains("normal, lognormal, weibull, folded-normal, lognormal3 or weibull3"), e);
    }

    @Test
    void aFoldedNormalShapeIsWrittenShownReadAndWarnedAbout() throws Exception {
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(single(file, "--shape", "folded-normal")), cli.err());
        assertTrue(cli.out().contains("C1 is planned folded-normal, but its power here is the normal model's; size it"
                + " alone with 'size --shape folded-normal --skewness G --spec upper|lower'"), cli.out());
        assertTrue(Files.readString(file).contains("\"shape\": \"folded-normal\""), Files.readString(file));
        assertEquals(ShapeFamily.FOLDED_NORMAL, PlanFiles.read(file).characteristics().get(0).shape());
        assertEquals(0, cli.run("plan", "show", file.toString()));
        assertTrue(cli.out().contains("folded-normal"), cli.out());

        Path csv = dir.resolve("chars.csv");
        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected,shape\n"
                + "P2,hole position,mm,,,0.2,1.33,1.8,folded-normal\n", StandardCharsets.UTF_8);
        Path fromCsv = dir.resolve("q.json");
        assertEquals(0, cli.run("plan", "new", "--out", fromCsv.toString(), "--part", "lid", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin", "--start", "2027-03-01T06:00"),
                cli.err());
        assertEquals(ShapeFamily.FOLDED_NORMAL, PlanFiles.read(fromCsv).characteristics().get(0).shape());
    }
}
