package dev.proofrun.app;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.junit.jupiter.api.parallel.ResourceLock;

/**
 * Marks a test class of the window's code. A JVM has one JavaFX toolkit (one FX thread, one robot, one primary
 * stage), and the view-models post to it, so these classes run one at a time; the core's classes run beside
 * them ({@code src/test/resources/junit-platform.properties}). Every test class under {@code dev.proofrun.app}
 * carries it; {@code ToolkitLockTest} checks that none is left out.
 */
@Documented
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@ResourceLock(UsesToolkit.LOCK)
public @interface UsesToolkit {

    /** The name of the lock these classes share. */
    String LOCK = "dev.proofrun.javafx-toolkit";
}
