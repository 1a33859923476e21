package org.nullpath.schedule;

import java.util.List;

/**
 * What one scanned range comes to: its windows with their volumes, and every limit's crossings in send order.
 *
 * @param windows   the windows of the range, in order
 * @param crossings each limit's own crossings in the range, in send order
 */
public record WindowSurvey(List<WindowFigures> windows, List<CrossingRow> crossings) {
    public WindowSurvey {
        windows = List.copyOf(windows);
        crossings = List.copyOf(crossings);
    }
}
