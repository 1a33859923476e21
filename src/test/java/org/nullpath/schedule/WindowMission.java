package org.nullpath.schedule;

import org.nullpath.testkit.ScenarioText;

/**
 * The invented mission the window tests scan: station {@code home} and the craft {@code probe} burning at
 * 0.5 g0 from rest at the origin for ever, one radio link {@code up} (7.2 GHz, 70 dBi sending, 300 K
 * receiving 1 kbit/s, 2.5 dB required) and one window scan. Each test class states the closed forms it
 * checks against.
 */
final class WindowMission {
    private WindowMission() {
    }

    /**
     * The scenario text.
     *
     * @param title          the scenario's title
     * @param stationBody    the station's keys ({@code {}}: at rest at the origin)
     * @param from           the link's sender, {@code home} or {@code probe}
     * @param to             the link's receiver
     * @param txPower        the transmitter's power, as the file writes it
     * @param rxGain         the receiving antenna's gain
     * @param receiverExtras further receiver lines (tuning range, Doppler-rate limit), indented, or empty
     * @param window         the scan's entry under {@code windows}
     */
    static String yaml(String title, String stationBody, String from, String to, String txPower, String rxGain,
                       String receiverExtras, String window) {
        return ScenarioText.titled(title)
                .station("home", stationBody)
                .craft("probe", "heading: [1, 0, 0]", "burn: {acceleration: 0.5 g0, duration: forever}")
                .then("""
                links:
                  up:
                    from: %s
                    to: %s
                    carrier: 7.2 GHz
                    transmitter: {power: %s, antenna: {gain: 70 dBi}}
                    receiver:
                      antenna: {gain: %s}
                      noise-temperature: 300 K
                %s
                    data-rate: 1 kbit/s
                    required-eb-n0: 2.5 dB
                windows:
                  - %s
                """.formatted(from, to, txPower, rxGain, receiverExtras, window))
                .yaml();
    }
}
