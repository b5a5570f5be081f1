package dev.proofrun.grade;

import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Arrays;
import java.util.Iterator;
import java.util.Locale;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.eventusermodel.XSSFSheetXMLHandler;
import org.apache.poi.xssf.model.StylesTable;
import org.apache.poi.xssf.usermodel.XSSFComment;
import org.xml.sax.InputSource;
import org.xml.sax.XMLReader;

/**
 * Reads the fill-in sheet of a returned XLSX workbook with POI's streaming (SAX) reader, so large workbooks
 * are not built in memory. The fill-in sheet is the first sheet whose first non-blank row is a header the
 * handler knows ({@link RowHandler#isHeader}) — someone may have moved the summary sheet in front — or the
 * first sheet when none is (its refusal then names what the header lacks). Numbers arrive as their stored
 * value (not as the cell format shows them, which may round); date-formatted cells arrive as
 * "yyyy-MM-dd HH:mm:ss" local times; text as typed. Row numbers are the sheet's.
 *
 * <p>What POI says about a file it cannot read never reaches the user: {@link XlsxTrouble} says it in our words.
 */
final class XlsxTable {

    private static final DateTimeFormatter LOCAL = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss", Locale.ROOT);
    /** Columns a sheet can have (A to XFD); a reference beyond is damage, not data. */
    static final int MAX_COLUMNS = 16_384;

    private XlsxTable() {
    }

    static void read(Path path, String display, RowHandler handler) {
        try (OPCPackage pkg = OPCPackage.open(path.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg);
            StylesTable styles = reader.getStylesTable();
            int chosen = fillInSheet(reader, styles, strings, handler);
            Iterator<InputStream> sheets = reader.getSheetsData();
            for (int i = 0; i < chosen; i++) {
                sheets.next().close();
            }
            try (InputStream sheet = sheets.next()) {
                parse(sheet, styles, strings, new Rows(handler));
            }
        } catch (UserException e) {
            throw e;
        } catch (Exception e) {
            // POI signals a file that is not a workbook with checked and unchecked exceptions alike
            throw new UserException(Location.file(display), GradeMessage.FILE_UNREADABLE, XlsxTrouble.of(e).words());
        }
    }

    /** The index of the fill-in sheet: the first whose header the handler knows, else 0. */
    private static int fillInSheet(XSSFReader reader, StylesTable styles, ReadOnlySharedStringsTable strings,
            RowHandler handler) throws Exception {
        Iterator<InputStream> sheets = reader.getSheetsData();
        if (!sheets.hasNext()) {
            throw new XlsxTrouble.NoSheet();
        }
        for (int i = 0; sheets.hasNext(); i++) {
            try (InputStream sheet = sheets.next()) {
                HeaderProbe probe = new HeaderProbe();
                try {
                    parse(sheet, styles, strings, probe);
                } catch (Exception e) {
                    if (!HeaderProbe.found(e)) {
                        throw e;
                    }
                    if (handler.isHeader(probe.header)) {
                        return i;
                    }
                }
            }
        }
        return 0;
    }

    private static void parse(InputStream sheet, StylesTable styles, ReadOnlySharedStringsTable strings,
            XSSFSheetXMLHandler.SheetContentsHandler rows) throws Exception {
        XMLReader xml = XMLHelper.newXMLReader();
        xml.setContentHandler(new XSSFSheetXMLHandler(styles, strings, rows, new RawNumbers(), false));
        xml.parse(new InputSource(sheet));
    }

    /** Numbers as stored, dates as local date-times; never the display rounding of the cell's format. */
    private static final class RawNumbers extends DataFormatter {
        RawNumbers() {
            super(Locale.ROOT);
        }

        @Override
        public String formatRawCellContents(double value, int formatIndex, String formatString) {
            return formatRawCellContents(value, formatIndex, formatString, false);
        }

        @Override
        public String formatRawCellContents(double value, int formatIndex, String formatString, boolean use1904) {
            if (DateUtil.isADateFormat(formatIndex, formatString) && DateUtil.isValidExcelDate(value)) {
                LocalDateTime t = DateUtil.getLocalDateTime(value, use1904, true);
                return LOCAL.format(t);
            }
            if (value == Math.rint(value) && Math.abs(value) < 1e15) {
                return Long.toString((long) value);
            }
            return Double.toString(value);
        }
    }

    /** Collects the cells of a row by column letter; shared by the header probe and the reading. */
    private abstract static class RowCells implements XSSFSheetXMLHandler.SheetContentsHandler {
        String[] cells = new String[32];
        int count;

        @Override
        public void startRow(int rowNum) {
            Arrays.fill(cells, 0, count, "");
            count = 0;
        }

        /** Whether the row just ended has no text; fills the gaps with empty cells. */
        boolean blank() {
            boolean blank = true;
            for (int i = 0; i < count; i++) {
                if (cells[i] == null) {
                    cells[i] = "";
                }
                if (!cells[i].isEmpty()) {
                    blank = false;
                }
            }
            return blank;
        }

        @Override
        public void cell(String reference, String value, XSSFComment comment) {
            // a cell without a reference (r=) follows the one before it, as spreadsheet programs read it
            int col = reference == null ? count : column(reference);
            if (col < 0 || col >= MAX_COLUMNS) {
                throw new XlsxTrouble.BadReference(reference);
            }
            if (col >= cells.length) {
                cells = Arrays.copyOf(cells, Math.max(col + 1, cells.length * 2));
            }
            for (int i = count; i < col; i++) {
                cells[i] = "";
            }
            cells[col] = value == null ? "" : value.trim();
            count = Math.max(count, col + 1);
        }

        private static int column(String reference) {
            int col = 0;
            for (int i = 0; i < reference.length() && col <= MAX_COLUMNS; i++) {
                char c = reference.charAt(i);
                if (c < 'A' || c > 'Z') {
                    break;
                }
                col = col * 26 + (c - 'A' + 1);
            }
            return col - 1;
        }
    }

    /** Reads up to the first non-blank row of a sheet, then stops the parse. */
    private static final class HeaderProbe extends RowCells {
        String[] header = new String[0];

        /** Whether the parse ended because the header was found (the SAX parser may have wrapped the signal). */
        static boolean found(Throwable e) {
            for (Throwable t = e; t != null; t = t.getCause()) {
                if (t instanceof Found) {
                    return true;
                }
            }
            return false;
        }

        /** Thrown to end the parse once the header is known. */
        static final class Found extends RuntimeException {
            private static final long serialVersionUID = 1L;

            Found() {
                super(null, null, false, false);
            }
        }

        @Override
        public void endRow(int rowNum) {
            if (!blank()) {
                header = Arrays.copyOf(cells, count);
                throw new Found();
            }
        }
    }

    /** Hands the header and each row on. */
    private static final class Rows extends RowCells {
        private final RowHandler handler;
        private boolean headerSeen;

        Rows(RowHandler handler) {
            this.handler = handler;
        }

        @Override
        public void endRow(int rowNum) {
            if (blank()) {
                return;
            }
            if (!headerSeen) {
                headerSeen = true;
                handler.header(rowNum + 1L, Arrays.copyOf(cells, count));
            } else {
                handler.row(rowNum + 1L, cells, count);
            }
        }
    }
}
