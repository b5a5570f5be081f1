package dev.proofrun.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;
import picocli.CommandLine;

/** Reads the version Maven wrote into {@code proofrun-version.properties}. */
public final class VersionProvider implements CommandLine.IVersionProvider {

    /** The product version, e.g. "0.1.0-SNAPSHOT". */
    public static String version() {
        Properties p = new Properties();
        try (InputStream in = VersionProvider.class.getResourceAsStream("/proofrun-version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return p.getProperty("version", "unknown");
    }

    @Override
    public String[] getVersion() {
        return new String[] {"proofrun " + version()};
    }
}
