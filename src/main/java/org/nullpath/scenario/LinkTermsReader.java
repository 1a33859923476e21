package org.nullpath.scenario;

import java.util.List;
import java.util.Optional;

import org.nullpath.link.Antenna;
import org.nullpath.link.LinkTerms;
import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.units.Constants;
import org.nullpath.units.Dimension;
import org.nullpath.units.Spelling;

/** Reads the radio or optical terms of a link (docs/link-budget.md). */
final class LinkTermsReader {
    /** Keys of a link mapping that belong to its terms; any of them makes the link carry terms. */
    static final List<String> TERM_KEYS = List.of("carrier", "wavelength", "precompensate", "transmitter", "receiver",
            "data-rate", "required-eb-n0", "required-photons-per-bit");
    static final List<String> TRANSMITTER_KEYS = List.of("power", "antenna", "losses");
    static final List<String> RECEIVER_KEYS = List.of("antenna", "noise-temperature", "losses", "tuning-range",
            "max-doppler-rate", "detection");
    static final List<String> ANTENNA_KEYS = List.of("gain", "diameter", "efficiency");
    static final List<String> DETECTIONS = List.of("coherent", "photon-counting");

    private LinkTermsReader() {
    }

    /** True when the link mapping has any term key. */
    static boolean hasTerms(Fields link) {
        return TERM_KEYS.stream().anyMatch(link::has);
    }

    /** The terms of a link whose mapping has term keys; empty when they have problems (all added). */
    static Optional<LinkTerms> read(Fields link) {
        Values values = link.values();
        boolean ok = true;

        double carrier = Double.NaN;
        String carrierKey = link.oneOf(List.of("carrier", "wavelength"), "the carrier", true);
        if (carrierKey == null) {
            if (!link.has("carrier") && !link.has("wavelength")) {
                link.require("carrier", "a link with radio or optical terms needs a carrier frequency"
                        + " (or a wavelength)");
            }
            ok = false;
        } else if (carrierKey.equals("carrier")) {
            carrier = positive(link, "carrier", link.quantity("carrier", Dimension.FREQUENCY));
        } else {
            double lambda = positive(link, "wavelength", link.quantity("wavelength", Dimension.LENGTH));
            carrier = Constants.C / lambda;
        }
        ok &= !Double.isNaN(carrier);

        Optional<Boolean> pre = link.bool("precompensate", false);
        ok &= pre.isPresent();

        double txPower = Double.NaN;
        Antenna txAntenna = null;
        double txLoss = Double.NaN;
        if (link.require("transmitter")) {
            Fields tx = Fields.of(link.get("transmitter"), link.path("transmitter"), values, "a transmitter",
                    TRANSMITTER_KEYS);
            if (tx.ok()) {
                txPower = atMost(tx, "power", positive(tx, "power", tx.quantity("power", Dimension.POWER)),
                        MAX_POWER_W, "W");
                txAntenna = tx.require("antenna") ? antenna(tx.get("antenna"), tx.path("antenna"), values) : null;
                txLoss = losses(tx);
            }
        }
        ok &= !Double.isNaN(txPower) && txAntenna != null && !Double.isNaN(txLoss);

        Fields rx = null;
        Antenna rxAntenna = null;
        double rxLoss = Double.NaN;
        double tuneLo = Double.NaN;
        double tuneHi = Double.NaN;
        double maxRate = Double.NaN;
        boolean rxOk = false;
        if (link.require("receiver")) {
            rx = Fields.of(link.get("receiver"), link.path("receiver"), values, "a receiver", RECEIVER_KEYS);
            if (rx.ok()) {
                rxOk = true;
                rxAntenna = rx.require("antenna") ? antenna(rx.get("antenna"), rx.path("antenna"), values) : null;
                rxOk &= rxAntenna != null;
                rxLoss = losses(rx);
                rxOk &= !Double.isNaN(rxLoss);
                if (rx.has("tuning-range")) {
                    double[] range = tuningRange(rx);
                    if (range == null) {
                        rxOk = false;
                    } else {
                        tuneLo = range[0];
                        tuneHi = range[1];
                    }
                }
                if (rx.has("max-doppler-rate")) {
                    maxRate = positive(rx, "max-doppler-rate", rx.quantity("max-doppler-rate", Dimension.FREQUENCY_RATE));
                    rxOk &= !Double.isNaN(maxRate);
                }
            }
        }
        ok &= rxOk;

        double dataRate = positive(link, "data-rate", link.quantity("data-rate", Dimension.DATA_RATE));
        ok &= !Double.isNaN(dataRate);

        // Detection and its requirement: coherent needs required-eb-n0 and a noise temperature;
        // photon counting needs required-photons-per-bit.
        LinkTerms.Detection detection = null;
        if (rx != null && rx.has("detection")) {
            String d = values.text(rx.get("detection"), rx.path("detection"), "coherent or photon-counting");
            if (d != null && DETECTIONS.contains(d)) {
                detection = d.equals("coherent") ? LinkTerms.Detection.COHERENT : LinkTerms.Detection.PHOTON_COUNTING;
            } else if (d != null) {
                String hint = Spelling.closest(d, DETECTIONS);
                rx.problemAt("detection", "unknown detection '" + d + "'"
                        + (hint != null ? " (did you mean '" + hint + "'?)" : " (coherent or photon-counting)"));
            }
            ok &= detection != null;
        }
        String reqKey = link.oneOf(List.of("required-eb-n0", "required-photons-per-bit"), "the detection requirement",
                true);
        double ebn0 = Double.NaN;
        double photons = Double.NaN;
        if (reqKey == null) {
            if (!link.has("required-eb-n0") && !link.has("required-photons-per-bit")) {
                if (detection == LinkTerms.Detection.PHOTON_COUNTING) {
                    link.require("required-photons-per-bit", "photon-counting detection needs the photons per bit it"
                            + " requires");
                } else {
                    link.require("required-eb-n0", "coherent detection needs the Eb/N0 it requires (for photon"
                            + " counting give required-photons-per-bit)");
                }
            }
            ok = false;
        } else if (reqKey.equals("required-eb-n0")) {
            if (detection == LinkTerms.Detection.PHOTON_COUNTING) {
                link.problemAtKey(reqKey, "required-eb-n0 is for coherent detection; this receiver counts photons"
                        + " (give required-photons-per-bit)");
                ok = false;
            }
            detection = LinkTerms.Detection.COHERENT;
            ebn0 = within(link, reqKey, link.quantity(reqKey, Dimension.RATIO), MAX_DB, "dB");
            ok &= !Double.isNaN(ebn0);
        } else {
            if (detection == LinkTerms.Detection.COHERENT) {
                link.problemAtKey(reqKey, "required-photons-per-bit is for photon-counting detection; this receiver is"
                        + " coherent (give required-eb-n0)");
                ok = false;
            }
            detection = LinkTerms.Detection.PHOTON_COUNTING;
            photons = positive(link, reqKey, link.number(reqKey));
            ok &= !Double.isNaN(photons);
        }

        double noise = Double.NaN;
        if (rx != null && rx.ok()) {
            if (rx.has("noise-temperature")) {
                noise = positive(rx, "noise-temperature", rx.quantity("noise-temperature", Dimension.TEMPERATURE));
                ok &= !Double.isNaN(noise);
            } else if (detection == LinkTerms.Detection.COHERENT) {
                rx.require("noise-temperature", "coherent detection needs the system noise temperature");
                ok = false;
            }
        }

        if (!ok) {
            return Optional.empty();
        }
        return Optional.of(new LinkTerms(carrier, pre.get(), txPower, txAntenna, txLoss, rxAntenna, noise, rxLoss,
                tuneLo, tuneHi, maxRate, detection, dataRate, ebn0, photons));
    }

    /** An antenna: {gain} or {diameter, efficiency}; null on a problem. */
    private static Antenna antenna(Node n, String path, Values values) {
        Fields a = Fields.of(n, path, values, "an antenna", ANTENNA_KEYS);
        if (!a.ok()) {
            return null;
        }
        if (a.has("gain") && (a.has("diameter") || a.has("efficiency"))) {
            a.problemAtKey(a.has("diameter") ? "diameter" : "efficiency", "give an antenna either a gain or a diameter"
                    + " and an efficiency, not both");
            return null;
        }
        if (a.has("gain")) {
            double g = within(a, "gain", a.quantity("gain", Dimension.GAIN), MAX_DB, "dBi");
            return Double.isNaN(g) ? null : new Antenna.FixedGain(g);
        }
        if (!a.has("diameter") && !a.has("efficiency")) {
            a.problemHere("an antenna needs a gain (e.g. 74 dBi), or a diameter and an efficiency"
                    + " (e.g. {diameter: 4 m, efficiency: 0.6})");
            return null;
        }
        double d = positive(a, "diameter", a.quantity("diameter", Dimension.LENGTH));
        double e = a.number("efficiency");
        if (!Double.isNaN(e) && !(e > 0 && e <= 1)) {
            a.problemAt("efficiency", "an aperture efficiency lies in (0, 1], got " + Values.format(e));
            e = Double.NaN;
        }
        return Double.isNaN(d) || Double.isNaN(e) ? null : new Antenna.Aperture(d, e);
    }

    /** Losses in dB, default 0, not negative; NaN on a problem. */
    private static double losses(Fields f) {
        double l = within(f, "losses", f.quantity("losses", Dimension.RATIO, 0.0), MAX_DB, "dB");
        if (l < 0) {
            f.problemAt("losses", "losses must not be negative (a loss of 1 dB is written '1 dB'), got "
                    + Values.format(l) + " dB");
            return Double.NaN;
        }
        return l;
    }

    /** [low, high], both positive, low below high; null on a problem. */
    private static double[] tuningRange(Fields rx) {
        Node n = rx.get("tuning-range");
        String path = rx.path("tuning-range");
        if (!(n instanceof ListNode l) || l.items().size() != 2) {
            rx.problemAt("tuning-range", "expected a list of two frequencies [low, high] such as [7.0 GHz, 7.4 GHz], got "
                    + Values.describe(n));
            return null;
        }
        Values v = rx.values();
        double lo = v.quantity(l.items().get(0), KeyPaths.item(path, 0), Dimension.FREQUENCY);
        double hi = v.quantity(l.items().get(1), KeyPaths.item(path, 1), Dimension.FREQUENCY);
        if (Double.isNaN(lo) || Double.isNaN(hi)) {
            return null;
        }
        if (!(lo > 0)) {
            rx.problems().at(l.items().get(0), KeyPaths.item(path, 0), "the tuning range's low edge must be positive");
            return null;
        }
        if (!(lo < hi)) {
            rx.problemAt("tuning-range", "the tuning range's low edge must be below its high edge, got ["
                    + Values.format(lo) + " Hz, " + Values.format(hi) + " Hz]");
            return null;
        }
        return new double[] {lo, hi};
    }

    /**
     * Largest size of a gain, loss or requirement in dB: 300 dB (a factor 1e30), far beyond any real antenna
     * (large radio dishes give about 80 dBi, optical telescopes about 140 dBi), so that a budget summed in dB
     * and turned into rates stays within double precision.
     */
    static final double MAX_DB = 300;

    /** Largest transmitter power: 1e30 W (300 dBW). */
    static final double MAX_POWER_W = 1e30;

    /** {@code x} when its size is at most {@code max}; otherwise a problem at {@code key} and NaN (NaN stays NaN). */
    private static double within(Fields f, String key, double x, double max, String unit) {
        if (Math.abs(x) > max) {
            f.problemAt(key, key + " of " + Values.format(x) + " " + unit + " is beyond what nullpath budgets (at most "
                    + Values.format(max) + " " + unit + " either way)");
            return Double.NaN;
        }
        return x;
    }

    /** {@code x} when at most {@code max}; otherwise a problem at {@code key} and NaN (NaN stays NaN). */
    private static double atMost(Fields f, String key, double x, double max, String unit) {
        if (x > max) {
            f.problemAt(key, key + " of " + Values.format(x) + " " + unit + " is beyond what nullpath budgets (at most "
                    + Values.format(max) + " " + unit + ")");
            return Double.NaN;
        }
        return x;
    }

    /** {@code x} when positive; otherwise adds a problem at {@code key} and returns NaN (NaN stays NaN). */
    private static double positive(Fields f, String key, double x) {
        if (Double.isNaN(x)) {
            return x;
        }
        if (!(x > 0)) {
            f.problemAt(key, key + " must be positive, got " + Values.format(x));
            return Double.NaN;
        }
        return x;
    }
}
