package dev.proofrun.app;

import java.util.Comparator;
import org.junit.jupiter.api.ClassOrderer;
import org.junit.jupiter.api.ClassOrdererContext;

/**
 * Starts the window's test classes ({@link UsesToolkit}) first. They run one at a time and together take the
 * longest, so the core's classes fill the other cores beside them instead of waiting for the window's chain at
 * the end. Named in {@code junit-platform.properties}.
 */
public final class ToolkitClassesFirst implements ClassOrderer {

    @Override
    public void orderClasses(ClassOrdererContext context) {
        context.getClassDescriptors().sort(Comparator.comparing(d -> !d.isAnnotated(UsesToolkit.class)));
    }
}
