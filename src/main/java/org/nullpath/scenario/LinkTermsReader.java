package org.nullpath.scenario;

import java.util.List;
import java.util.Optional;

import org.nullpath.link.Antenna;
import org.nullpath.link.LinkTerms;
import org.nullpath.link.Pointing;
import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.spacetime.Vec3;
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
    static final List<String> ANTENNA_KEYS = List.of("gain", "diameter", "efficiency", "boresight", "beamwidth",
            "pointing-error", "sidelobe-level");
    static final List<String> BORESIGHTS = List.of("tracking", "forward", "aft");
    static final List<String> DETECTIONS = List.of("coherent", "photon-counting");

    private LinkTermsReader() {
    }

    /** True when the link mapping has any term key. */
    static boolean hasTerms(Fields link) {
        return TERM_KEYS.stream().anyMatch(link::has);
    }

    /**
     * The terms of a link whose mapping has term keys; empty when they have problems (all added). The sender
     * and receiver are named as craft or not ({@code forward} and {@code aft} antennas need a craft's heading);
     * null where the node is not known.
     */
    static Optional<LinkTerms> read(Fields link, Boolean senderIsCraft, Boolean receiverIsCraft) {
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
        Pointing txPointing = null;
        double txLoss = Double.NaN;
        if (link.require("transmitter")) {
            Fields tx = Fields.of(link.get("transmitter"), link.path("transmitter"), values, "a transmitter",
                    TRANSMITTER_KEYS);
            if (tx.ok()) {
                txPower = atMost(tx, "power", positive(tx, "power", tx.quantity("power", Dimension.POWER)),
                        MAX_POWER_W, "W");
                AntennaRead a = tx.require("antenna") ? antenna(tx.get("antenna"), tx.path("antenna"), values,
                        senderIsCraft) : null;
                txAntenna = a == null ? null : a.antenna();
                txPointing = a == null ? null : a.pointing();
                txLoss = losses(tx);
            }
        }
        ok &= !Double.isNaN(txPower) && txAntenna != null && txPointing != null && !Double.isNaN(txLoss);

        Fields rx = null;
        Antenna rxAntenna = null;
        Pointing rxPointing = null;
        double rxLoss = Double.NaN;
        double tuneLo = Double.NaN;
        double tuneHi = Double.NaN;
        double maxRate = Double.NaN;
        boolean rxOk = false;
        if (link.require("receiver")) {
            rx = Fields.of(link.get("receiver"), link.path("receiver"), values, "a receiver", RECEIVER_KEYS);
            if (rx.ok()) {
                rxOk = true;
                AntennaRead a = rx.require("antenna") ? antenna(rx.get("antenna"), rx.path("antenna"), values,
                        receiverIsCraft) : null;
                rxAntenna = a == null ? null : a.antenna();
                rxPointing = a == null ? null : a.pointing();
                rxOk &= rxAntenna != null && rxPointing != null;
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
                tuneLo, tuneHi, maxRate, detection, dataRate, ebn0, photons, txPointing, rxPointing));
    }

    /** An antenna's gain model and its pointing; either is null on a problem. */
    private record AntennaRead(Antenna antenna, Pointing pointing) {
    }

    /**
     * An antenna: {gain} or {diameter, efficiency}, and how it is pointed; null when the mapping itself is
     * wrong. {@code onCraft} says whether its node is a craft (null when not known).
     */
    private static AntennaRead antenna(Node n, String path, Values values, Boolean onCraft) {
        Fields a = Fields.of(n, path, values, "an antenna", ANTENNA_KEYS);
        if (!a.ok()) {
            return null;
        }
        Antenna gain = gainModel(a);
        Pointing pointing = pointing(a, onCraft, gain);
        return new AntennaRead(gain, pointing);
    }

    /** The gain model: {gain} or {diameter, efficiency}; null on a problem. */
    private static Antenna gainModel(Fields a) {
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

    /** Largest full half-power width: 360 degrees. */
    static final double MAX_BEAMWIDTH_RAD = 2 * Math.PI;

    /**
     * How an antenna is pointed (docs/link-budget.md, "Pointing"): boresight, beamwidth, pointing error and
     * sidelobe level; null on a problem. {@code gain} is the antenna's gain model (null when it has a problem).
     */
    private static Pointing pointing(Fields a, Boolean onCraft, Antenna gain) {
        boolean ok = true;
        Pointing.Boresight kind = Pointing.Boresight.TRACKING;
        Vec3 fixed = null;
        Node b = a.get("boresight");
        if (b instanceof ListNode) {
            fixed = a.values().vector(b, a.path("boresight"), Dimension.DIMENSIONLESS);
            if (fixed != null && (fixed.isZero() || !Double.isFinite(fixed.norm()))) {
                a.problemAt("boresight", fixed.isZero() ? "a boresight direction must not be zero; give where the"
                        + " antenna points, e.g. [1, 0, 0]" : "the boresight direction is too long to normalise; scale it down");
                fixed = null;
            }
            ok &= fixed != null;
            kind = Pointing.Boresight.FIXED;
            fixed = fixed == null ? null : fixed.unit();
        } else if (b != null) {
            String word = a.values().text(b, a.path("boresight"), "tracking, forward, aft or a direction [x, y, z]");
            if (word == null) {
                ok = false;
            } else if (!BORESIGHTS.contains(word)) {
                String hint = Spelling.closest(word, BORESIGHTS);
                a.problemAt("boresight", "unknown boresight '" + word + "'" + (hint != null ? " (did you mean '" + hint
                        + "'?)" : " (tracking, forward, aft or a direction [x, y, z])"));
                ok = false;
            } else {
                kind = Pointing.Boresight.valueOf(word.toUpperCase(java.util.Locale.ROOT));
                if (kind != Pointing.Boresight.TRACKING && Boolean.FALSE.equals(onCraft)) {
                    a.problemAt("boresight", word + " follows a craft's heading, and this antenna is on a station"
                            + " (give tracking or a direction [x, y, z])");
                    ok = false;
                }
            }
        }
        double width = Double.NaN;
        if (a.has("beamwidth")) {
            width = a.quantity("beamwidth", Dimension.ANGLE);
            if (!Double.isNaN(width) && !(width > 0 && width <= MAX_BEAMWIDTH_RAD)) {
                a.problemAt("beamwidth", "a beamwidth (the full half-power width) lies in (0, 360 deg], got "
                        + Values.format(width) + " rad");
                width = Double.NaN;
            }
            ok &= !Double.isNaN(width);
        }
        double error = 0;
        if (a.has("pointing-error")) {
            error = a.quantity("pointing-error", Dimension.ANGLE);
            if (!Double.isNaN(error) && !(error >= 0 && error <= Math.PI)) {
                a.problemAt("pointing-error", "a pointing error lies in [0, 180 deg], got " + Values.format(error)
                        + " rad");
                error = Double.NaN;
            } else if (!Double.isNaN(error) && b != null && kind != Pointing.Boresight.TRACKING) {
                a.problemAtKey("pointing-error", "pointing-error is a tracking antenna's residual error; this"
                        + " antenna's boresight is fixed, so its angle off the signal follows from the directions");
                error = Double.NaN;
            }
            ok &= !Double.isNaN(error);
        }
        double sidelobe = Pointing.DEFAULT_SIDELOBE_DBI;
        if (a.has("sidelobe-level")) {
            sidelobe = within(a, "sidelobe-level", a.quantity("sidelobe-level", Dimension.GAIN), MAX_DB, "dBi");
            ok &= !Double.isNaN(sidelobe);
        }
        boolean offSignal = kind != Pointing.Boresight.TRACKING || error > 0;
        if (ok && offSignal && Double.isNaN(width) && gain instanceof Antenna.FixedGain) {
            a.problemHere("an antenna given by its gain has no diameter to take a beamwidth from; give its"
                    + " beamwidth (the full half-power width, e.g. 0.5 deg) to point it off the signal");
            ok = false;
        }
        return ok ? new Pointing(kind, fixed, width, error, sidelobe) : null;
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
