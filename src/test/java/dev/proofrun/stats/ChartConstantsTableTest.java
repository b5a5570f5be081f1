package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.function.IntToDoubleFunction;
import org.junit.jupiter.api.Test;

/**
 * The computed constants against the published table in
 * {@code src/test/resources/dev/proofrun/stats/control-chart-factors.txt} (Montgomery, Introduction to
 * Statistical Quality Control, Appendix VI; provenance and cross-check in the file's header), to the
 * table's printed precision: |computed − printed| ≤ half a unit of the last printed digit, one unit for
 * the cells listed as deviations.
 */
class ChartConstantsTableTest {

    private static final String[] COLUMNS = {"A2", "A3", "c4", "B3", "B4", "d2", "d3", "D3", "D4"};

    private static IntToDoubleFunction constant(String column) {
        switch (column) {
            case "A2": return ChartConstants::a2;
            case "A3": return ChartConstants::a3;
            case "c4": return ChartConstants::c4;
            case "B3": return ChartConstants::b3;
            case "B4": return ChartConstants::b4;
            case "d2": return ChartConstants::d2;
            case "d3": return ChartConstants::d3;
            case "D3": return ChartConstants::d3Chart;
            case "D4": return ChartConstants::d4Chart;
            default: throw new AssertionError(column);
        }
    }

    @Test
    void agreesWithThePublishedTableToItsPrintedPrecision() throws IOException {
        Map<String, String[]> rows = new HashMap<>();
        Map<String, Double> deviations = new HashMap<>();
        try (InputStream in = getClass().getResourceAsStream("control-chart-factors.txt")) {
            assertNotNull(in, "table resource");
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                if (f[0].equals("deviation")) {
                    deviations.put(f[1] + " " + f[2], Double.parseDouble(f[4]));
                } else {
                    rows.put(f[0], f);
                }
            }
        }
        assertEquals(24, rows.size(), "n = 2..25");
        int checked = 0;
        for (int n = 2; n <= 25; n++) {
            String[] f = rows.get(Integer.toString(n));
            for (int c = 0; c < COLUMNS.length; c++) {
                BigDecimal printed = new BigDecimal(f[c + 1]);
                double unit = Math.pow(10, -Math.max(printed.scale(), 3));
                String key = n + " " + COLUMNS[c];
                double computed = constant(COLUMNS[c]).applyAsDouble(n);
                double tolerance = deviations.containsKey(key) ? unit : unit / 2;
                assertEquals(printed.doubleValue(), computed, tolerance + 1e-12, key);
                if (deviations.containsKey(key)) {
                    // the mpmath value kept beside the deviation
                    assertEquals(deviations.get(key), computed, 1e-10, key + " against mpmath");
                }
                checked++;
            }
        }
        assertEquals(216, checked);
    }

    @Test
    void rangeDeviationAgreesWithMpmathForAllTabledSizes() {
        // mpmath 1.3.0, mp.dps = 15, order-statistic form (see ChartConstantsTest), n = 4..25, 35, 50
        double[][] ref = {{4, 0.879808202824984}, {5, 0.864081941099504}, {6, 0.848039686117494},
            {7, 0.833205335622293}, {8, 0.819831489791944}, {9, 0.807834274553322}, {10, 0.79705067351941},
            {11, 0.787314620550328}, {12, 0.778478341203385}, {13, 0.770416202063755}, {14, 0.76302309562479},
            {15, 0.756211429727944}, {16, 0.749908089409917}, {17, 0.74405178396073}, {18, 0.738590853378177},
            {19, 0.733481495518869}, {20, 0.728686345707305}, {21, 0.724173340717499}, {22, 0.719914808434223},
            {23, 0.715886735491813}, {24, 0.712068175147937}, {25, 0.708440765888656}, {35, 0.67987079126322},
            {50, 0.652142588429963}};
        for (double[] row : ref) {
            assertEquals(row[1], ChartConstants.d3((int) row[0]), 1e-11, "d3(" + (int) row[0] + ")");
        }
    }
}
