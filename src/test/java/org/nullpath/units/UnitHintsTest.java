package org.nullpath.units;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Units as people type them are refused with the unit nullpath spells (never accepted silently), and the
 * value is echoed as typed. 20 degrees Celsius is 293.15 K (SI Brochure 2019, 2.3.1: T/K = t/degC + 273.15).
 */
class UnitHintsTest {
    @ParameterizedTest(name = "''{0}'' as {1} suggests ''{2}''")
    @CsvSource(delimiter = '|', value = {
        "3 days | TIME | (did you mean 'd'?)",
        "2 years | TIME | (did you mean 'yr'?)",
        "5 hours | TIME | (did you mean 'h'?)",
        "90 minutes | TIME | (did you mean 'min'?)",
        "1 kbps | DATA_RATE | (did you mean 'kbit/s'?)",
        "2 Mbps | DATA_RATE | (did you mean 'Mbit/s'?)",
        "1 g | ACCELERATION | got a mass ('1 g') (did you mean 'g0'?)",
        "0.3 C | SPEED | (did you mean 'c'?)",
        "20 C | TEMPERATURE | 20 \u00b0C is 293.15 K",
        "20 deg C | TEMPERATURE | 20 \u00b0C is 293.15 K",
    })
    void aCommonSpellingGetsTheUnitNullpathUses(String typed, Dimension expected, String hint) {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse(typed, expected));
        assertTrue(e.getMessage().contains(hint), e.getMessage());
        assertTrue(e.getMessage().contains("'" + typed + "'"), "the value as typed: " + e.getMessage());
    }
}
