package org.treeproof.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The CSV formula guard prefixes exactly the cells a spreadsheet would run. The list of dangerous leading
 * characters (=, +, -, @, tab, carriage return) is the OWASP "CSV Injection" page's; that a minus sign followed by a
 * plain decimal number is read as a number and runs nothing is how spreadsheets parse numbers (common practice, no
 * single source).
 */
class CsvFormulaGuardTest {
    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', value = {
        "-5|-5", "-0.25|-0.25", "-1e3|-1e3", "-2.5E-7|-2.5E-7", "s-1|s-1", "5|5",
        "-2+3|'-2+3", "-A1|'-A1", "-|'-", "--5|'--5", "-5-|'-5-", "-1e|'-1e",
        "=1+1|'=1+1", "+1|'+1", "@SUM(A1)|'@SUM(A1)"})
    void guardsOnlyWhatASpreadsheetWouldRun(String cell, String written) {
        assertEquals(written, CsvOutputs.text(cell));
    }

    @ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"\tx", "\rx"})
    void tabAndCarriageReturnAreGuarded(String cell) {
        assertEquals("'" + cell, CsvOutputs.text(cell));
    }
}
