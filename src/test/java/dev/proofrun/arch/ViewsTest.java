package dev.proofrun.arch;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.type;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import dev.proofrun.text.MessageKey;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The wizard's views bind to what their view-model displays and draw it; only the view-model calls the core.
 * A class of {@code dev.proofrun.app} whose name ends in {@code View} (its nested and anonymous classes
 * included) may not depend on the core packages: stats, control, capability, readings, design, schedule, plan,
 * grade, sheet, report. Of {@code text} it may use {@link MessageKey} alone — the words it shows come as keys
 * (an enum such as {@code app.AppMessage}) or as finished strings from the view-model; reading numbers, files or
 * locations is the view-model's job. ({@code plan.PlanView}, a JSON record of the core, is not a wizard view.)
 */
class ViewsTest {

    /**
     * Views not yet moved onto display models, each left for the step's own change; the list shrinks as they
     * are, and a view on it that no longer needs the exception fails {@link #theExceptionsAreStillNeeded}.
     */
    static final List<String> NOT_YET = List.of();

    private static final String[] CORE = {"dev.proofrun.stats..", "dev.proofrun.control..", "dev.proofrun.capability..",
        "dev.proofrun.readings..", "dev.proofrun.design..", "dev.proofrun.schedule..", "dev.proofrun.plan..",
        "dev.proofrun.grade..", "dev.proofrun.sheet..", "dev.proofrun.report.."};

    private static final JavaClasses CLASSES = ProductClasses.get();

    private static String view(String name) {
        return name.replace(".", "\\.") + "(\\$.*)?";
    }

    @Test
    void viewsReachNoCore() {
        String exempt = String.join("|", NOT_YET.stream().map(ViewsTest::view).toList());
        noClasses().that().resideInAPackage("dev.proofrun.app..").and().haveNameMatching(".*View(\\$.*)?")
                .and().haveNameNotMatching(exempt)
                .should().dependOnClassesThat(resideInAnyPackage(CORE)
                        .or(resideInAPackage("dev.proofrun.text..").and(not(type(MessageKey.class)))))
                .because("a view binds to its view-model's display values; the view-model is the core's one caller")
                .check(CLASSES);
    }

    @Test
    void theExceptionsAreStillNeeded() {
        for (String name : NOT_YET) {
            boolean reaches = CLASSES.stream().filter(c -> c.getName().matches(view(name)))
                    .flatMap(c -> c.getDirectDependenciesFromSelf().stream())
                    .anyMatch(d -> resideInAnyPackage(CORE).test(d.getTargetClass()));
            if (!reaches) {
                throw new AssertionError(name + " no longer reaches the core: take it off ViewsTest.NOT_YET");
            }
        }
    }
}
