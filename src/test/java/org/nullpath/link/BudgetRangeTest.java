package org.nullpath.link;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Optional;

import org.junit.jupiter.api.Test;

/**
 * A budget names the first of its figures that is infinite (past the largest double, about 1.8e308, IEEE 754
 * binary64), so that a plan refuses it at its link instead of writing it; an absent figure (NaN) is not one.
 * Invented figures.
 */
class BudgetRangeTest {
    private static Budget radio(double fRx, double rate, double rxRate, double power, double margin, double maxRate) {
        return new Budget(new Budget.FrequencyPlan(8.4e9, fRx, rate, true, true), rxRate,
                new Budget.Reception.Coherent(power, power + 228.6, power + 198.6, margin, maxRate));
    }

    @Test
    void theFirstInfiniteFigureIsNamed() {
        double inf = Double.POSITIVE_INFINITY;
        assertEquals(Optional.empty(), radio(8.4e9, 1, 1e3, -150, 3, 2e3).beyondDoubleRange());
        assertEquals(Optional.empty(), radio(8.4e9, Double.NaN, 1e3, Double.NaN, Double.NaN, Double.NaN)
                .beyondDoubleRange());
        assertEquals(Optional.of("received frequency"), radio(inf, inf, 1e3, -150, 3, 2e3).beyondDoubleRange());
        assertEquals(Optional.of("Doppler rate"), radio(8.4e9, -inf, 1e3, -150, 3, 2e3).beyondDoubleRange());
        assertEquals(Optional.of("received data rate"), radio(8.4e9, 1, inf, -150, 3, 2e3).beyondDoubleRange());
        assertEquals(Optional.of("received power"), radio(8.4e9, 1, 1e3, inf, 3, 2e3).beyondDoubleRange());
        assertEquals(Optional.of("margin"), radio(8.4e9, 1, 1e3, -150, -inf, 2e3).beyondDoubleRange());
        assertEquals(Optional.of("highest closing data rate"), radio(8.4e9, 1, 1e3, -150, 3, inf).beyondDoubleRange());
        Budget optical = new Budget(new Budget.FrequencyPlan(2e14, 2e14, 0, true, true), 1e6,
                new Budget.Reception.PhotonCounting(-100, inf, inf, 10, 1e7));
        assertEquals(Optional.of("received photon rate"), optical.beyondDoubleRange());
    }
}
