package org.nullpath.schedule;

import java.util.Objects;
import java.util.Optional;

import org.nullpath.link.Budget;
import org.nullpath.link.Directions;

/**
 * One planned message and its fate (a row of {@code <link>.csv}, docs/output-files.md).
 *
 * @param message   1, 2, ... within the link, in send order
 * @param sendClock sender's clock at sending, s
 * @param sendTime  mission time of the send event, s
 * @param delivery  its arrival; empty when it never arrives (beyond a horizon)
 */
public record MessageRow(long message, double sendClock, double sendTime, Optional<Delivery> delivery) {
    public MessageRow {
        Objects.requireNonNull(delivery, "delivery");
    }

    /** True when the message arrives. */
    public boolean delivered() {
        return delivery.isPresent();
    }

    /**
     * A message's arrival. A number that does not exist is NaN.
     *
     * @param receiveTime        mission time of arrival, s
     * @param receiveClock       receiver's clock at arrival, s
     * @param lightTime          receiveTime - sendTime, solved for directly, s
     * @param doppler            f_rx / f_tx
     * @param frequencyOffset    doppler - 1, without cancellation
     * @param receiveInterval    receiver-clock time since the previous message of this link arrived, s (NaN for
     *                           the first and after one that never arrives)
     * @param lightTimeCondition relative condition number of the light time (see lightcone.Conditioning)
     * @param budget             frequency plan and link budget, when the link has terms
     * @param directions         pointing directions, on links with terms or {@code directions: true}
     */
    public record Delivery(double receiveTime, double receiveClock, double lightTime, double doppler,
                           double frequencyOffset, double receiveInterval, double lightTimeCondition,
                           Optional<Budget> budget, Optional<Directions> directions) {
        public Delivery {
            Objects.requireNonNull(budget, "budget");
            Objects.requireNonNull(directions, "directions");
        }

        /** An arrival without pointing directions. */
        public Delivery(double receiveTime, double receiveClock, double lightTime, double doppler,
                        double frequencyOffset, double receiveInterval, double lightTimeCondition,
                        Optional<Budget> budget) {
            this(receiveTime, receiveClock, lightTime, doppler, frequencyOffset, receiveInterval, lightTimeCondition,
                    budget, Optional.empty());
        }

        /**
         * The first of the arrival's figures that is infinite, by its name (a Doppler factor beyond the double
         * range, or a budget figure: {@link Budget#beyondDoubleRange()}); empty when all are finite or absent.
         */
        public Optional<String> beyondDoubleRange() {
            if (Budget.noneInfinite(receiveTime, receiveClock, lightTime, doppler, frequencyOffset)
                    && Budget.noneInfinite(receiveInterval, lightTimeCondition, 0, 0, 0)) {
                return budget.isPresent() ? budget.get().beyondDoubleRange() : Optional.empty();
            }
            double[] values = {receiveTime, receiveClock, lightTime, doppler, frequencyOffset, receiveInterval,
                lightTimeCondition};
            for (int i = 0; i < values.length; i++) {
                if (Double.isInfinite(values[i])) {
                    return Optional.of(NAMES[i]);
                }
            }
            return budget.flatMap(Budget::beyondDoubleRange);
        }

        private static final String[] NAMES = {"arrival time", "arrival clock", "light time", "Doppler factor",
            "frequency offset", "arrival interval", "light-time condition number"};
    }
}
