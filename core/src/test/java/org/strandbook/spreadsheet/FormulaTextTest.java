package org.strandbook.spreadsheet;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class FormulaTextTest {

    @Test
    void everyLeadCharacterOfTheOwaspListMarksAFormula() {
        // OWASP "CSV Injection": cells beginning with = + - @ tab or carriage return may be evaluated
        for (String text : new String[] {"=HYPERLINK(\"x\")", "+1 spare", "-3 dB margin", "@SUM(A1)", "\tcmd", "\rcmd"}) {
            assertTrue(FormulaText.startsLikeFormula(text), text);
        }
    }

    @Test
    void plainTextAndEmptyCellsAreNotFormulas() {
        // OWASP "CSV Injection": only the first character matters
        assertFalse(FormulaText.startsLikeFormula("Reactor outlet = R-101"));
        assertFalse(FormulaText.startsLikeFormula(""));
        assertFalse(FormulaText.startsLikeFormula(null));
    }
}
