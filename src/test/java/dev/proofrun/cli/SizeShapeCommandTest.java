package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PercentilePower;
import dev.proofrun.stats.ShapeFamily;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** {@code size --shape NAME --skewness G}: k per n with the power of the grader's percentile bound. */
class SizeShapeCommandTest {

    private String out;
    private String err;

    private int run(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = ProofrunCommand.run(new PrintWriter(o, true), new PrintWriter(e, true), args);
        out = o.toString();
        err = e.toString();
        return code;
    }

    @Test
    void aLognormalTableReachesTheWantedPowerOnEveryRow() throws Exception {
        // skewness 0.7782516357974832 is a lognormal with sigma of ln x 0.25 (SciPy 1.17.1:
        // scipy.stats.lognorm.stats(0.25, moments='s'))
        assertEquals(0, run("size", "--shape", "lognormal", "--skewness", "0.7782516357974832", "--spec", "upper",
                "--target", "1.33", "--expected", "1.67", "--subgroup-size", "1", "--subgroup-size", "5", "--json"), err);
        JsonNode j = new ObjectMapper().readTree(out);
        assertEquals("iso-22514-2-percentile", j.get("method").asText());
        assertEquals(0.25, j.get("sigmaOfLog").asDouble(), 1e-9);
        assertEquals(2, j.get("rows").size());
        for (JsonNode r : j.get("rows")) {
            assertTrue(r.get("power").asDouble() >= 0.9, r.toString());
            assertTrue(r.get("subgroups").asInt() >= 25, r.toString());
            // the row's power is the planner's at its own N
            assertEquals(PercentilePower.power(ShapeFamily.LOGNORMAL, 0.25, IndexKind.Side.UPPER, 1.33, 1.67, 0.95,
                    r.get("readings").asInt()), r.get("power").asDouble(), 1e-12);
        }
        assertEquals(0, run("size", "--shape", "lognormal", "--skewness", "0.78", "--spec", "upper", "--target", "1.33",
                "--expected", "1.67", "--subgroup-size", "5"), err);
        assertTrue(out.contains("Planned shape lognormal") && out.contains("It does not count the shape check"), out);
    }

    @Test
    void refusalsAreOneLineWithExitTwo() {
        assertEquals(2, run("size", "--shape", "gamma", "--skewness", "1", "--spec", "upper", "--target", "1.33", "--expected", "1.67"));
        assertTrue(err.contains("normal, lognormal, weibull"), err);
        assertEquals(2, run("size", "--shape", "weibull", "--spec", "upper", "--target", "1.33", "--expected", "1.67"));
        assertTrue(err.contains("--skewness"), err);
        assertEquals(2, run("size", "--shape", "weibull", "--skewness", "1", "--target", "1.33", "--expected", "1.67"));
        assertTrue(err.contains("--spec upper or --spec lower"), err);
        assertEquals(2, run("size", "--shape", "lognormal", "--skewness", "-1", "--spec", "upper", "--target", "1.33",
                "--expected", "1.67"));
        assertTrue(err.contains("a lognormal shape has a skewness between"), err);
        assertEquals(1, err.trim().lines().count(), err);
    }
}
