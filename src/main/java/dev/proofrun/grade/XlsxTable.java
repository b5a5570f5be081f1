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
import javax.xml.parsers.ParserConfigurationException;
import org.apache.poi.openxml4j.exceptions.OpenXML4JException;
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
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;

/**
 * Reads the first sheet of a returned XLSX workbook with POI's streaming (SAX) reader, so large workbooks
 * are not built in memory. Numbers arrive as their stored value (not as the cell format shows them, which
 * may round); date-formatted cells arrive as "yyyy-MM-dd HH:mm:ss" local times; text as typed.
 * Row numbers are the sheet's.
 */
final class XlsxTable {

    private static final DateTimeFormatter LOCAL = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss", Locale.ROOT);

    private XlsxTable() {
    }

    static void read(Path path, String display, RowHandler handler) {
        try (OPCPackage pkg = OPCPackage.open(path.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg);
            StylesTable styles = reader.getStylesTable();
            Iterator<InputStream> sheets = reader.getSheetsData();
            if (!sheets.hasNext()) {
                throw new UserException(Location.file(display), GradeMessage.NO_ROWS);
            }
            try (InputStream sheet = sheets.next()) {
                XMLReader xml = XMLHelper.newXMLReader();
                xml.setContentHandler(new XSSFSheetXMLHandler(styles, strings, new Rows(handler), new RawNumbers(), false));
                xml.parse(new InputSource(sheet));
            }
        } catch (IOException | OpenXML4JException | SAXException | ParserConfigurationException
                | org.apache.poi.ooxml.POIXMLException | org.apache.poi.openxml4j.exceptions.InvalidOperationException e) {
            throw new UserException(Location.file(display), GradeMessage.FILE_UNREADABLE, String.valueOf(e.getMessage()));
        } catch (UserException e) {
            throw e;
        } catch (RuntimeException e) {
            // POI signals a file that is not a workbook with unchecked exceptions (NotOfficeXmlFileException, ...)
            throw new UserException(Location.file(display), GradeMessage.FILE_UNREADABLE,
                    "not a readable XLSX workbook (" + e.getClass().getSimpleName() + ")");
        }
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

    /** Collects the cells of a row by column letter and hands the row on. */
    private static final class Rows implements XSSFSheetXMLHandler.SheetContentsHandler {
        private final RowHandler handler;
        private String[] cells = new String[32];
        private int count;
        private boolean headerSeen;

        Rows(RowHandler handler) {
            this.handler = handler;
        }

        @Override
        public void startRow(int rowNum) {
            Arrays.fill(cells, 0, count, "");
            count = 0;
        }

        @Override
        public void endRow(int rowNum) {
            boolean blank = true;
            for (int i = 0; i < count; i++) {
                if (cells[i] == null) {
                    cells[i] = "";
                }
                if (!cells[i].isEmpty()) {
                    blank = false;
                }
            }
            if (blank) {
                return;
            }
            if (!headerSeen) {
                headerSeen = true;
                handler.header(rowNum + 1L, Arrays.copyOf(cells, count));
            } else {
                handler.row(rowNum + 1L, cells, count);
            }
        }

        @Override
        public void cell(String reference, String value, XSSFComment comment) {
            int col = column(reference);
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
            for (int i = 0; i < reference.length(); i++) {
                char c = reference.charAt(i);
                if (c < 'A' || c > 'Z') {
                    break;
                }
                col = col * 26 + (c - 'A' + 1);
            }
            return col - 1;
        }
    }
}
