package org.nullpath.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.nullpath.link.Budget;
import org.nullpath.link.LinkTerms;
import org.nullpath.schedule.CutoffRow;
import org.nullpath.schedule.ExchangeRow;
import org.nullpath.schedule.HorizonRow;
import org.nullpath.schedule.MessageRow;
import org.nullpath.schedule.WindowRow;

import static org.nullpath.report.Cells.bool;
import static org.nullpath.report.Cells.num;
import static org.nullpath.report.Cells.utc;

/** The CSV files of contract.md, written with Apache Commons CSV, one header line, LF line ends. */
public final class CsvTables {
    private CsvTables() {
    }

    static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get();

    public static final List<String> MESSAGE_COLUMNS = List.of("message", "send_clock_s", "send_time_s", "status",
            "receive_time_s", "receive_clock_s", "light_time_s", "doppler", "frequency_offset", "receive_interval_s");

    /**
     * nullpath's own last column: the light time's relative condition number (lightcone.Conditioning);
     * the light time is known to about this times 1.1e-16 relative.
     */
    public static final String CONDITION_COLUMN = "light_time_condition";

    /** Columns added for a coherent (radio) link. */
    public static final List<String> COHERENT_COLUMNS = List.of("tx_frequency_hz", "rx_frequency_hz",
            "doppler_rate_hz_per_s", "in_tuning_range", "rx_power_dbw", "cn0_dbhz", "rx_data_rate_bps", "ebn0_db",
            "margin_db", "max_data_rate_bps", "within_doppler_rate");
    /** Columns added for a photon-counting (optical) link. */
    public static final List<String> PHOTON_COLUMNS = List.of("tx_frequency_hz", "rx_frequency_hz",
            "doppler_rate_hz_per_s", "in_tuning_range", "rx_power_dbw", "rx_photon_rate_per_s", "rx_data_rate_bps",
            "photons_per_bit", "margin_db", "max_data_rate_bps", "within_doppler_rate");

    /** A streaming writer of one link's message rows. */
    public static final class MessageWriter implements AutoCloseable {
        private final CSVPrinter printer;
        private final Object[] cells;
        private final LinkTerms terms;
        private final java.time.Instant epoch;

        public MessageWriter(Path file, LinkTerms terms, java.time.Instant epoch) throws IOException {
            BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
            this.terms = terms;
            this.epoch = epoch;
            printer = new CSVPrinter(w, FORMAT);
            List<String> header = new ArrayList<>(MESSAGE_COLUMNS);
            if (terms != null) {
                header.addAll(terms.detection() == LinkTerms.Detection.COHERENT ? COHERENT_COLUMNS : PHOTON_COLUMNS);
            }
            header.add(CONDITION_COLUMN);
            if (epoch != null) {
                header.add("send_time_utc");
                header.add("receive_time_utc");
            }
            cells = new Object[header.size()];
            printer.printRecord(header);
        }

        /** Writes one row; I/O failures surface as {@link UncheckedIOException}. */
        public void write(MessageRow r) {
            cells[0] = Long.toString(r.message());
            cells[1] = num(r.sendClock());
            cells[2] = num(r.sendTime());
            cells[3] = r.delivered() ? "delivered" : "never";
            cells[4] = num(r.receiveTime());
            cells[5] = num(r.receiveClock());
            cells[6] = num(r.lightTime());
            cells[7] = num(r.doppler());
            cells[8] = num(r.frequencyOffset());
            cells[9] = num(r.receiveInterval());
            if (terms != null) {
                Budget b = r.budget();
                boolean coherent = terms.detection() == LinkTerms.Detection.COHERENT;
                if (b == null) {
                    for (int i = 10; i < cells.length; i++) {
                        cells[i] = "";
                    }
                } else {
                    cells[10] = num(b.txFrequencyHz());
                    cells[11] = num(b.rxFrequencyHz());
                    cells[12] = num(b.dopplerRateHzPerS());
                    cells[13] = bool(b.inTuningRange());
                    cells[14] = num(b.rxPowerDbw());
                    cells[15] = num(coherent ? b.cn0DbHz() : b.rxPhotonRatePerS());
                    cells[16] = num(b.rxDataRateBps());
                    cells[17] = num(coherent ? b.ebN0Db() : b.photonsPerBit());
                    cells[18] = num(b.marginDb());
                    cells[19] = num(b.maxDataRateBps());
                    cells[20] = bool(b.withinDopplerRate());
                }
            }
            int last = epoch == null ? cells.length - 1 : cells.length - 3;
            cells[last] = num(r.lightTimeCondition());
            if (epoch != null) {
                cells[last + 1] = utc(epoch, r.sendTime());
                cells[last + 2] = utc(epoch, r.receiveTime());
            }
            try {
                printer.printRecord(cells);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        @Override
        public void close() throws IOException {
            printer.close(true);
        }
    }

    public static void writeCutoffs(Path file, List<CutoffRow> rows, java.time.Instant epoch) throws IOException {
        try (CSVPrinter p = new CSVPrinter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), FORMAT)) {
            List<String> header = new ArrayList<>(List.of("name", "link", "arrive_by_clock_s", "latest_send_clock_s",
                    "latest_send_time_s", "status", "before_mission_start"));
            if (epoch != null) {
                header.add("latest_send_time_utc");
            }
            p.printRecord(header);
            for (CutoffRow r : rows) {
                List<String> cells = new ArrayList<>(List.of(r.name(), r.link(), num(r.arriveByClock()),
                        num(r.latestSendClock()), num(r.latestSendTime()), r.reachable() ? "ok" : "unreachable",
                        bool(r.beforeStart())));
                if (epoch != null) {
                    cells.add(utc(epoch, r.latestSendTime()));
                }
                p.printRecord(cells);
            }
        }
    }

    public static void writeHorizons(Path file, List<HorizonRow> rows, java.time.Instant epoch) throws IOException {
        try (CSVPrinter p = new CSVPrinter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), FORMAT)) {
            List<String> header = new ArrayList<>(List.of("link", "has_horizon", "last_send_clock_s", "last_send_time_s"));
            if (epoch != null) {
                header.add("last_send_time_utc");
            }
            p.printRecord(header);
            for (HorizonRow r : rows) {
                List<String> cells = new ArrayList<>(List.of(r.link(), bool(r.hasHorizon()), num(r.lastSendClock()),
                        num(r.lastSendTime())));
                if (epoch != null) {
                    cells.add(utc(epoch, r.lastSendTime()));
                }
                p.printRecord(cells);
            }
        }
    }

    public static void writeWindows(Path file, List<WindowRow> rows) throws IOException {
        try (CSVPrinter p = new CSVPrinter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), FORMAT)) {
            p.printRecord("link", "opens_send_clock_s", "closes_send_clock_s", "closed_by");
            for (WindowRow r : rows) {
                p.printRecord(r.link(), num(r.opensClock()), num(r.closesClock()), r.closedBy());
            }
        }
    }

    /** A streaming writer of one exchange plan's rows. */
    public static final class ExchangeWriter implements AutoCloseable {
        private final CSVPrinter printer;

        public ExchangeWriter(Path file) throws IOException {
            printer = new CSVPrinter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), FORMAT);
            printer.printRecord("exchange", "query_send_clock_s", "query_receive_clock_s", "reply_send_clock_s",
                    "reply_receive_clock_s", "round_trip_clock_s", "status");
        }

        public void write(ExchangeRow r) {
            try {
                printer.printRecord(Long.toString(r.exchange()), num(r.querySendClock()), num(r.queryReceiveClock()),
                        num(r.replySendClock()), num(r.replyReceiveClock()), num(r.roundTripClock()),
                        r.complete() ? "complete" : "never");
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        @Override
        public void close() throws IOException {
            printer.close(true);
        }
    }
}
