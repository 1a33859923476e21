package org.nullpath.worldline;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.testkit.Si.G0;

/**
 * A piece's time and distance offsets asked for together are the same bits as each asked for alone
 * ({@link Piece#offset}, which CraftWalksTest and HyperbolicTest hold to 50-digit references): burns of either
 * sign, coasts, steps of any sign and size, from rest and at speed (other pieces pair the two calls themselves).
 */
class SharedOffsetsTest {

    @Property(tries = 3000)
    void aBurnsOffsetsTogetherAreTheOffsetsAlone(@ForAll @DoubleRange(min = -30, max = 30) double aG0,
                                                 @ForAll @DoubleRange(min = -40, max = 40) double rapidity,
                                                 @ForAll @DoubleRange(min = -12, max = 9) double log10Du,
                                                 @ForAll boolean backwards) {
        double du = (backwards ? -1 : 1) * Math.pow(10, log10Du);
        for (double a : new double[] {aG0 * G0, 0.0}) {
            ConstantPiece p = new ConstantPiece(a);
            LineState cur = new LineState(0, 0, 0, rapidity, 0, 0);
            Piece.Offsets o = p.timeAndDistance(cur, du);
            assertEquals(p.offset(Measure.TIME, cur, du), o.time(), "time");
            assertEquals(p.offset(Measure.DISTANCE, cur, du), o.distance(), "distance");
        }
    }

    @Test
    void zeroStepsAndRestAreTheOffsetsAlone() {
        ConstantPiece p = new ConstantPiece(1.5 * G0);
        for (double eta : new double[] {0.0, -0.0, 1e-300, 3.0}) {
            for (double du : new double[] {0.0, -0.0, 1e-300, 1e7}) {
                LineState cur = new LineState(0, 0, 0, eta, 0, 0);
                assertEquals(p.offset(Measure.TIME, cur, du), p.timeAndDistance(cur, du).time());
                assertEquals(p.offset(Measure.DISTANCE, cur, du), p.timeAndDistance(cur, du).distance());
            }
        }
    }
}
