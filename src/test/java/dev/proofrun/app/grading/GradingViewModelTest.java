package dev.proofrun.app.grading;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.grading.GradingDisplay.Characteristic;
import dev.proofrun.app.grading.GradingDisplay.GradeRow;
import dev.proofrun.app.grading.GradingDisplay.StepEvidence;
import dev.proofrun.app.grading.GradingDisplay.Tone;
import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.start.StartViewModel;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.DemoReturn;
import dev.proofrun.grade.GradeMessage;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.Step;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.report.Histogram;
import dev.proofrun.report.ReportMessage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the Grading step displays, made from the real grade of the demo's return (the generator and seed of
 * {@code proofrun demo}) without a window: the words are the message keys' and the figures the grade's own.
 */
class GradingViewModelTest {

    @TempDir
    Path tmp;

    private Session session;
    private GradingViewModel vm;
    private StudyPlan plan;
    private Path returned;

    @BeforeEach
    void openTheDemo() throws Exception {
        session = new Session(new AppHome(tmp.resolve("home"), tmp.resolve("home/plans")));
        StartViewModel start = new StartViewModel(session);
        start.openDemo();
        assertTrue(start.loadedProperty().get(), start.messageProperty().get());
        plan = session.base().orElseThrow();
        returned = tmp.resolve("returned.csv");
        DemoReturn.writeCsv(GradingPlans.of(plan), returned);
        vm = new GradingViewModel(session, Background.inline());
    }

    private void grade(Path file) {
        vm.returnedFile().set(file.toString());
        assertTrue(vm.grade(), vm.messageProperty().get());
    }

    @Test
    void theVerdictLineRowsAndCautionAreWordsFromTheGrade() {
        assertFalse(vm.gradedBinding().get());
        assertEquals("", vm.verdictLineBinding().get());
        grade(returned);
        assertTrue(vm.gradedBinding().get());
        // the demo's return: D1 demonstrated, R4 inconclusive, F7 not valid (DemoParityTest), so the part is not valid
        assertEquals("Verdict for plan " + plan.id() + ", revision 1 (" + plan.revision().orElseThrow() + "): Not valid",
                vm.verdictLineBinding().get());
        assertEquals(Tone.SHORT, vm.toneBinding().get());
        assertEquals(GradeMessage.CAUTION.format(), vm.caution());
        assertEquals(List.of("D1", "R4", "F7"), vm.gradeRows().stream().map(GradeRow::id).toList());
        for (GradeRow row : vm.gradeRows()) {
            CharacteristicGrade g = vm.grade(row.id()).orElseThrow();
            assertEquals(g.verdict().words(), row.verdict());
            if (g.verdict() == Verdict.NOT_VALID) {
                // no estimate beside "Not valid": it would be read as a capability statement
                assertEquals("—", row.estimate());
                assertEquals("—", row.lowerVsRequired());
                continue;
            }
            assertEquals(g.judged().index().symbol() + " " + String.format(Locale.ROOT, "%.3f", g.judged().estimate()),
                    row.estimate());
            assertEquals(String.format(Locale.ROOT, "%.3f vs %.3f", g.judged().lower(), g.judged().required()),
                    row.lowerVsRequired());
        }
        assertTrue(vm.problemRows().isEmpty(), "the demo's return has no problems");
    }

    @Test
    void eachStepIsHeadedAsInTheReportWithItsReasons() {
        grade(returned);
        assertEquals("D1", vm.selectedProperty().get(), "the first characteristic is shown");
        Characteristic d1 = vm.shownProperty().get();
        assertEquals("D1 bore diameter: Demonstrated", d1.heading());
        assertEquals(Tone.GOOD, d1.tone());
        assertEquals(List.of(ReportMessage.STEP_COMPLETENESS.format(), ReportMessage.STEP_STABILITY.format(),
                ReportMessage.STEP_SHAPE.format(), ReportMessage.STEP_CAPABILITY.format()),
                d1.steps().stream().map(StepEvidence::title).toList());
        CharacteristicGrade g = vm.grade("D1").orElseThrow();
        for (StepEvidence s : d1.steps()) {
            Step step = Step.valueOf(s.id().toUpperCase(Locale.ROOT));
            assertEquals(String.join("\n", g.reasons().stream().filter(r -> r.step() == step).map(Object::toString).toList()),
                    s.text());
        }
        assertEquals("", d1.notReached());
        assertEquals(g.judged().summary(), d1.summary());
        assertTrue(d1.indices().rows().stream().anyMatch(r -> r.symbol().equals("Cpk")), d1.indices().toString());

        vm.selectedProperty().set("R4");
        Characteristic r4 = vm.shownProperty().get();
        assertTrue(r4.heading().startsWith("R4 surface roughness Ra: Inconclusive (about "), r4.heading());
        assertTrue(r4.heading().endsWith(" more subgroups would settle it: a planning figure)"), r4.heading());
        assertEquals(Tone.OPEN, r4.tone());
    }

    @Test
    void noEmptyHeadingWhereAnEarlierStepEndsTheArgument() throws Exception {
        // only the first slot of each characteristic comes back: too few subgroups for charts, shape or capability
        List<String> lines = Files.readAllLines(returned);
        Path short1 = Files.write(tmp.resolve("one-slot.csv"), lines.subList(0, 4));
        grade(short1);
        Characteristic d1 = vm.shownProperty().get();
        assertEquals("D1 bore diameter: Not valid", d1.heading());
        List<String> shown = d1.steps().stream().map(StepEvidence::id).toList();
        assertFalse(shown.contains("capability"), shown.toString());
        CharacteristicGrade g = vm.grade("D1").orElseThrow();
        for (Step step : Step.values()) {
            boolean has = g.reasons().stream().anyMatch(r -> r.step() == step);
            assertEquals(has, shown.contains(step.token()), step + " shown exactly when it has reasons");
            assertEquals(!has, d1.notReached().contains(step.token()), d1.notReached());
        }
        assertTrue(d1.notReached().startsWith("Not judged: "), d1.notReached());
        assertTrue(d1.histogram().lines().isEmpty(), "no shape evidence, no histogram");
        assertFalse(vm.problemRows().isEmpty(), "the missing slots are listed");
        assertTrue(vm.problemRows().stream().anyMatch(p -> p.problem().contains("did not come back")));
    }

    @Test
    void theHistogramIsTheReportsBinsAndCurve() {
        grade(returned);
        CharacteristicGrade g = vm.grade("D1").orElseThrow();
        double step = plan.characteristic("D1").orElseThrow().gauge().orElseThrow().resolution();
        double nominal = plan.characteristic("D1").orElseThrow().nominal().orElse(Double.NaN);
        Histogram h = Histogram.of(g, nominal, step).orElseThrow();
        List<Line> lines = vm.shownProperty().get().histogram().lines();
        Line bars = lines.get(0);
        assertEquals("readings: " + h.counts().length + " bins" + h.bins().words(), bars.name());
        // the outline climbs to each bar's count at its edges: the counts add up to the readings graded
        long total = 0;
        for (int i = 0; i < h.counts().length; i++) {
            assertEquals(h.edge(i), bars.xs()[2 * i + 1], 0.0);
            assertEquals(h.counts()[i], bars.ys()[2 * i + 1], 0.0);
            total += (long) bars.ys()[2 * i + 1];
        }
        assertEquals(g.completeness().readings(), total);
        // bins follow the gauge's step: a whole number of steps wide, edges half a step off the grid
        double steps = h.bins().width() / step;
        assertEquals(Math.rint(steps), steps, 1e-9);
        assertEquals("fitted normal model", lines.get(1).name());
        assertTrue(lines.stream().anyMatch(l -> l.name().startsWith("LSL ")));
        assertTrue(lines.stream().anyMatch(l -> l.name().startsWith("USL ")));
        assertTrue(lines.stream().anyMatch(l -> l.name().startsWith("nominal ")));
    }

    @Test
    void aFailedGradeLeavesNothingToShow() throws Exception {
        grade(returned);
        Path binary = Files.write(tmp.resolve("garbage.csv"), new byte[] {0, 1, 2, (byte) 0xff, 0x0a});
        vm.returnedFile().set(binary.toString());
        vm.grade();
        assertFalse(vm.gradedBinding().get());
        assertEquals("", vm.verdictLineBinding().get());
        assertTrue(vm.gradeRows().isEmpty());
        assertNull(vm.shownProperty().get());
        assertFalse(vm.messageProperty().get().isBlank());
    }

    @Test
    void everyVerdictHasAToneAndItsWords() {
        assertEquals(Tone.GOOD, EvidenceDisplay.tone(Verdict.DEMONSTRATED));
        assertEquals(Tone.OPEN, EvidenceDisplay.tone(Verdict.INCONCLUSIVE));
        assertEquals(Tone.SHORT, EvidenceDisplay.tone(Verdict.NOT_DEMONSTRATED));
        assertEquals(Tone.SHORT, EvidenceDisplay.tone(Verdict.NOT_VALID));
        for (Verdict v : Verdict.values()) {
            assertFalse(v.words().isBlank(), v.name());
        }
    }
}
