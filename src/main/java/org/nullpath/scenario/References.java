package org.nullpath.scenario;

import org.nullpath.mission.Craft;
import org.nullpath.mission.Link;
import org.nullpath.mission.Node;

/** What readers of the plans need of the nodes and links read before them. */
interface References {
    /** A required reference to a link at {@code key}; null when absent or unknown (problem added). */
    LinkRef linkRef(Fields f, String key);

    /** The resolved link of a reference, null when the link has problems. */
    Link link(LinkRef ref);

    /** The craft of that name, null when there is none (or it has problems). */
    Craft craft(String name);

    /** The station or craft of that name, null when there is none (or it has problems). */
    Node node(String name);
}
