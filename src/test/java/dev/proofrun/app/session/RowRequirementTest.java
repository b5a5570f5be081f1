package dev.proofrun.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.part.PartViewModel;
import dev.proofrun.design.Requirement;
import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.stats.IndexKind;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Each characteristic's requirement (index, c₀, confidence) and expected Cp are Part columns, as in the command
 * line's characteristics CSV: typed cells set the row's own, blank cells take the plan's; a plan opened and
 * composed again keeps them; a bad cell is marked in the plan model's words.
 */
class RowRequirementTest {

    @TempDir
    Path home;

    private Session openDemo() throws Exception {
        return OpenedPlans.open(home, DemoPlan.create());
    }

    private static CharacteristicDraft row(Session s, String id) {
        return s.draft().characteristics().stream().filter(r -> r.id().equals(id)).findFirst().orElseThrow();
    }

    private static StudyPlan compose(Session s, Requirement plan) {
        StudyPlan demo = DemoPlan.create();
        return PlanDrafts.compose(s.draft(), s.base(), plan,
                r -> RowRequirement.expectation(r, r.number(CharacteristicField.EXPECTED).getAsDouble()),
                demo.calendar(), demo.span(), demo.design(), demo.spacing(), demo.seed(), demo.schedule());
    }

    @Test
    void theDemoOpensWithItsOffCentreExpectationInACellAndTheSharedRequirementBlank() throws Exception {
        Session s = openDemo();
        CharacteristicDraft d1 = row(s, "D1");
        // the demo plan: D1 expected Cpk 1.67 with Cp 1.8 (plan.DemoPlan); every characteristic Cpk 1.33 at 95 %
        assertEquals("1.8", d1.text(CharacteristicField.EXPECTED_CP));
        assertEquals("", d1.text(CharacteristicField.INDEX));
        assertEquals("", row(s, "R4").text(CharacteristicField.TARGET));
        assertEquals("", row(s, "F7").text(CharacteristicField.EXPECTED_CP), "F7 is expected centred");
    }

    @Test
    void typedCellsSetTheRowsOwnRequirementAndBlankOnesTakeThePlans() throws Exception {
        Session s = openDemo();
        CharacteristicDraft r4 = row(s, "R4");
        r4.cell(CharacteristicField.INDEX).set("ppk");
        r4.cell(CharacteristicField.TARGET).set("1.67");
        CharacteristicDraft d1 = row(s, "D1");
        d1.cell(CharacteristicField.EXPECTED_CP).set("2.0");
        Requirement plan = Requirement.of(IndexKind.CPK, 1.33, 0.95);
        StudyPlan p = compose(s, plan);
        assertEquals(Requirement.of(IndexKind.PPK, 1.67, 0.95), p.characteristic("R4").orElseThrow().requirement());
        assertEquals(plan, p.characteristic("F7").orElseThrow().requirement());
        assertEquals(OptionalDouble.of(2.0), p.characteristic("D1").orElseThrow().expectation().potential());
        d1.cell(CharacteristicField.EXPECTED_CP).set("");
        assertTrue(compose(s, plan).characteristic("D1").orElseThrow().expectation().potential().isEmpty(),
                "blank is centred");
    }

    @Test
    void aPlanWithDifferentRequirementsOpensWithThemAndComposesThemBack() throws Exception {
        Session s = openDemo();
        row(s, "F7").cell(CharacteristicField.CONFIDENCE).set("0.99");
        row(s, "F7").cell(CharacteristicField.INDEX).set("ppk");
        StudyPlan p = compose(s, Requirement.of(IndexKind.CPK, 1.33, 0.95));
        Path again = home.resolve("plans").resolve("again.json");
        PlanFiles.write(again, p);
        Session t = new Session(new AppHome(home, home.resolve("plans")));
        t.open(again);
        assertEquals("ppk", row(t, "F7").text(CharacteristicField.INDEX));
        assertEquals("0.99", row(t, "F7").text(CharacteristicField.CONFIDENCE));
        assertEquals("", row(t, "F7").text(CharacteristicField.TARGET), "the same c₀ as the plan's stays blank");
        assertEquals(p.characteristic("F7").orElseThrow().requirement(),
                RowRequirement.of(row(t, "F7"), Optional.of(Requirement.of(IndexKind.CPK, 1.33, 0.95))).orElseThrow());
    }

    @Test
    void badRequirementCellsAreMarkedInThePlanModelsWords() throws Exception {
        Session s = openDemo();
        PartViewModel vm = new PartViewModel(s.draft());
        CharacteristicDraft f7 = row(s, "F7");
        CharacteristicDraft d1 = row(s, "D1");
        f7.cell(CharacteristicField.INDEX).set("cpx");
        assertEquals(Optional.of("unknown index 'cpx' (cp, cpu, cpl, cpk, pp, ppu, ppl or ppk)"), vm.problem(f7, CharacteristicField.INDEX));
        f7.cell(CharacteristicField.INDEX).set("cp");
        assertEquals(Optional.of("Cp needs both limits, and F7 has only one"), vm.problem(f7, CharacteristicField.INDEX));
        f7.cell(CharacteristicField.CONFIDENCE).set("0.4");
        assertEquals(Optional.of("confidence must be between 0.5 and 0.9999: 0.4"), vm.problem(f7, CharacteristicField.CONFIDENCE));
        f7.cell(CharacteristicField.TARGET).set("1,4x");
        assertEquals(Optional.of("target: not a number: '1,4x'"), vm.problem(f7, CharacteristicField.TARGET));
        f7.cell(CharacteristicField.TARGET).set("0");
        assertEquals(Optional.of("required minimum must be positive: 0.0"), vm.problem(f7, CharacteristicField.TARGET));
        d1.cell(CharacteristicField.EXPECTED_CP).set("1.5");
        assertEquals(Optional.of("expected Cp (1.5) cannot be below the expected Cpk (1.67)"),
                vm.problem(d1, CharacteristicField.EXPECTED_CP));
        assertEquals(Optional.empty(), RowRequirement.of(f7, Optional.of(Requirement.of(IndexKind.CPK, 1.33, 0.95))),
                "a bad typed cell gives no requirement, not the plan's");
        assertTrue(vm.rowProblem(0).isPresent(), "the row with the bad cell is named");
    }
}
