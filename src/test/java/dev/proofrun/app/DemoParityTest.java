package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.grading.GradingViewModel;
import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.start.StartViewModel;
import dev.proofrun.cli.DemoCommand;
import dev.proofrun.cli.ProofrunCommand;
import dev.proofrun.grade.DemoReturn;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.StudyPlan;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The wizard's demo and {@code proofrun demo} agree: the plan the wizard opens on its first start, with the
 * returned file written through {@link DemoReturn}, is byte for byte the command's returned file, and the
 * wizard grades it to the verdicts {@code proofrun grade} prints for it (GradeCommandTest: D1 demonstrated,
 * R4 inconclusive, F7 not valid).
 */
class DemoParityTest {

    @TempDir
    Path tmp;

    @Test
    void theWizardsDemoReturnIsTheCommandsAndGradesTheSame() throws Exception {
        Path cli = tmp.resolve("cli");
        StringWriter err = new StringWriter();
        int code = ProofrunCommand.run(new PrintWriter(new StringWriter(), true), new PrintWriter(err, true),
                "demo", "--out", cli.toString());
        assertEquals(0, code, err.toString());

        Path home = tmp.resolve("home");
        Session session = new Session(new AppHome(home, home.resolve("plans")));
        StartViewModel start = new StartViewModel(session);
        start.openDemo();
        assertTrue(start.loadedProperty().get(), start.messageProperty().get());
        StudyPlan opened = session.base().orElseThrow();
        Path mine = tmp.resolve("wizard-returned.csv");
        DemoReturn.writeCsv(GradingPlans.of(opened), mine);
        assertArrayEquals(Files.readAllBytes(cli.resolve(DemoCommand.RETURNED)), Files.readAllBytes(mine));

        GradingViewModel grading = new GradingViewModel(session, Background.inline());
        grading.returnedFile().set(mine.toString());
        assertTrue(grading.grade());
        assertEquals(Verdict.DEMONSTRATED, grading.grade("D1").orElseThrow().verdict());
        assertEquals(Verdict.INCONCLUSIVE, grading.grade("R4").orElseThrow().verdict());
        assertEquals(Verdict.NOT_VALID, grading.grade("F7").orElseThrow().verdict());
    }
}
