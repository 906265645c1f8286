package org.mobident.io;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.mobident.InputException;

/** Splitting one line of a small CSV sheet into cells with Commons CSV, for the line-by-line sheet readers. */
public final class CsvLines {

    private CsvLines() {
    }

    /**
     * The cells of {@code line} in {@code format}; an empty list for an empty line.
     *
     * @throws InputException naming {@code file} and {@code lineNo} when the quotes do not close
     */
    public static List<String> cells(String line, CSVFormat format, String file, long lineNo) throws InputException {
        try (CSVParser parser = CSVParser.builder().setReader(new StringReader(line)).setFormat(format).get()) {
            List<CSVRecord> records = parser.getRecords();
            return records.isEmpty() ? List.of() : records.get(0).toList();
        } catch (IOException | UncheckedIOException | IllegalStateException e) {
            throw new InputException(file, lineNo, null, "cannot split the line into cells (check the quotes): "
                    + e.getMessage(), e);
        }
    }
}
