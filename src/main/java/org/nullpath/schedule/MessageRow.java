package org.nullpath.schedule;

import org.nullpath.link.Budget;

/**
 * One planned message and its fate (contract.md, {@code <link>.csv}). Values that do not exist are NaN.
 *
 * @param message          1, 2, ... within the link, in send order
 * @param sendClock        sender's clock at sending, s
 * @param sendTime         mission time of the send event, s
 * @param delivered        false when the message never arrives (beyond a horizon)
 * @param receiveTime      mission time of arrival, s
 * @param receiveClock     receiver's clock at arrival, s
 * @param lightTime        receiveTime - sendTime, solved for directly, s
 * @param doppler          f_rx / f_tx
 * @param frequencyOffset  doppler - 1, without cancellation
 * @param receiveInterval  receiver-clock time since the previous message of this link arrived, s
 * @param budget           frequency plan and link budget, null when the link has no terms or the message never arrives
 * @param lightTimeCondition relative condition number of the light time (see lightcone.Conditioning); NaN when never
 */
public record MessageRow(long message, double sendClock, double sendTime, boolean delivered, double receiveTime,
                         double receiveClock, double lightTime, double doppler, double frequencyOffset,
                         double receiveInterval, Budget budget, double lightTimeCondition) {
}
