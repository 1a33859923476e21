package org.nullpath.report;

import org.junit.jupiter.api.Test;
import org.nullpath.mission.OutputNames;

import static org.junit.jupiter.api.Assertions.assertTrue;

/** Every file a plan writes is named in OutputNames, so that the reader keeps scenario names from clashing. */
class OutputNamesTest {
    @Test
    void everyOutputFileIsAReservedNameOrComesFromALinkOrExchange() {
        for (PlanOutput.OutputFile f : PlanOutput.FILES) {
            boolean fromName = f.name().equals(OutputNames.ofLink("<link>"))
                    || f.name().equals(OutputNames.ofExchange("<name>"));
            assertTrue(fromName || OutputNames.FIXED.contains(f.name()), f.name() + " is not in OutputNames.FIXED");
        }
    }
}
