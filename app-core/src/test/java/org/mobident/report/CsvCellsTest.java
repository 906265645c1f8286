package org.mobident.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Trigger characters from the OWASP "CSV Injection" guidance. */
class CsvCellsTest {

    @Test
    void formulaStartsGetAnApostrophe() {
        assertEquals("'=HYPERLINK(\"x\")", CsvCells.inert("=HYPERLINK(\"x\")"));
        assertEquals("'+1+2", CsvCells.inert("+1+2"));
        assertEquals("'-2+3", CsvCells.inert("-2+3"));
        assertEquals("'@SUM(A1:A2)", CsvCells.inert("@SUM(A1:A2)"));
        assertEquals("'\t=1", CsvCells.inert("\t=1"));
        assertEquals("'\r=1", CsvCells.inert("\r=1"));
    }

    @Test
    void ordinaryTextIsUnchanged() {
        assertEquals("nitrate", CsvCells.inert("nitrate"));
        assertEquals("spring-01", CsvCells.inert("spring-01"));
        assertEquals("a=b", CsvCells.inert("a=b"), "only the first character matters");
        assertEquals(" =1", CsvCells.inert(" =1"));
        assertEquals("", CsvCells.inert(""));
        assertEquals("", CsvCells.inert(null));
    }

    @Test
    void detectsOnlyLeadingTriggers() {
        assertTrue(CsvCells.startsDangerously("-12.5"));
        assertFalse(CsvCells.startsDangerously("12.5"));
        assertFalse(CsvCells.startsDangerously(null));
    }

    @Test
    void numbersWrittenByThePeakTableStayNumbers() throws Exception {
        // The peak table never passes numeric cells through inert(): a negative mobility must
        // reach the spreadsheet as a number, not as the text '-12.500.
        java.io.StringWriter out = new java.io.StringWriter();
        PeakTableCsv.write(java.util.List.of(ReportFixtures.okRun()), out);
        String text = out.toString();
        assertTrue(text.contains(",-71.520,"), text);
        assertFalse(text.contains("'-71.520"), text);
    }
}
