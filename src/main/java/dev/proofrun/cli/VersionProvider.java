package dev.proofrun.cli;

import dev.proofrun.text.ProductVersion;
import picocli.CommandLine;

/** The {@code --version} text, from {@link ProductVersion}. */
public final class VersionProvider implements CommandLine.IVersionProvider {

    /** The product version, e.g. "0.1.0-SNAPSHOT". */
    public static String version() {
        return ProductVersion.get();
    }

    @Override
    public String[] getVersion() {
        return new String[] {"proofrun " + version()};
    }
}
