package dev.proofrun.app.session;

import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Files;
import java.nio.file.Path;

/** Sessions on a plan file, as the wizard opens them: the set-up the session tests share. */
final class OpenedPlans {

    private OpenedPlans() {
    }

    /** A session at {@code home} with {@code plan} written to its plans folder (under the demo's file name) and opened. */
    static Session open(Path home, StudyPlan plan) throws Exception {
        Path plans = Files.createDirectories(home.resolve("plans"));
        Path file = plans.resolve(DemoPlan.FILE_NAME);
        PlanFiles.write(file, plan);
        Session session = new Session(new AppHome(home, plans));
        session.open(file);
        return session;
    }

    /**
     * {@code plan} written as the hand-out writes it, to {@code home/issued/NAME}, and opened in a fresh session whose
     * own home is {@code home/other}: nothing of an earlier draft can reach it.
     */
    static Session openIssued(Path home, StudyPlan plan, String name) throws Exception {
        Path issued = Files.createDirectories(home.resolve("issued")).resolve(name);
        PlanFiles.write(issued, plan);
        Session reader = new Session(new AppHome(home.resolve("other"), home.resolve("issued")));
        reader.open(issued);
        return reader;
    }
}
