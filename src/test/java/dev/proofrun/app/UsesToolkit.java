package dev.proofrun.app;

import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.junit.jupiter.api.parallel.ResourceLock;

/**
 * Marks a test class that uses the JavaFX toolkit: the robot, the FX thread, a stage or scene, or a class of ours
 * that does (a view, the wizard's window). A JVM has one toolkit, so these classes run one at a time; the other
 * classes, view-model tests with inline jobs among them, run beside them
 * ({@code src/test/resources/junit-platform.properties}). {@code ToolkitLockTest} checks that none is left out.
 */
@Documented
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@ResourceLock(UsesToolkit.LOCK)
public @interface UsesToolkit {

    /** The name of the lock these classes share. */
    String LOCK = "dev.proofrun.javafx-toolkit";
}
