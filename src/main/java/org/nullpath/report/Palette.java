package org.nullpath.report;

import java.awt.Color;
import java.awt.Font;

/**
 * The charts' colours and fonts. Colours are the Okabe-Ito palette (Okabe and Ito, "Color Universal
 * Design", 2008), which stays distinguishable with the common forms of colour blindness; the greys are
 * nullpath's own.
 */
final class Palette {
    private Palette() {
    }

    static final Color BLACK = new Color(0x000000);
    static final Color ORANGE = new Color(0xE69F00);
    static final Color SKY_BLUE = new Color(0x56B4E9);
    static final Color GREEN = new Color(0x009E73);
    static final Color YELLOW = new Color(0xF0E442);
    static final Color BLUE = new Color(0x0072B2);
    static final Color VERMILLION = new Color(0xD55E00);
    static final Color PURPLE = new Color(0xCC79A7);

    static final Color INK = new Color(0x222222);
    static final Color GRID = new Color(0xE1E1E1);
    static final Color FRAME = new Color(0x9A9A9A);
    static final Color MUTED = new Color(0x6B6B6B);

    static final Font AXIS_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    static final Font TICK_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    static final Font NOTE_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
}
