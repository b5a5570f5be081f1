package dev.proofrun.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import org.junit.jupiter.api.Test;

/**
 * The layers: stats (pure math) ← control, design, schedule, plan, grade (the job) ← paper (the PDF toolkit) ←
 * sheet, report (files out) ← cli, app (people in). Arrows point one way; only {@code app} may touch JavaFX.
 */
class LayeringTest {

    private static final JavaClasses CLASSES = ProductClasses.get();

    @Test
    void onlyTheWizardUsesJavaFx() {
        noClasses().that().resideOutsideOfPackage("dev.proofrun.app..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..")
                .check(CLASSES);
    }

    @Test
    void statisticsDependOnNothingOfOurs() {
        noClasses().that().resideInAPackage("dev.proofrun.stats..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "dev.proofrun.control..", "dev.proofrun.design..", "dev.proofrun.schedule..",
                        "dev.proofrun.plan..", "dev.proofrun.grade..", "dev.proofrun.sheet..", "dev.proofrun.paper..",
                        "dev.proofrun.report..", "dev.proofrun.cli..", "dev.proofrun.app..",
                        "dev.proofrun.readings..", "dev.proofrun.capability..")
                .check(CLASSES);
    }

    @Test
    void theJobDoesNotReachForFilesOutOrPeopleIn() {
        noClasses().that().resideInAnyPackage("dev.proofrun.stats..", "dev.proofrun.control..",
                        "dev.proofrun.design..", "dev.proofrun.schedule..", "dev.proofrun.plan..",
                        "dev.proofrun.grade..", "dev.proofrun.readings..", "dev.proofrun.capability..")
                .should().dependOnClassesThat().resideInAnyPackage(
                        "dev.proofrun.sheet..", "dev.proofrun.paper..", "dev.proofrun.report..", "dev.proofrun.cli..",
                        "dev.proofrun.app..")
                .check(CLASSES);
    }

    @Test
    void thePdfToolkitKnowsNoDocument() {
        noClasses().that().resideInAPackage("dev.proofrun.paper..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.proofrun.sheet..", "dev.proofrun.report..",
                        "dev.proofrun.cli..", "dev.proofrun.app..", "dev.proofrun.plan..", "dev.proofrun.grade..",
                        "dev.proofrun.design..")
                .check(CLASSES);
    }

    @Test
    void theDesignDoesNotReachForTheGrader() {
        // grade imports design (the plan's requirement, the stages); the designer simulates through control
        noClasses().that().resideInAPackage("dev.proofrun.design..")
                .should().dependOnClassesThat().resideInAPackage("dev.proofrun.grade..")
                .check(CLASSES);
    }

    @Test
    void filesOutDoNotReachForPeopleIn() {
        noClasses().that().resideInAnyPackage("dev.proofrun.sheet..", "dev.proofrun.report..")
                .should().dependOnClassesThat().resideInAnyPackage("dev.proofrun.cli..", "dev.proofrun.app..")
                .check(CLASSES);
    }

    @Test
    void commandLineAndWizardAreIndependent() {
        noClasses().that().resideInAPackage("dev.proofrun.cli..")
                .should().dependOnClassesThat().resideInAPackage("dev.proofrun.app..")
                .check(CLASSES);
        noClasses().that().resideInAPackage("dev.proofrun.app..")
                .should().dependOnClassesThat().resideInAPackage("dev.proofrun.cli..")
                .check(CLASSES);
    }
}
