package dev.proofrun.arch;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;

/**
 * The product's classes (tests left out) as the architecture tests and the message-key test read them, imported once
 * for all of them.
 */
public final class ProductClasses {

    private ProductClasses() {
    }

    private static final class Holder {
        static final JavaClasses CLASSES = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("dev.proofrun");
    }

    /** The classes of {@code dev.proofrun}, imported on first use. */
    public static JavaClasses get() {
        return Holder.CLASSES;
    }
}
