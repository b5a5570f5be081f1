package dev.proofrun.text;

/** What the shared text checks tell people. */
public enum TextMessage implements MessageKey {
    /** A file read as CSV holds binary content. */
    NOT_TEXT("not a text file (binary content at byte %d): give the CSV file, or an .xlsx file where one is accepted");

    private final String english;

    TextMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
