package org.nullpath.testkit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Send clocks of a scenario's message plans, computed by their definition in docs/scenario-format.md and not
 * read back from the tool's output: a series sends at {@code first + k every} for k = 0, 1, ... while not after
 * {@code last} (with a tolerance of 1e-9 {@code every}); an {@code at} list sends at its clocks; the plans of
 * one link are merged in send order. Values in seconds, as the scenario's quantities convert to (number times
 * unit factor), e.g. {@code 1.2 * YR}.
 */
public final class SendClocks {
    private SendClocks() {
    }

    /** One series. */
    public static double[] series(double first, double last, double every) {
        List<Double> c = new ArrayList<>();
        for (long k = 0; first + k * every <= last + 1e-9 * every; k++) {
            c.add(first + k * every);
        }
        return c.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Several plans of one link (series or {@code at} lists), merged in send order. */
    public static double[] merged(double[]... plans) {
        return Arrays.stream(plans).flatMapToDouble(Arrays::stream).sorted().toArray();
    }
}
