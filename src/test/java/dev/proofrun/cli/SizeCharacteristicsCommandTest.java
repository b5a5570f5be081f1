package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code proofrun size --characteristics FILE.csv}: one design for several characteristics on the same parts. */
class SizeCharacteristicsCommandTest {

    private static final String HEADER = "id,name,unit,nominal,lsl,usl,target,expected,index,confidence,expected_cp\n";
    // invented characteristics of an invented valve body; seat-h is the hardest (expected 1.55, off centre)
    private static final String THREE = HEADER
            + "bore-a,Bore A diameter,mm,12.000,11.980,12.020,1.33,1.67,,,\n"
            + "seat-h,Seat height,mm,4.50,4.40,4.60,1.33,1.55,cpk,,1.70\n"
            + "flow,Flow at 2 bar,l/min,,3.2,,1.33,2.1,cpl,,\n";

    @TempDir
    Path dir;

    private Path csv(String text) throws IOException {
        Path f = dir.resolve("chars.csv");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }

    @Test
    void jsonGivesOneSharedDesignWithTheDriverNamed() throws Exception {
        Path f = csv(THREE);
        CommandRun r = run("size", "--characteristics", f.toString(), "--subgroup-size", "4", "--subgroup-size", "5", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertEquals(List.of("characteristics", "designs", "recommended", "warnings"), names(root));
        assertEquals(2, root.get("designs").size());
        for (JsonNode d : root.get("designs")) {
            assertEquals(List.of("subgroupSize", "subgroups", "readings", "driver", "limitedBy", "characteristics",
                    "allDemonstratedIfIndependent", "falseAlarm", "detection", "anySignalFalseAlarm", "anySignalDetection"),
                    names(d));
            int k = d.get("subgroups").asInt();
            int largest = 0;
            double product = 1;
            double lowest = 1;
            for (JsonNode c : d.get("characteristics")) {
                largest = Math.max(largest, c.get("subgroupsAlone").asInt());
                assertTrue(c.get("power").asDouble() >= 0.9, c.toString());
                product *= c.get("power").asDouble();
                lowest = Math.min(lowest, c.get("power").asDouble());
            }
            // P(all pass) for independent events is the product (each power printed to 4 decimals, hence 1e-3)
            double all = d.get("allDemonstratedIfIndependent").asDouble();
            assertEquals(product, all, 1e-3);
            assertTrue(all <= lowest + 1e-4, "all together pass no more often than the weakest alone: " + all);
            assertEquals(largest, k, "k is the largest any characteristic needs");
            assertEquals("seat-h", d.get("driver").asText());
            // the driver's k is what `size` gives for it alone at this n
            CommandRun alone = run("size", "--target", "1.33", "--expected", "1.55", "--expected-cp", "1.70",
                    "--subgroup-size", d.get("subgroupSize").asText(), "--json");
            assertEquals(k, new ObjectMapper().readTree(alone.out()).get("recommended").get("subgroups").asInt());
            assertEquals(d.get("subgroupSize").asInt() * k, d.get("readings").asInt());
        }
        JsonNode rec = root.get("recommended");
        assertTrue(rec.get("reason").asText().contains("seat-h needs the most subgroups"), rec.toString());
        int fewest = Integer.MAX_VALUE;
        for (JsonNode d : root.get("designs")) {
            fewest = Math.min(fewest, d.get("readings").asInt());
        }
        assertEquals(fewest, rec.get("readings").asInt());
    }

    @Test
    void textNamesEveryCharacteristicAndTheDriver() throws Exception {
        Path f = csv(THREE);
        CommandRun r = run("size", "--characteristics", f.toString(), "--subgroup-size", "5");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("One design for 3 characteristics"), r.out());
        assertTrue(r.out().lines().anyMatch(l -> l.contains("seat-h") && l.endsWith("drives k")), r.out());
        assertTrue(r.out().contains("bore-a") && r.out().contains("flow"), r.out());
        assertTrue(r.out().contains("With 3 characteristics the chance that at least one is called unstable is higher"), r.out());
        assertTrue(r.out().contains("The part needs all 3 demonstrated in this one study"), r.out());
        assertTrue(r.out().contains("does not replace the customer's requirements"), r.out());
    }

    @Test
    void aBadCellGivesFileRowAndColumnAndExitTwo() throws Exception {
        Path f = csv(HEADER + "bore-a,Bore A,mm,12,11.98,12.02,1.33,1.67,,,\n"
                + "seat-h,Seat height,mm,4.50,4.40,4.6O,1.33,1.55,cpk,,1.70\n");
        String before = Files.readString(f);
        CommandRun r = run("size", "--characteristics", f.toString());
        assertEquals(2, r.code());
        assertEquals("", r.out());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains(f + ", row 3, column usl: not a number: '4.6O'"), r.err());
        assertTrue(!r.err().contains("Exception"), r.err());
        assertEquals(before, Files.readString(f), "the user's file is untouched");
        // a decimal comma splits a number and shifts the cells: the row is refused as too wide
        Files.writeString(f, HEADER + "seat-h,Seat height,mm,4.50,4.40,4,60,1.33,1.55,cpk,,1.70\n");
        CommandRun comma = run("size", "--characteristics", f.toString());
        assertEquals(2, comma.code());
        assertTrue(comma.err().contains(f + ", row 2: 12 cells but the header has 11 (a decimal comma?"), comma.err());
    }

    @Test
    void aMissingColumnIsNamedOnRowOne() throws Exception {
        Path f = csv("id,name,unit,nominal,lsl,usl,target\nbore-a,Bore A,mm,12,11.98,12.02,1.33\n");
        CommandRun r = run("size", "--characteristics", f.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains(f + ", row 1, column expected"), r.err());
    }

    @Test
    void refusalsAboutOneCharacteristicNameIt() throws Exception {
        Path f = csv(HEADER + "bore-a,Bore A,mm,12,11.98,12.02,1.33,1.67,,,\n"
                + "seat-h,Seat height,mm,4.50,4.40,4.60,1.33,1.25,,,\n");
        CommandRun r = run("size", "--characteristics", f.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains(f + ": characteristic seat-h: expected Cpk 1.250 is not above the required 1.330"),
                r.err());
        Path g = dir.resolve("upper.csv");
        Files.writeString(g, HEADER + "burr,Burr height,mm,,,0.05,1.33,1.8,cp,,\n");
        CommandRun u = run("size", "--characteristics", g.toString());
        assertEquals(2, u.code());
        // an index the limits cannot give is refused where the file is read, at its row
        assertTrue(u.err().contains(g + ", row 2, column id: Cp needs the limit(s) this specification lacks"), u.err());
    }

    @Test
    void singleCharacteristicOptionsAreRefusedBesideTheFile() throws Exception {
        Path f = csv(THREE);
        CommandRun r = run("size", "--characteristics", f.toString(), "--target", "1.33", "--expected", "1.67");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("leave out --target, --expected"), r.err());
        CommandRun none = run("size", "--expected", "1.67");
        assertEquals(2, none.code());
        assertTrue(none.err().contains("give --target"), none.err());
    }

    private static List<String> names(JsonNode node) {
        List<String> out = new ArrayList<>();
        node.fieldNames().forEachRemaining(out::add);
        return out;
    }

    @Test
    void aMissingCharacteristicsFileIsNamedAsSuch() {
        Path missing = dir.resolve("no-such.csv");
        CommandRun r = run("size", "--characteristics", missing.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("cannot read the characteristics file") && r.err().contains("no-such.csv")
                && !r.err().contains("plan file"), r.err());
        assertEquals("", r.out());
    }
}
