package dev.proofrun.arch;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import dev.proofrun.app.UsesToolkit;
import com.tngtech.archunit.core.domain.Dependency;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/**
 * Test classes run in parallel (see {@code junit-platform.properties}); a test class that reaches the one JavaFX
 * toolkit of the JVM — TestFX, the FX application thread, a stage or a scene, or the wizard's views — must run
 * one at a time with the others that do. Such a class (its nested classes included) carries {@link UsesToolkit};
 * a view-model test that binds plain JavaFX properties and runs its jobs inline does not need to.
 */
class ToolkitLockTest {

    private static final List<String> TOOLKIT = List.of("org.testfx.", "javafx.application.", "javafx.stage.",
            "javafx.scene.", "javafx.embed.", "javafx.swing.");

    /** The product's classes, whose dependencies the search follows (imported once for the architecture tests). */
    private static final JavaClasses PRODUCT = ProductClasses.get();

    private static boolean isToolkit(JavaClass c) {
        return TOOLKIT.stream().anyMatch(c.getName()::startsWith);
    }

    /**
     * Whether {@code test} uses the toolkit itself, or calls a class of ours that does (one step into the product or
     * a test helper: a view, the wizard's window, a view-model that makes screen images, the robot's base class). A view-model test that binds plain
     * JavaFX properties and runs its jobs inline reaches no further than the view-model, and runs beside the rest.
     */
    private static boolean reachesToolkit(JavaClass test, JavaClasses tests) {
        for (Dependency d : test.getDirectDependenciesFromSelf()) {
            JavaClass t = d.getTargetClass();
            if (isToolkit(t)) {
                return true;
            }
            JavaClasses home = PRODUCT.contain(t.getName()) ? PRODUCT : tests.contain(t.getName()) ? tests : null;
            if (home != null && home.get(t.getName()).getDirectDependenciesFromSelf().stream()
                    .anyMatch(dd -> isToolkit(dd.getTargetClass()))) {
                return true;
            }
        }
        return false;
    }

    @Test
    void everyTestClassThatReachesTheToolkitTakesItsLock() {
        JavaClasses tests = new ClassFileImporter().withImportOption(ImportOption.Predefined.ONLY_INCLUDE_TESTS)
                .importPackages("dev.proofrun");
        Set<String> missing = new TreeSet<>();
        for (JavaClass c : tests) {
            JavaClass top = c;
            while (top.getEnclosingClass().isPresent()) {
                top = top.getEnclosingClass().get();
            }
            if (top.getSimpleName().endsWith("Test") && !top.getModifiers().contains(
                    com.tngtech.archunit.core.domain.JavaModifier.ABSTRACT)
                    && reachesToolkit(c, tests) && !top.isAnnotatedWith(UsesToolkit.class)) {
                missing.add(top.getName());
            }
        }
        assertEquals(Set.of(), missing, "test classes that reach the JavaFX toolkit without @UsesToolkit");
    }
}
