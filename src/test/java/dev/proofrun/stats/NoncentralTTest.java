package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.statistics.distribution.NormalDistribution;
import org.hipparchus.distribution.continuous.TDistribution;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The noncentral t against mpmath 1.3.0 and Hipparchus' central t. */
class NoncentralTTest {

    /** The accuracy promised in the class Javadoc. */
    private static final double ABSOLUTE = 1e-9;
    /** Relative accuracy asked of a tail probability of at least 1e-10 (measured: below 1e-10). */
    private static final double TAIL_RELATIVE = 1e-8;

    /**
     * mpmath 1.3.0, mp.dps = 30: mp.quad of Phi(t*sqrt(x/df) - ncp) * chi2_pdf(x, df) over x, split at the
     * chi-square mode and the normal transition (the script noncentral-t-reference.py in src/test/resources).
     */
    @ParameterizedTest
    @CsvSource({
        "2.1,  24,    1.5, 0.709942749507964619294963635288",
        "300,  10000, 300, 0.49837622347204757380964802864",
        "5,    2,     3,   0.689490596212052528471904099754",
        "310,  3,     300, 0.4219305424722141073167774693070682703003",
        "-1,   5,     0,   0.1816087338245613128000742599987684447992",
    })
    void matchesMpmath(double t, double df, double ncp, double expected) {
        assertEquals(expected, NoncentralT.cdf(t, df, ncp), ABSOLUTE);
        assertEquals(1 - expected, NoncentralT.sf(t, df, ncp), ABSOLUTE);
    }

    /**
     * The table noncentral-t-reference.csv (src/test/resources/dev/proofrun/stats; its header and the
     * script beside it name mpmath 1.3.0 / SciPy 1.17.1 and the calls): 457 points over df 2–10,000
     * (integer and not), ncp 0–300, t from ncp − 4·spread to ncp + 4·spread and some negative t. Both
     * cdf and sf must be within 1e-9 of mpmath's 30-digit values; where an upper or lower tail is at
     * least 1e-10, that tail must also be within 1e-8 relative (sf keeps its digits).
     */
    @Test
    void matchesTheReferenceTable() throws IOException {
        List<double[]> rows = referenceTable();
        assertEquals(457, rows.size());
        for (double[] row : rows) {
            double t = row[0];
            double df = row[1];
            double ncp = row[2];
            String where = String.format(java.util.Locale.ROOT, "t=%s df=%s ncp=%s", t, df, ncp);
            double cdf = NoncentralT.cdf(t, df, ncp);
            double sf = NoncentralT.sf(t, df, ncp);
            assertEquals(row[3], cdf, ABSOLUTE, where);
            assertEquals(row[4], sf, ABSOLUTE, where);
            if (row[3] >= 1e-10 && row[3] < 0.5) {
                assertEquals(row[3], cdf, TAIL_RELATIVE * row[3], where);
            }
            if (row[4] >= 1e-10 && row[4] < 0.5) {
                assertEquals(row[4], sf, TAIL_RELATIVE * row[4], where);
            }
        }
    }

    private static List<double[]> referenceTable() throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (InputStream in = NoncentralTTest.class.getResourceAsStream("noncentral-t-reference.csv");
             BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            while ((line = reader.readLine()) != null) {
                if (line.startsWith("#") || line.startsWith("t,")) {
                    continue;
                }
                String[] cells = line.split(",");
                rows.add(new double[] {Double.parseDouble(cells[0]), Double.parseDouble(cells[1]),
                    Double.parseDouble(cells[2]), Double.parseDouble(cells[3]), Double.parseDouble(cells[4])});
            }
        }
        return rows;
    }

    @ParameterizedTest
    @CsvSource({
        // SciPy 1.17.1: scipy.stats.nct.cdf(t, 1e5, 2)
        "-1, 0.0013499423503819802", "0.5, 0.06680716079458941", "2, 0.49999800529774086",
        "2.7, 0.7580302565884631", "5, 0.998649215434754"})
    void largeDegreesOfFreedomMatchTheReference(double t, double expected) {
        // the default run's check of large df (100,000: under a second); df = 1e7, where one cdf takes seconds,
        // is the long run's (hugeDegreesOfFreedomTendToTheNormal)
        assertEquals(expected, NoncentralT.cdf(t, 1e5, 2), ABSOLUTE);
    }

    @Tag("long")
    @Test
    void hugeDegreesOfFreedomTendToTheNormal() {
        // As df grows W -> 1 and T -> N(ncp, 1); Var T is about 1 + (1 + ncp^2/2)/df, so at ncp = 2 and
        // df = 1e7 the two cdfs differ by well under 1e-6 (Commons Statistics 1.2 normal cdf as reference).
        NormalDistribution normal = NormalDistribution.of(0, 1);
        for (double t : new double[] {-1, 0.5, 2, 2.7, 5}) {
            assertEquals(normal.cumulativeProbability(t - 2), NoncentralT.cdf(t, 1e7, 2), 1e-6);
        }
    }

    @Test
    void negativeTailsMirror() {
        // T' with (t, ncp) and -T' with (-t, -ncp): cdf(-t, df, -ncp) = sf(t, df, ncp) exactly in law.
        for (double[] c : new double[][] {{2.5, 7, 1.5}, {-3, 19.5, 4}, {140, 400, 120}}) {
            assertEquals(NoncentralT.sf(c[0], c[1], c[2]), NoncentralT.cdf(-c[0], c[1], -c[2]), 1e-12);
        }
    }

    @ParameterizedTest
    @CsvSource({"-3.5, 2", "-1, 2.5", "0.3, 7", "2.2, 29", "4, 99.5", "-0.7, 9999"})
    void zeroNoncentralityIsTheCentralT(double t, double df) {
        // Hipparchus 4.0.2 TDistribution(df).cumulativeProbability(t), an independent algorithm (incomplete beta)
        assertEquals(new TDistribution(df).cumulativeProbability(t), NoncentralT.cdf(t, df, 0), ABSOLUTE);
    }

    @Test
    void ncpForInvertsTheCdf() {
        for (double p : new double[] {0.001, 0.05, 0.5, 0.95, 0.9999}) {
            double ncp = NoncentralT.ncpFor(5.0, 29, p);
            assertEquals(p, NoncentralT.cdf(5.0, 29, ncp), 1e-10);
        }
    }

    @Test
    void rejectsBadInput() {
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.cdf(Double.NaN, 5, 1));
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.cdf(1, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.sf(1, 5, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.ncpFor(1, 5, 1));
    }
}
