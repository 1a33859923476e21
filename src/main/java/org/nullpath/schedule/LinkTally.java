package org.nullpath.schedule;

import java.util.Optional;

import org.nullpath.mission.Link;

/**
 * What a link's schedule came to, for summaries.
 *
 * @param link           the link
 * @param messages       messages planned
 * @param delivered      messages that arrive
 * @param never          messages that never arrive
 * @param minDoppler     smallest Doppler factor among delivered messages (NaN when none)
 * @param maxDoppler     largest Doppler factor among delivered messages (NaN when none)
 * @param minLightTime   shortest light time, s (NaN when none)
 * @param maxLightTime   longest light time, s (NaN when none)
 * @param lastArrivalClock receiver clock of the last arrival, s (NaN when none)
 * @param budget         link-budget figures, when the link has terms
 * @param illConditioned delivered messages whose light time is known to worse than 1e-12 relative because
 *                       the problem itself is ill-conditioned (condition number times 1.1e-16)
 */
public record LinkTally(Link link, long messages, long delivered, long never, double minDoppler,
                        double maxDoppler, double minLightTime, double maxLightTime, double lastArrivalClock,
                        Optional<BudgetTally.Figures> budget, long illConditioned) {
}
