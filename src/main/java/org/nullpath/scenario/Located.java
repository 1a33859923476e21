package org.nullpath.scenario;

/** Something written at a place in the scenario file: 1-based line and column. */
interface Located {
    int line();

    int column();
}
