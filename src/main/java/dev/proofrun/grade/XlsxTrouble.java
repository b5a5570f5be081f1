package dev.proofrun.grade;

import java.util.Locale;

/**
 * What is wrong with a workbook that cannot be read, in our words: the library's exception (its class and
 * message, sometimes five lines long) is looked at here and never shown. The kinds, in the order they are
 * recognised:
 * <ul>
 * <li>a part that inflates far more than spreadsheet data does (the library's guard against zip bombs);</li>
 * <li>an old binary .xls workbook, or a password-protected one (both are not zip archives);</li>
 * <li>not a zip archive at all, or one without a workbook in it;</li>
 * <li>no sheet; a cell reference beyond the last column a sheet can have;</li>
 * <li>a sheet whose XML is damaged (cut short, edited by hand);</li>
 * <li>anything else: damaged.</li>
 * </ul>
 */
enum XlsxTrouble {
    INFLATES("a part of the workbook expands far more than spreadsheet data does, so it is not opened"
            + " (save the workbook again from the spreadsheet program, or return the CSV file)"),
    OLD_OR_PROTECTED("it is an old .xls workbook or a password-protected one; save it as an unprotected .xlsx workbook"),
    NOT_A_WORKBOOK("it is not an XLSX workbook (an .xlsx file is a zip archive with a workbook inside)"),
    NO_SHEET("the workbook has no sheet"),
    BAD_REFERENCE("a cell in the sheet has a reference beyond the last column a sheet can have (XFD); the workbook is damaged"),
    DAMAGED_SHEET("the sheet's content is damaged (cut short or not well-formed); save the workbook again from the spreadsheet program"),
    DAMAGED("the workbook is damaged; save it again from the spreadsheet program, or return the CSV file");

    private final String words;

    XlsxTrouble(String words) {
        this.words = words;
    }

    /** What to tell the user, after "cannot read the file: ". */
    String words() {
        return words;
    }

    /** The kind of trouble behind a failure to read a workbook. */
    static XlsxTrouble of(Throwable failure) {
        boolean sax = false;
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof NoSheet) {
                return NO_SHEET;
            }
            if (t instanceof BadReference) {
                return BAD_REFERENCE;
            }
            String name = t.getClass().getSimpleName();
            String m = String.valueOf(t.getMessage()).toLowerCase(Locale.ROOT);
            if (m.contains("zip bomb")) {
                return INFLATES;
            }
            if (name.equals("OLE2NotOfficeXmlFileException") || name.equals("EncryptedDocumentException")
                    || m.contains("ole2") || m.contains("encrypted")) {
                return OLD_OR_PROTECTED;
            }
            if (name.equals("NotOfficeXmlFileException") || name.equals("ZipException")
                    || name.equals("InvalidFormatException") || name.equals("ODFNotOfficeXmlFileException")) {
                return NOT_A_WORKBOOK;
            }
            sax |= t instanceof org.xml.sax.SAXException;
        }
        return sax ? DAMAGED_SHEET : DAMAGED;
    }

    /** The workbook has no sheet. */
    static final class NoSheet extends RuntimeException {
        private static final long serialVersionUID = 1L;
    }

    /** A cell reference beyond XFD, or one that is not a reference at all. */
    static final class BadReference extends RuntimeException {
        private static final long serialVersionUID = 1L;

        BadReference(String reference) {
            super(reference, null, false, false);
        }
    }
}
