package dev.proofrun.arch;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaModifier;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import dev.proofrun.app.UsesToolkit;
import org.junit.jupiter.api.Test;

/**
 * Test classes run in parallel (see {@code junit-platform.properties}); the window's test classes share the one
 * JavaFX toolkit and must run one at a time. Every concrete test class under {@code dev.proofrun.app} carries
 * {@link UsesToolkit}, so a new one cannot run beside another by mistake.
 */
class ToolkitLockTest {

    @Test
    void everyTestClassOfTheWindowTakesTheToolkitLock() {
        JavaClasses tests = new ClassFileImporter().withImportOption(ImportOption.Predefined.ONLY_INCLUDE_TESTS)
                .importPackages("dev.proofrun.app");
        classes().that().haveSimpleNameEndingWith("Test").and().areTopLevelClasses()
                .and().doNotHaveModifier(JavaModifier.ABSTRACT)
                .should().beAnnotatedWith(UsesToolkit.class)
                .because("the window's tests share one JavaFX toolkit and run one at a time")
                .check(tests);
    }
}
