package org.nullpath.units;

/**
 * Physical and astronomical constants, in SI units, each with its published source.
 * All values are exact by definition unless a comment says otherwise.
 */
public final class Constants {
    private Constants() {
    }

    /** Speed of light in vacuum, m/s. SI Brochure, 9th edition (2019): exact. */
    public static final double C = 299_792_458.0;
    /** c squared, m^2/s^2 (exactly representable: 8.987551787368176e16). */
    public static final double C2 = C * C;
    /** Standard acceleration of gravity, m/s^2. 3rd CGPM (1901): exact. */
    public static final double G0 = 9.806_65;
    /** Julian year, s: 365.25 days of 86 400 s. IAU definition: exact. */
    public static final double JULIAN_YEAR = 31_557_600.0;
    /** Day, s. */
    public static final double DAY = 86_400.0;
    /** Astronomical unit, m. IAU 2012 Resolution B2: exact. */
    public static final double AU = 149_597_870_700.0;
    /** Light year, m: c times one Julian year. IAU: exact (9 460 730 472 580 800 m). */
    public static final double LIGHT_YEAR = 9_460_730_472_580_800.0;
    /** Parsec, m: 648 000/pi au. IAU 2015 Resolution B2 (the value is exact; the double is rounded). */
    public static final double PARSEC = 648_000.0 / Math.PI * AU;
    /** Boltzmann constant, J/K. SI 2019 redefinition: exact. */
    public static final double BOLTZMANN = 1.380_649e-23;
    /** Planck constant, J s. SI 2019 redefinition: exact. */
    public static final double PLANCK = 6.626_070_15e-34;
}
