package dev.proofrun.cli;

import dev.proofrun.plan.PlanFiles;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.sheet.SheetFiles;
import dev.proofrun.paper.Paper;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code proofrun sheet PLAN.json --out DIR [--paper a4|letter] [--draft]}: writes the printed collection
 * sheet and the fill-in CSV and XLSX, and prints their paths one per line.
 */
@Command(name = "sheet", mixinStandardHelpOptions = true,
        description = "Write the collection sheet (PDF) and the fill-in files (CSV, XLSX) of a plan.")
public final class SheetCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PLAN.json", description = "The plan file.")
    Path plan;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Directory for the three files.")
    Path out;

    @Mixin
    PaperOption paper;

    @Option(names = "--draft", description = "Allow an unissued plan; every page is marked DRAFT.")
    boolean draft;

    @Override
    public Integer call() {
        Paper size = Paper.of(paper.paper);
        StudyPlan p = PlanFiles.read(plan);
        SheetFiles.Written written;
        try {
            written = SheetFiles.write(p, out, size, draft);
        } catch (UserException e) {
            throw e.placedIn(Location.file(plan.toString())); // a refusal of the plan's content names the plan
        }
        for (Path path : written.all()) {
            spec.commandLine().getOut().println(path);
        }
        spec.commandLine().getOut().flush();
        return 0;
    }
}
