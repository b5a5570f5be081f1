package dev.proofrun.cli;

import dev.proofrun.design.Look;
import dev.proofrun.grade.GradedLook;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.PlanDocument;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code proofrun plan show FILE.json [--json]}: the design, the frequency sentence and the slots. */
@Command(name = "show", mixinStandardHelpOptions = true,
        description = "Show a plan: characteristics, design, the frequency in one sentence and the slot list.")
public final class PlanShowCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE.json", description = "The plan file.")
    Path file;

    @Option(names = "--json", description = "Print the plan as one JSON object with its slots, summary, state and revision.")
    boolean json;

    @Override
    public Integer call() {
        PlanFiles.Inspection in = PlanFiles.inspect(file);
        StudyPlan p = in.plan();
        PrintWriter out = spec.commandLine().getOut();
        if (in.integrity() == PlanFiles.Integrity.CHANGED_AFTER_ISSUE) {
            PrintWriter err = spec.commandLine().getErr();
            err.println(PlanOptionMessage.CHANGED_WARNING.format(p.revision().orElseThrow(), in.computed()));
            err.flush();
        }
        if (json) {
            out.println(PlanDocument.json(p, in.integrity()));
            out.flush();
            return 0;
        }
        out.printf(Locale.ROOT, "plan %s  %s, %s%s%n", p.reference(), p.state().token(), p.revisionWords(),
                p.supersedes().map(s -> " (supersedes " + s + ")").orElse(""));
        out.printf(Locale.ROOT, "part %s%s%s%n", p.part().name(),
                p.part().number().isEmpty() ? "" : "  no. " + p.part().number(),
                p.part().revision().isEmpty() ? "" : "  rev. " + p.part().revision());
        if (!p.people().author().isEmpty() || !p.people().collector().isEmpty()) {
            out.printf(Locale.ROOT, "by %s  for %s%n", p.people().author(), p.people().collector());
        }
        out.println();
        out.println("characteristic            unit      LSL        nominal    USL        requirement            expected  shape");
        for (Characteristic c : p.characteristics()) {
            out.printf(Locale.ROOT, "%-6s %-18s %-8s  %-10s %-10s %-10s %s >= %s at %.0f %%   %-8s  %s%n", c.id(), cut(c.name(), 18),
                    c.unit(), num(c.limits().lower()), num(c.nominal()), num(c.limits().upper()),
                    c.requirement().index().symbol(), c.requirement().minimum(), 100 * c.requirement().confidence(),
                    c.expectation().index(), c.shapeWords());
        }
        out.println();
        String what = p.design().subgroupSize() == 1 ? String.format(Locale.ROOT, "%d single parts", p.design().subgroups())
                : String.format(Locale.ROOT, "%d subgroups of %d consecutive parts (%d parts)", p.design().subgroups(),
                        p.design().subgroupSize(), p.design().readings());
        out.printf(Locale.ROOT, "design   %s, sigma %s, bound %s%n", what, p.design().sigmaMethod().token(),
                p.design().boundMethod().token());
        p.stages().filter(st -> st.staged()).ifPresent(st -> {
            out.printf(Locale.ROOT, "stages   %d looks, %s spending%n", st.count(), st.spending().token());
            int from = 1;
            for (int j = 0; j < st.count(); j++) {
                Look l = st.looks().get(j);
                List<Slot> slots = p.schedule().slots();
                out.printf(Locale.ROOT, "  look %d after slot %s (stage %d: slots %s to %s, %d subgroups so far): bound at %s %%%s%n",
                        j + 1, slots.get(l.subgroups() - 1).id(), j + 1, slots.get(from - 1).id(),
                        slots.get(l.subgroups() - 1).id(), l.subgroups(), GradedLook.percent(l.confidence()),
                        l.stopsForFutility() ? String.format(Locale.ROOT, ", stops for futility below %s", l.futility()) : "");
                from = l.subgroups() + 1;
            }
        });
        out.printf(Locale.ROOT, "when     %s%n", p.summary());
        out.printf(Locale.ROOT, "span     from %s to %s, %.0f minutes of running time, %s spacing%n",
                p.span().start(), p.schedule().end(), p.schedule().workingMinutes(), p.spacing().token());
        out.println();
        out.println("slot   planned start            window   shift        parts since start");
        for (Slot s : p.schedule().slots()) {
            out.printf(Locale.ROOT, "%-6s %-24s +-%-3d    %-12s %d%n", s.id(), s.start(), s.windowMinutes(),
                    cut(s.shift(), 12), s.partsSinceStart());
        }
        out.flush();
        return 0;
    }

    private static String num(OptionalDouble x) {
        return x.isPresent() ? String.format(Locale.ROOT, "%s", x.getAsDouble()) : "-";
    }

    private static String cut(String s, int width) {
        return s.length() <= width ? s : s.substring(0, width - 1) + "…";
    }
}
