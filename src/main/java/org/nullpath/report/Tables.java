package org.nullpath.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.ToDoubleFunction;

import org.nullpath.link.Budget;
import org.nullpath.link.Budget.Reception.Coherent;
import org.nullpath.link.Budget.Reception.PhotonCounting;
import org.nullpath.link.Directions;
import org.nullpath.link.LinkTerms;
import org.nullpath.schedule.CrossingRow;
import org.nullpath.schedule.CutoffRow;
import org.nullpath.schedule.ExchangeRow;
import org.nullpath.schedule.HorizonRow;
import org.nullpath.schedule.MessageRow;
import org.nullpath.schedule.MessageRow.Delivery;
import org.nullpath.schedule.WindowFigures;

/**
 * The columns of every CSV file a plan writes (docs/output-files.md lists the same columns; a test keeps
 * the two in step). Times are in seconds, frequencies in Hz, powers in dBW; an empty cell is a value that
 * does not exist.
 */
public final class Tables {
    private Tables() {
    }

    /** The columns every {@code <link>.csv} starts with. */
    public static final List<Column<MessageRow>> MESSAGE = List.of(
            Column.count("message", "1, 2, ... within the link, in send order", MessageRow::message),
            Column.number("send_clock_s", "s", "sender's clock at sending", MessageRow::sendClock),
            Column.number("send_time_s", "s", "mission time of the send event", MessageRow::sendTime),
            Column.text("status", "`delivered`, or `never` (beyond the horizon: no arrival at any time)",
                    r -> r.delivered() ? "delivered" : "never"),
            delivered("receive_time_s", "s", "mission time of arrival", Delivery::receiveTime),
            delivered("receive_clock_s", "s", "receiver's clock at arrival", Delivery::receiveClock),
            delivered("light_time_s", "s", "receive_time_s - send_time_s, solved for directly so it keeps full"
                    + " relative precision", Delivery::lightTime),
            delivered("doppler", "", "f_rx / f_tx", Delivery::doppler),
            delivered("frequency_offset", "", "doppler - 1, computed without cancellation", Delivery::frequencyOffset),
            delivered("receive_interval_s", "s", "receiver-clock time since the previous message of this link"
                    + " arrived (empty for the first and after a `never`): the arrival rate",
                    Delivery::receiveInterval));

    /** nullpath's own column after the budget columns: the light time's relative condition number. */
    public static final Column<MessageRow> CONDITION = delivered("light_time_condition", "",
            "relative condition number of the light time: it is known to about this times 1.1e-16 relative",
            Delivery::lightTimeCondition);

    private static final Column<Budget> TX_FREQUENCY = Column.number("tx_frequency_hz", "Hz", "transmitted frequency"
            + " (the carrier, or carrier / D when pre-compensating)", b -> b.frequency().txFrequencyHz());
    private static final Column<Budget> RX_FREQUENCY = Column.number("rx_frequency_hz", "Hz", "received frequency",
            b -> b.frequency().rxFrequencyHz());
    private static final Column<Budget> DOPPLER_RATE = Column.number("doppler_rate_hz_per_s", "Hz/s",
            "d(rx_frequency) / d(receiver clock)", b -> b.frequency().dopplerRateHzPerS());
    private static final Column<Budget> IN_TUNING_RANGE = Column.flag("in_tuning_range", "whether the received"
            + " frequency lies in the tuning range", b -> b.frequency().inTuningRange());
    private static final Column<Budget> RX_POWER = Column.number("rx_power_dbw", "dBW", "received power",
            b -> b.reception().rxPowerDbw());
    private static final Column<Budget> RX_DATA_RATE = Column.number("rx_data_rate_bps", "bit/s", "data rate as"
            + " received, D x data-rate", Budget::rxDataRateBps);
    private static final Column<Budget> MAX_DATA_RATE = Column.number("max_data_rate_bps", "bit/s", "highest"
            + " sender-frame data rate that closes with zero margin", b -> b.reception().maxDataRateBps());
    private static final Column<Budget> WITHIN_DOPPLER_RATE = Column.flag("within_doppler_rate", "whether the Doppler"
            + " rate's size is within max-doppler-rate (true when none is given)",
            b -> b.frequency().withinDopplerRate());

    /** The budget columns of a coherent (radio) link. */
    public static final List<Column<Budget>> COHERENT = budget(
            coherent("cn0_dbhz", "dB-Hz", "carrier-to-noise density C/N0", Coherent::cn0DbHz),
            coherent("ebn0_db", "dB", "Eb/N0", Coherent::ebN0Db), "Eb/N0 over the requirement");

    /** The budget columns of a photon-counting (optical) link. */
    public static final List<Column<Budget>> PHOTON_COUNTING = budget(
            photons("rx_photon_rate_per_s", "1/s", "received photons per second", PhotonCounting::rxPhotonRatePerS),
            photons("photons_per_bit", "", "received photons per bit", PhotonCounting::photonsPerBit),
            "photons per bit over the requirement, in dB");

    /**
     * The budget columns in file order: the shared ones around the detection's own two (its received power
     * density or rate, after rx_power_dbw; its energy or photons per bit, after rx_data_rate_bps).
     */
    private static List<Column<Budget>> budget(Column<Budget> density, Column<Budget> perBit, String marginMeaning) {
        return List.of(TX_FREQUENCY, RX_FREQUENCY, DOPPLER_RATE, IN_TUNING_RANGE, RX_POWER, density, RX_DATA_RATE,
                perBit, Column.number("margin_db", "dB", marginMeaning, b -> b.reception().marginDb()), MAX_DATA_RATE,
                WITHIN_DOPPLER_RATE);
    }

    /**
     * The pointing columns, last in {@code <link>.csv} on every link with terms and on any with
     * {@code directions: true}: the signal's directions in the sender's and the receiver's rest frames.
     */
    public static final List<Column<Directions>> POINTING = List.of(
            Column.number("aim_x", "", "x of the unit vector, sender's rest frame at the send event, along which the"
                    + " signal must leave to meet the receiver (aberration included)", d -> d.aim().x()),
            Column.number("aim_y", "", "its y", d -> d.aim().y()),
            Column.number("aim_z", "", "its z", d -> d.aim().z()),
            Column.number("look_x", "", "x of the unit vector, receiver's rest frame at arrival, towards where the"
                    + " receiver sees the sender", d -> d.look().x()),
            Column.number("look_y", "", "its y", d -> d.look().y()),
            Column.number("look_z", "", "its z", d -> d.look().z()),
            Column.number("point_ahead_urad", "urad", "sender's frame: angle between aim and where the sender sees"
                    + " the receiver at the send event (the receiver's light on the send event's past cone)",
                    d -> d.pointAheadRadians() * 1e6));

    /** The antennas' pointing, after the pointing columns on a link with terms. */
    public static final List<Column<Budget>> ANTENNA_POINTING = List.of(
            Column.number("tx_off_boresight_deg", "deg", "transmit antenna: angle between aim and its boresight (its"
                    + " pointing error when tracking)", b -> Math.toDegrees(b.pointing().txOffBoresightRadians())),
            Column.number("rx_off_boresight_deg", "deg", "receive antenna: angle between look and its boresight (its"
                    + " pointing error when tracking)", b -> Math.toDegrees(b.pointing().rxOffBoresightRadians())),
            Column.number("pointing_loss_db", "dB", "both antennas' loss off boresight, included in rx_power_dbw and"
                    + " everything after it", b -> b.pointing().lossDb()));

    /** The columns of {@code <link>.csv} for a link with these terms (if any), with an epoch (if given), without pointing. */
    public static Table<MessageRow> messages(Optional<LinkTerms> terms, Optional<Instant> epoch) {
        return messages(terms, false, epoch);
    }

    /**
     * The columns of {@code <link>.csv} for a link with these terms (if any), with the pointing columns when
     * {@code pointing} (they are there whenever there are terms), with an epoch (if given).
     */
    public static Table<MessageRow> messages(Optional<LinkTerms> terms, boolean pointing, Optional<Instant> epoch) {
        List<Column<MessageRow>> c = new ArrayList<>(MESSAGE);
        terms.ifPresent(t -> {
            List<Column<Budget>> part = t.detection() == LinkTerms.Detection.COHERENT ? COHERENT : PHOTON_COUNTING;
            for (Column<Budget> b : part) {
                c.add(b.from(r -> r.delivery().flatMap(Delivery::budget)));
            }
        });
        c.add(CONDITION);
        epoch.ifPresent(e -> {
            c.add(Column.text("send_time_utc", "send_time_s as a calendar instant (with epoch)",
                    r -> Cells.utc(e, r.sendTime())));
            c.add(Column.<Delivery>text("receive_time_utc", "receive_time_s as a calendar instant (with epoch)",
                    d -> Cells.utc(e, d.receiveTime())).from(MessageRow::delivery));
        });
        if (pointing || terms.isPresent()) {
            for (Column<Directions> d : POINTING) {
                c.add(d.from(r -> r.delivery().flatMap(Delivery::directions)));
            }
        }
        if (terms.isPresent()) {
            for (Column<Budget> b : ANTENNA_POINTING) {
                c.add(b.from(r -> r.delivery().flatMap(Delivery::budget)));
            }
        }
        return new Table<>(c);
    }

    /** The columns of cutoffs.csv. */
    public static Table<CutoffRow> cutoffs(Optional<Instant> epoch) {
        List<Column<CutoffRow>> c = new ArrayList<>(List.of(
                Column.text("name", "the cut-off's name", CutoffRow::name),
                Column.text("link", "the link the command goes on", CutoffRow::link),
                Column.number("arrive_by_clock_s", "s", "the deadline on the receiver's clock", CutoffRow::arriveByClock),
                Column.number("latest_send_clock_s", "s", "sender's clock at the latest send that arrives by then",
                        CutoffRow::latestSendClock),
                Column.number("latest_send_time_s", "s", "mission time of that send", CutoffRow::latestSendTime),
                Column.text("status", "`ok`, or `unreachable` when no send on the sender's worldline arrives by then",
                        r -> r.reachable() ? "ok" : "unreachable"),
                Column.flag("before_mission_start", "the latest send lies before mission time 0: a plan made at"
                        + " mission time 0 is already too late", CutoffRow::beforeStart)));
        epoch.ifPresent(e -> c.add(Column.text("latest_send_time_utc",
                "latest_send_time_s as a calendar instant (with epoch)", r -> Cells.utc(e, r.latestSendTime()))));
        return new Table<>(c);
    }

    /** The columns of horizons.csv. */
    public static Table<HorizonRow> horizons(Optional<Instant> epoch) {
        List<Column<HorizonRow>> c = new ArrayList<>(List.of(
                Column.text("link", "the link", HorizonRow::link),
                Column.flag("has_horizon", "whether some sends never arrive", HorizonRow::hasHorizon),
                Column.number("last_send_clock_s", "s", "sender's clock at the supremum of sends that still arrive"
                        + " (a send at or after it never does); empty when there is none", HorizonRow::lastSendClock),
                Column.number("last_send_time_s", "s", "mission time of that supremum", HorizonRow::lastSendTime)));
        epoch.ifPresent(e -> c.add(Column.text("last_send_time_utc",
                "last_send_time_s as a calendar instant (with epoch)", r -> Cells.utc(e, r.lastSendTime()))));
        return new Table<>(c);
    }

    /** The columns of every {@code exchanges-<name>.csv}. */
    public static final Table<ExchangeRow> EXCHANGES = new Table<>(List.of(
            Column.count("exchange", "1, 2, ... within the exchange plan", ExchangeRow::exchange),
            Column.number("query_send_clock_s", "s", "querier's clock when the query leaves", ExchangeRow::querySendClock),
            Column.number("query_receive_clock_s", "s", "responder's clock when it arrives",
                    ExchangeRow::queryReceiveClock),
            Column.number("reply_send_clock_s", "s", "responder's clock when the reply leaves (arrival plus"
                    + " turnaround)", ExchangeRow::replySendClock),
            Column.number("reply_receive_clock_s", "s", "querier's clock when the reply arrives",
                    ExchangeRow::replyReceiveClock),
            Column.number("round_trip_clock_s", "s", "the round trip on the querier's own clock",
                    ExchangeRow::roundTripClock),
            Column.text("status", "`complete`, or `never` when the query or the reply never arrives",
                    r -> r.complete() ? "complete" : "never")));

    /** The columns of windows.csv. */
    public static final Table<WindowFigures> WINDOWS = new Table<>(List.of(
            Column.text("link", "the link", w -> w.window().link()),
            Column.number("opens_send_clock_s", "s", "sender's clock where the window opens",
                    w -> w.window().opensClock()),
            Column.number("closes_send_clock_s", "s", "sender's clock where it closes",
                    w -> w.window().closesClock()),
            Column.text("closed_by", "what closes it: `margin`, `tuning`, `doppler-rate`, `horizon`, or `end` (of"
                    + " the scanned range)", w -> w.window().closedBy()),
            Column.number("send_open_s", "s", "how long it is open on the sender's clock: closes - opens",
                    WindowFigures::sendOpenSeconds),
            Column.number("receive_open_s", "s", "the arrivals of its first and last sends, their interval on the"
                    + " receiver's clock (Doppler stretches it against send_open_s); empty when it closes at the"
                    + " horizon (the last send never arrives)", WindowFigures::receiveOpenSeconds),
            Column.number("volume_bits", "bit", "the planned data rate times send_open_s",
                    WindowFigures::volumeBits),
            Column.number("adaptive_volume_bits", "bit", "the integral of max_data_rate_bps over the window on the"
                    + " sender's clock (adaptive quadrature, 1e-6 relative): what a rate following the highest"
                    + " closing rate would carry", WindowFigures::adaptiveVolumeBits)));

    /** The columns of crossings.csv. */
    public static final Table<CrossingRow> CROSSINGS = new Table<>(List.of(
            Column.text("link", "the link", CrossingRow::link),
            Column.text("limit", "`margin`, `tuning-low`, `tuning-high`, `doppler-rate` or `horizon`",
                    CrossingRow::limit),
            Column.text("direction", "`enters` (the condition starts to hold as the send clock increases) or"
                    + " `leaves`", CrossingRow::direction),
            Column.number("send_clock_s", "s", "sender's clock at the crossing", CrossingRow::sendClock),
            Column.number("send_time_s", "s", "mission time of that send", CrossingRow::sendTime),
            Column.number("receive_clock_s", "s", "receiver's clock at its arrival; empty for the horizon (it never"
                    + " arrives)", CrossingRow::receiveClock)));

    private static Column<MessageRow> delivered(String name, String unit, String meaning,
                                                ToDoubleFunction<Delivery> value) {
        return Column.number(name, unit, meaning, value).from(MessageRow::delivery);
    }

    private static Column<Budget> coherent(String name, String unit, String meaning, ToDoubleFunction<Coherent> f) {
        return Column.<Coherent>number(name, unit, meaning, f).from(b -> b.reception(Coherent.class));
    }

    private static Column<Budget> photons(String name, String unit, String meaning,
                                          ToDoubleFunction<PhotonCounting> f) {
        return Column.<PhotonCounting>number(name, unit, meaning, f).from(b -> b.reception(PhotonCounting.class));
    }
}
