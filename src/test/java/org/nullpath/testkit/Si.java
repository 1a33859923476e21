package org.nullpath.testkit;

/**
 * The constants and unit factors the tests compute expected values with, each exact by definition (no
 * measured value):
 * <ul>
 *   <li>c = 299 792 458 m/s, k_B = 1.380 649e-23 J/K, h = 6.626 070 15e-34 J s: SI Brochure, 9th ed. (2019);</li>
 *   <li>g0 = 9.806 65 m/s^2: 3rd CGPM (1901);</li>
 *   <li>Julian year 365.25 d of 86 400 s, light year c x Julian year: IAU; au = 149 597 870 700 m: IAU 2012
 *       Resolution B2.</li>
 * </ul>
 * The reference in {@code org.nullpath.reference} keeps its own copies (it stands alone).
 */
public final class Si {
    public static final double C = 299_792_458.0;
    public static final double G0 = 9.806_65;
    public static final double DAY = 86_400.0;
    public static final double HOUR = 3_600.0;
    public static final double YR = 31_557_600.0;
    public static final double LY = 9_460_730_472_580_800.0;
    public static final double AU = 149_597_870_700.0;
    public static final double K_B = 1.380_649e-23;
    public static final double H = 6.626_070_15e-34;

    private Si() {
    }
}
