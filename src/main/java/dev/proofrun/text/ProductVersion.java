package dev.proofrun.text;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;

/**
 * The product's version as Maven wrote it into {@code proofrun-version.properties} at build time, so that
 * every layer that prints it (the command line's {@code --version}, the grade report's stamp) says the same.
 */
public final class ProductVersion {

    private ProductVersion() {
    }

    /** The version, e.g. "0.1.0-SNAPSHOT"; "unknown" when the resource is missing (classes run unpackaged). */
    public static String get() {
        Properties p = new Properties();
        try (InputStream in = ProductVersion.class.getResourceAsStream("/proofrun-version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return p.getProperty("version", "unknown");
    }
}
