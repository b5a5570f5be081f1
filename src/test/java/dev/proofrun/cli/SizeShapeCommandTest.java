package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.proofrun.stats.FoldedNormalPower;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PercentilePower;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.PercentileIndex;
import dev.proofrun.stats.ShapeFit;
import dev.proofrun.stats.ShapeFitter;
import dev.proofrun.stats.SpecLimits;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.api.Test;

/** {@code size --shape NAME --skewness G}: k per n with the power of the grader's percentile bound. */
class SizeShapeCommandTest {

    private final LastRun cli = new LastRun();

    @Test
    void aLognormalTableReachesTheWantedPowerOnEveryRow() throws Exception {
        // skewness 0.7782516357974832 is a lognormal with sigma of ln x 0.25 (SciPy 1.17.1:
        // scipy.stats.lognorm.stats(0.25, moments='s'))
        assertEquals(0, cli.run("size", "--shape", "lognormal", "--skewness", "0.7782516357974832", "--spec", "upper",
                "--target", "1.33", "--expected", "1.67", "--subgroup-size", "1", "--subgroup-size", "5", "--json"), cli.err());
        JsonNode j = new ObjectMapper().readTree(cli.out());
        assertEquals("iso-22514-2-percentile", j.get("method").asText());
        assertEquals(0.25, j.get("sigmaOfLog").asDouble(), 1e-9);
        assertEquals(2, j.get("rows").size());
        for (JsonNode r : j.get("rows")) {
            assertTrue(r.get("power").asDouble() >= 0.9, r.toString());
            assertTrue(r.get("subgroups").asInt() >= 25, r.toString());
            // the bound's power is the planner's at the row's own N; the whole procedure's is below it by the gates
            // (the 1 % shape check and the stability step's false-unstable rate at that n, k)
            double bound = PercentilePower.power(ShapeFamily.LOGNORMAL, 0.25, IndexKind.Side.UPPER, 1.33, 1.67, 0.95,
                    r.get("readings").asInt());
            assertEquals(bound, r.get("boundPower").asDouble(), 1e-12);
            double gates = r.get("power").asDouble() / bound;
            assertTrue(gates < 0.99 + 1e-12 && gates > 0.95, r.toString());
        }
        assertEquals(0, cli.run("size", "--shape", "lognormal", "--skewness", "0.78", "--spec", "upper", "--target", "1.33",
                "--expected", "1.67", "--subgroup-size", "5"), cli.err());
        assertTrue(cli.out().contains("Planned shape lognormal") && cli.out().contains("the shape check (1 %) and the stability step"), cli.out());
    }

    @Test
    void aFoldedNormalTableIsPlannedThroughItsOwnBound() throws Exception {
        // skewness 0.7017499382606746 is a folded normal with mean/sigma 1 (SciPy 1.17.1:
        // scipy.stats.foldnorm.stats(1, moments='s'))
        assertEquals(0, cli.run("size", "--shape", "folded-normal", "--skewness", "0.7017499382606746", "--spec", "upper",
                "--target", "1.33", "--expected", "2.0", "--subgroup-size", "5", "--json"), cli.err());
        JsonNode j = new ObjectMapper().readTree(cli.out());
        assertEquals("folded-normal", j.get("shape").asText());
        assertEquals(1.0, j.get("meanRatio").asDouble(), 1e-7);
        assertEquals(FoldedNormalPower.STUDY_SEED, j.get("studySeed").asLong());
        JsonNode r = j.get("rows").get(0);
        assertTrue(r.get("power").asDouble() >= 0.9, r.toString());
        double bound = FoldedNormalPower.power(j.get("meanRatio").asDouble(), IndexKind.Side.UPPER, 1.33, 2.0, 0.95,
                r.get("readings").asInt());
        assertEquals(bound, r.get("boundPower").asDouble(), 1e-12);
        double gates = r.get("power").asDouble() / bound;
        assertTrue(gates < 0.99 + 1e-12 && gates > 0.95, r.toString());
    }

    @TempDir
    Path dir;

    @Test
    void aPilotFitsTheDeclaredShapeForTheSkewnessAndTheExpectedIndex() throws Exception {
        // invented pilot: 60 lognormal readings, median 0.42, sigma of ln x 0.16 (Commons RNG XO_RO_SHI_RO_128_PP seed 5, 4 decimals)
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(5L);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        StringBuilder sb = new StringBuilder("value\n");
        double[] x = new double[60];
        for (int i = 0; i < x.length; i++) {
            x[i] = Math.rint(1e4 * Math.exp(Math.log(0.42) + 0.16 * g.sample())) / 1e4;
            sb.append(x[i]).append('\n');
        }
        Path pilot = dir.resolve("pilot.csv");
        Files.writeString(pilot, sb.toString());
        assertEquals(0, cli.run("size", "--shape", "lognormal", "--pilot", pilot.toString(), "--usl", "0.8", "--target", "1.33",
                "--subgroup-size", "5", "--json"), cli.err());
        JsonNode j = new ObjectMapper().readTree(cli.out());
        ShapeFit fit = ShapeFitter.fit(ShapeFamily.LOGNORMAL, x).fit();
        assertEquals(fit.scale(), j.get("sigmaOfLog").asDouble(), 1e-9);
        assertEquals(PercentileIndex.of(IndexKind.CPK, SpecLimits.upperOnly(0.8), fit), j.get("expected").asDouble(), 1e-12);
        assertTrue(j.get("pilot").asText().contains("the pilot's own uncertainty is not in the power"), j.toString());
        // a reading at zero: the shape cannot be fitted, said with the pilot file
        Files.writeString(pilot, "value\n0.4\n0\n0.5\n0.45\n");
        assertEquals(2, cli.run("size", "--shape", "lognormal", "--pilot", pilot.toString(), "--usl", "0.8", "--target", "1.33"));
        assertTrue(cli.err().contains("pilot.csv") && cli.err().contains("cannot be fitted"), cli.err());
    }

    @Test
    void refusalsAreOneLineWithExitTwo() {
        assertEquals(2, cli.run("size", "--shape", "gamma", "--skewness", "1", "--spec", "upper", "--target", "1.33", "--expected", "1.67"));
        assertTrue(cli.err().contains("normal, lognormal, weibull, folded-normal"), cli.err());
        assertEquals(1, cli.err().trim().lines().count(), cli.err());
        // the folded normal: a skewness above the half-normal's, and a lower limit that the index puts below zero
        assertEquals(2, cli.run("size", "--shape", "folded-normal", "--skewness", "1.2", "--spec", "upper", "--target", "1.33",
                "--expected", "1.67"));
        assertTrue(cli.err().contains("a folded-normal shape has a skewness between"), cli.err());
        assertEquals(1, cli.err().trim().lines().count(), cli.err());
        assertEquals(2, cli.run("size", "--shape", "folded-normal", "--skewness", "0.99", "--spec", "lower", "--target", "1.33",
                "--expected", "1.67"));
        assertTrue(cli.err().contains("at or below zero"), cli.err());
        assertEquals(1, cli.err().trim().lines().count(), cli.err());
        assertEquals(2, cli.run("size", "--shape", "weibull", "--spec", "upper", "--target", "1.33", "--expected", "1.67"));
        assertTrue(cli.err().contains("--skewness"), cli.err());
        assertEquals(2, cli.run("size", "--shape", "weibull", "--skewness", "1", "--target", "1.33", "--expected", "1.67"));
        assertTrue(cli.err().contains("--spec upper or --spec lower"), cli.err());
        assertEquals(2, cli.run("size", "--shape", "lognormal", "--skewness", "-1", "--spec", "upper", "--target", "1.33",
                "--expected", "1.67"));
        assertTrue(cli.err().contains("a lognormal shape has a skewness between"), cli.err());
        assertEquals(1, cli.err().trim().lines().count(), cli.err());
    }
}
