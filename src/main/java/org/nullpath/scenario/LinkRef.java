package org.nullpath.scenario;

/**
 * What the reader knows about a link while reading references to it, also when the link itself has
 * problems (so that a reference to it is not reported again as unknown).
 *
 * @param name     the link's name
 * @param from     its sender's name, null when that could not be read
 * @param to       its receiver's name, null when that could not be read
 * @param hasTerms whether it has radio or optical terms
 */
record LinkRef(String name, String from, String to, boolean hasTerms) {
}
