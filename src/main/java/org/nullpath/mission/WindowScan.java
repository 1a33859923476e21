package org.nullpath.mission;

import java.util.Objects;

/**
 * A send-clock range scanned for link windows.
 *
 * @param link a link with radio or optical terms
 * @param from start of the scan on the sender's clock, s
 * @param to   end of the scan on the sender's clock, s
 */
public record WindowScan(Link link, double from, double to) {
    public WindowScan {
        Objects.requireNonNull(link, "link");
    }
}
