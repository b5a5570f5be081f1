package dev.proofrun.app.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.app.UsesToolkit;
import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.chart.CurvePlot.Pen;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The tooltip under the pointer names each curve's nearest point and each reference line. */
@UsesToolkit
class PointerTextTest {

    @Test
    void theNearestPointOfEachCurveAndTheReferenceLinesAreNamed() {
        List<Line> lines = List.of(new Line("power, n = 5", Pen.CURVE, new double[] {20, 25, 30}, new double[] {0.8, 0.9, 0.95}),
                Line.vertical("plan: 25 × 5", Pen.CHOSEN, 25));
        String nl = System.lineSeparator();
        assertEquals("Power" + nl + "power, n = 5: at subgroups k = 25, power 0.900" + nl + "plan: 25 × 5",
                PointerText.at("Power", lines, "subgroups k", "power", 26.9));
        assertEquals("Power" + nl + "power, n = 5: at subgroups k = 30, power 0.950" + nl + "plan: 25 × 5",
                PointerText.at("Power", lines, "subgroups k", "power", 28.1));
    }
}
