/**
 * The resolved mission: what a scenario file says, with every name resolved to the object it names and
 * every quantity in SI. Stations and craft carry their worldlines, links hold their two nodes and their
 * terms, message plans, cut-offs, exchanges and window scans hold their links. The scenario reader builds
 * it; the schedule and the report read it and never look a name up again.
 *
 * <p>Absent values: an absent object is an {@link java.util.Optional}, an absent number is NaN; nothing
 * here is null.
 */
package org.nullpath.mission;
