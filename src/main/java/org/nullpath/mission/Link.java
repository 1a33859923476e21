package org.nullpath.mission;

import java.util.Objects;
import java.util.Optional;

import org.nullpath.link.LinkTerms;
import org.nullpath.worldline.Worldline;

/**
 * A one-way link between two different nodes.
 *
 * @param name  its key in the scenario file (used in file names)
 * @param from  the sending node
 * @param to    the receiving node
 * @param terms      radio or optical terms, when the link has a budget
 * @param directions true when the scenario asks for each message's pointing directions ({@code directions: true})
 */
public record Link(String name, Node from, Node to, Optional<LinkTerms> terms, boolean directions) {
    public Link {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        Objects.requireNonNull(terms, "terms");
    }

    /** A link without {@code directions: true}. */
    public Link(String name, Node from, Node to, Optional<LinkTerms> terms) {
        this(name, from, to, terms, false);
    }

    /** True when each message gets its pointing directions: every link with terms, and any asking for them. */
    public boolean pointing() {
        return directions || terms.isPresent();
    }

    /** The sender's worldline. */
    public Worldline sender() {
        return from.worldline();
    }

    /** The receiver's worldline. */
    public Worldline receiver() {
        return to.worldline();
    }
}
