package org.nullpath.mission;

import org.nullpath.worldline.Worldline;

/** A body that sends and receives: a {@link Station} or a {@link Craft}. */
public sealed interface Node permits Station, Craft {
    /** Its key in the scenario file (unique among stations and craft). */
    String name();

    /** Its history; the node's clock is the worldline's clock. */
    Worldline worldline();

    /** True for a craft, false for a station. */
    boolean isCraft();
}
