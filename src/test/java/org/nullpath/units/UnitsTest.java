package org.nullpath.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every unit docs/scenario-format.md lists (plus the mass and force units of profiled legs)
 * converts to the right SI value. Expected values are written out as decimal literals, not taken
 * from {@link Constants}. Sources: SI Brochure, 9th ed. (2019) for c and the decimal prefixes;
 * IAU for the Julian year, au (2012 Resolution B2), light year and parsec (2015 Resolution B2);
 * 3rd CGPM (1901) for g0. The decibel power units (dBW: 10 log10(P / 1 W); dBm: 10 log10(P / 1 mW))
 * are common practice with no single source.
 */
class UnitsTest {

    @ParameterizedTest(name = "{0} is {2} {1} ({3})")
    @CsvSource(delimiter = '|', textBlock = """
            1 s          | TIME           | 1                      | SI base unit
            1 min        | TIME           | 60                     | SI Brochure table 8 (non-SI units accepted for use)
            1 h          | TIME           | 3600                   | SI Brochure table 8
            1 d          | TIME           | 86400                  | SI Brochure table 8
            1 yr         | TIME           | 31557600               | IAU Julian year, 365.25 d
            2.5 yr       | TIME           | 78894000               | IAU Julian year, 365.25 d
            1 m          | LENGTH         | 1                      | SI base unit
            1 km         | LENGTH         | 1000                   | SI Brochure prefix kilo
            1 au         | LENGTH         | 149597870700           | IAU 2012 Resolution B2
            1 ly         | LENGTH         | 9460730472580800       | IAU: c x 1 Julian year
            4.2 ly       | LENGTH         | 39735067984839360      | IAU: c x 1 Julian year
            1 pc         | LENGTH         | 3.0856775814913673e16  | IAU 2015 Resolution B2: 648000/pi au
            1 nm         | LENGTH         | 1e-9                   | SI Brochure prefix nano (wavelength)
            1064 nm      | LENGTH         | 1.064e-6               | SI Brochure prefix nano (wavelength)
            1 um         | LENGTH         | 1e-6                   | SI Brochure prefix micro (wavelength)
            1 m/s        | SPEED          | 1                      | SI coherent derived unit
            1 km/s       | SPEED          | 1000                   | SI Brochure prefix kilo
            1 c          | SPEED          | 299792458              | SI Brochure 9th ed.: c exact
            0.3 c        | SPEED          | 89937737.4             | SI Brochure 9th ed.: c exact
            1 m/s^2      | ACCELERATION   | 1                      | SI coherent derived unit
            1 g0         | ACCELERATION   | 9.80665                | 3rd CGPM (1901) standard gravity
            -0.5 g0      | ACCELERATION   | -4.903325              | 3rd CGPM (1901) standard gravity
            1 Hz         | FREQUENCY      | 1                      | SI coherent derived unit
            1 kHz        | FREQUENCY      | 1e3                    | SI Brochure prefix kilo
            1 MHz        | FREQUENCY      | 1e6                    | SI Brochure prefix mega
            7.2 GHz      | FREQUENCY      | 7.2e9                  | SI Brochure prefix giga
            1 THz        | FREQUENCY      | 1e12                   | SI Brochure prefix tera
            100 Hz/s     | FREQUENCY_RATE | 100                    | SI coherent derived unit
            1 W          | POWER          | 1                      | SI coherent derived unit
            20 kW        | POWER          | 2e4                    | SI Brochure prefix kilo
            1 MW         | POWER          | 1e6                    | SI Brochure prefix mega
            100 GW       | POWER          | 1e11                   | SI Brochure prefix giga
            0 dBW        | POWER          | 1                      | common practice: dBW = 10 log10(P / 1 W)
            20 dBW       | POWER          | 100                    | common practice: dBW = 10 log10(P / 1 W)
            -30 dBW      | POWER          | 1e-3                   | common practice: dBW = 10 log10(P / 1 W)
            30 dBm       | POWER          | 1                      | common practice: dBm = 10 log10(P / 1 mW)
            0 dBm        | POWER          | 1e-3                   | common practice: dBm = 10 log10(P / 1 mW)
            74 dBi       | GAIN           | 74                     | gains stay in decibels (Quantity javadoc)
            1 dB         | RATIO          | 1                      | ratios stay in decibels (Quantity javadoc)
            300 K        | TEMPERATURE    | 300                    | SI base unit
            1 bit/s      | DATA_RATE      | 1                      | bit per second
            1 kbit/s     | DATA_RATE      | 1e3                    | SI Brochure prefix kilo
            1 Mbit/s     | DATA_RATE      | 1e6                    | SI Brochure prefix mega
            1 Gbit/s     | DATA_RATE      | 1e9                    | SI Brochure prefix giga
            1 rad        | ANGLE          | 1                      | SI coherent derived unit
            1 mrad       | ANGLE          | 1e-3                   | SI Brochure prefix milli
            1 urad       | ANGLE          | 1e-6                   | SI Brochure prefix micro
            180 deg      | ANGLE          | 3.141592653589793      | SI Brochure table 8: 1 deg = pi/180 rad
            1 deg        | ANGLE          | 0.017453292519943295   | SI Brochure table 8: 1 deg = pi/180 rad
            1 arcsec     | ANGLE          | 4.84813681109536e-6    | SI Brochure table 8: 1 arcsec = pi/648000 rad
            1 kg         | MASS           | 1                      | SI base unit
            10 g         | MASS           | 1e-2                   | SI Brochure: gram, kilogram / 1000
            100 t        | MASS           | 1e5                    | SI Brochure table 8: 1 t = 1000 kg
            1 N          | FORCE          | 1                      | SI coherent derived unit
            1 kN         | FORCE          | 1e3                    | SI Brochure prefix kilo
            2 MN         | FORCE          | 2e6                    | SI Brochure prefix mega
            """)
    void everyContractUnitConvertsToItsSiValue(String text, Dimension dimension, double expected, String source) {
        double si = Units.si(text, dimension);
        assertEquals(expected, si, Math.abs(expected) * 4e-16, () -> text + " per " + source);
        assertEquals(dimension, Units.parse(text, dimension).dimension());
    }

    @Test
    void aValueInTheSiUnitItselfIsTakenExactlyAsWritten() {
        // Units javadoc: "a value given in the SI unit itself is taken exactly as written"
        assertEquals(0.1, Units.si("0.1 m", Dimension.LENGTH));
        assertEquals(1234.5678e-3, Units.si("1234.5678e-3 s", Dimension.TIME));
        assertEquals(-7.25, Units.si("-7.25 m/s^2", Dimension.ACCELERATION));
    }

    @Test
    void aPlainNumberIsADimensionlessValue() {
        assertEquals(0.6, Units.si("0.6", Dimension.DIMENSIONLESS));
        assertEquals(1.0, Units.si(" 1 ", Dimension.DIMENSIONLESS));
    }

    @Test
    void threeDecibelsIsAFactorOfAbout1_995() {
        // decibel: 10 log10(ratio); 10^(3/10) = 1.9952623149688795 (common practice)
        assertEquals(1.9952623149688795, Units.parse("3 dB", Dimension.RATIO).linear(), 4e-16);
        assertEquals(1e7, Units.parse("70 dBi", Dimension.GAIN).linear(), 1e7 * 4e-16);
    }

    @Test
    void aParsecIsSixHundredFortyEightThousandOverPiAstronomicalUnits() {
        // IAU 2015 Resolution B2: 1 pc = 648000/pi au exactly
        assertEquals(648_000.0 / Math.PI, Units.si("1 pc", Dimension.LENGTH) / Units.si("1 au", Dimension.LENGTH), 1e-10);
    }

    private static UnitException rejected(String text, Dimension d) {
        return assertThrows(UnitException.class, () -> Units.parse(text, d));
    }

    @ParameterizedTest(name = "{0} read as {1} is rejected")
    @CsvSource(delimiter = '|', textBlock = """
            3 s        | LENGTH       | expected a length     | got a time
            4.2 ly     | TIME         | expected a time       | got a length
            1 g0       | SPEED        | expected a speed      | got an acceleration
            0.3 c      | ACCELERATION | expected an acceleration | got a speed
            7 GHz      | POWER        | expected a power      | got a frequency
            20 dBm     | GAIN         | expected a gain       | got a power
            74 dBi     | RATIO        | expected a ratio      | got a gain
            1 kbit/s   | FREQUENCY    | expected a frequency  | got a data rate
            """)
    void aUnitOfTheWrongDimensionIsRejectedSayingWhatWasExpectedAndFound(String text, Dimension d,
                                                                         String expected, String found) {
        String message = rejected(text, d).getMessage();
        assertTrue(message.contains(expected), message);
        assertTrue(message.contains(found), message);
    }

    @ParameterizedTest(name = "{0} suggests {2}")
    @CsvSource(delimiter = '|', textBlock = """
            4.2 lyr     | LENGTH       | ly
            7.2 Ghz     | FREQUENCY    | GHz
            3 kms       | SPEED        | km/s
            1 G0        | ACCELERATION | g0
            5 kbit      | DATA_RATE    | kbit/s
            10 dbm      | POWER        | dBm
            """)
    void anUnknownUnitIsRejectedWithADidYouMean(String text, Dimension d, String hint) {
        String message = rejected(text, d).getMessage();
        assertTrue(message.contains("expected " + d.description()), message);
        assertTrue(message.contains("unknown unit"), message);
        assertTrue(message.contains("did you mean '" + hint + "'"), message);
    }

    @Test
    void anUnknownUnitFarFromEveryKnownOneGetsNoSuggestion() {
        String message = rejected("3 furlongs", Dimension.LENGTH).getMessage();
        assertTrue(message.contains("unknown unit 'furlongs'"), message);
        assertFalse(message.contains("did you mean"), message);
    }

    @Test
    void aMissingUnitIsRejectedShowingAnExample() {
        String message = rejected("4.2", Dimension.LENGTH).getMessage();
        assertTrue(message.contains("expected a length with a unit"), message);
        assertTrue(message.contains("'4.2 ly'"), message);
        assertTrue(message.contains("got the plain number '4.2'"), message);
    }

    @ParameterizedTest(name = "''{0}'' is rejected as non-finite")
    @CsvSource(delimiter = '|', textBlock = """
            NaN m
            nan s
            Infinity ly
            -Infinity s
            inf Hz
            """)
    void notANumberAndInfinityAreRejected(String text) {
        String message = rejected(text, Dimension.LENGTH).getMessage();
        assertTrue(message.contains("expected a length"), message);
        assertTrue(message.contains("non-finite"), message);
    }

    @Test
    void aNumberTooLargeForADoubleIsRejected() {
        String message = rejected("1e400 m", Dimension.LENGTH).getMessage();
        assertTrue(message.contains("expected a length"), message);
        assertTrue(message.contains("too large"), message);
        // finite as written, infinite once converted: 1e300 ly = 9.46e315 m
        assertTrue(rejected("1e300 ly", Dimension.LENGTH).getMessage().contains("too large"));
    }

    @Test
    void textThatIsNotNumberThenUnitIsRejectedShowingTheForm() {
        String message = rejected("ly 4.2", Dimension.LENGTH).getMessage();
        assertTrue(message.contains("expected a length as 'NUMBER UNIT'"), message);
        assertTrue(message.contains("got 'ly 4.2'"), message);
        assertTrue(rejected("", Dimension.TIME).getMessage().contains("expected a time"));
        assertTrue(rejected(null, Dimension.TIME).getMessage().contains("got nothing"));
    }

    @ParameterizedTest(name = "distance({0}, {1}) = {2}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
            kitten   | sitting  | 3
            ""       | abc      | 3
            abc      | ""       | 3
            flaw     | lawn     | 2
            yrs      | yr       | 1
            burn     | burn     | 0
            """)
    void spellingDistanceIsTheLevenshteinDistance(String a, String b, int expected) {
        // Levenshtein (1966): insertions, deletions and substitutions; kitten/sitting = 3 is the textbook example
        assertEquals(expected, Spelling.distance(a, b));
        assertEquals(expected, Spelling.distance(b, a), "symmetric");
    }

    @Test
    void theClosestCandidateIsTheFirstOfTheNearestWithinAThirdOfTheWord() {
        assertEquals("bat", Spelling.closest("cat", java.util.List.of("bat", "hat", "dog")), "ties go to the first");
        assertEquals("position", Spelling.closest("positon", java.util.List.of("velocity", "position")));
        assertEquals(null, Spelling.closest("zebra", java.util.List.of("burn", "coast")), "nothing near enough");
    }

    @Test
    void symbolsOfADimensionListItsUnitsAndNoOthers() {
        java.util.List<String> time = java.util.List.of(Units.symbolsOf(Dimension.TIME).split(" "));
        assertTrue(time.containsAll(java.util.List.of("s", "min", "h", "d", "yr")), time.toString());
        assertFalse(time.contains("m") || time.contains("ly") || time.contains("g0"), time.toString());
        assertEquals(time.size(), new java.util.HashSet<>(time).size(), "each once");
        assertEquals("s", Dimension.TIME.siSymbol());
        assertEquals("m", Dimension.LENGTH.siSymbol());
        assertEquals("m/s^2", Dimension.ACCELERATION.siSymbol());
    }
}
