package org.nullpath.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;

import static org.nullpath.report.Palette.AXIS_FONT;
import static org.nullpath.report.Palette.FRAME;
import static org.nullpath.report.Palette.INK;
import static org.nullpath.report.Palette.TICK_FONT;

/** The charts' axes: ranges and tick steps set here, never left to auto-ranging, so output is deterministic. */
final class Axes {
    private Axes() {
    }

    static void style(ValueAxis a) {
        a.setLabelFont(AXIS_FONT);
        a.setLabelPaint(INK);
        a.setTickLabelFont(TICK_FONT);
        a.setTickLabelPaint(INK);
        a.setAxisLinePaint(FRAME);
        a.setTickMarkPaint(FRAME);
        a.setTickMarkOutsideLength(3f);
        a.setTickMarkInsideLength(0f);
    }

    /** Finite values' {min, max}; empty when there are none. */
    static Optional<double[]> extent(List<Double> values) {
        return extent(values.stream().mapToDouble(Double::doubleValue).toArray());
    }

    /** Finite values' {min, max}; empty when there are none. */
    static Optional<double[]> extent(double[] values) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (Double.isFinite(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        return lo <= hi ? Optional.of(new double[] {lo, hi}) : Optional.empty();
    }

    /** A linear axis over the values (padded by {@code pad} of the span) with about {@code ticks} steps. */
    static NumberAxis linear(String label, List<Double> values, double pad, boolean floorAtZero, int ticks) {
        Optional<double[]> range = extent(values);
        double lo;
        double hi;
        if (range.isEmpty()) {
            lo = 0;
            hi = 1;
        } else {
            lo = range.get()[0];
            hi = range.get()[1];
            double span = hi - lo;
            if (!(span > Math.abs(hi) * 1e-12)) {
                double half = Math.max(Math.abs(hi) * 0.01, 1e-12);
                if (hi == 0) {
                    half = 1;
                }
                lo -= half;
                hi += half;
            } else {
                boolean nonNegative = lo >= 0;
                lo -= pad * span;
                hi += pad * span;
                if (floorAtZero && nonNegative && lo < 0) {
                    lo = 0;
                }
            }
        }
        return fixed(label, lo, hi, ticks);
    }

    /** A linear axis over exactly [lo, hi]. */
    static NumberAxis fixed(String label, double lo, double hi, int ticks) {
        NumberAxis a = new NumberAxis(label);
        style(a);
        a.setAutoRange(false);
        a.setRange(lo, hi);
        double step = Scales.step(hi - lo, ticks);
        a.setTickUnit(new NumberTickUnit(step, Scales.ticks(step)));
        a.setMinorTickMarksVisible(false);
        return a;
    }

    /** A base-10 logarithmic axis over the positive values, labelled at powers of ten. */
    static LogAxis log(String label, List<Double> values) {
        List<Double> positive = new ArrayList<>();
        for (double v : values) {
            if (v > 0) {
                positive.add(v);
            }
        }
        double[] e = extent(positive).orElse(new double[] {1, 10});
        double lo = e[0];
        double hi = e[1];
        double llo = Math.log10(lo);
        double lhi = Math.log10(hi);
        double span = Math.max(lhi - llo, 0.5);
        llo -= 0.05 * span;
        lhi += 0.05 * span;
        LogAxis a = new LogAxis(label);
        style(a);
        a.setAutoRange(false);
        a.setRange(Math.pow(10, llo), Math.pow(10, lhi));
        double decades = lhi - llo;
        a.setTickUnit(new NumberTickUnit(Math.max(1, Math.ceil(decades / 6))));
        a.setNumberFormatOverride(Scales.powers());
        a.setMinorTickMarksVisible(true);
        a.setMinorTickCount(9);
        return a;
    }
}
