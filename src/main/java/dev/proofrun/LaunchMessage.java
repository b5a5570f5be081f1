package dev.proofrun;

import dev.proofrun.text.MessageKey;

/** What starting the jar tells people before either interface is up. */
public enum LaunchMessage implements MessageKey {
    /** No screen to open the wizard on. */
    NO_DISPLAY("no display to open the wizard on (%s). Run it on a virtual screen: xvfb-run -a java -jar "
            + "proofrun.jar; or use the command line: java -jar proofrun.jar --help");

    private final String english;

    LaunchMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
