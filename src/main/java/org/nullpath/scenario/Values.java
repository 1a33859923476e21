package org.nullpath.scenario;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.MapNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Dimension;
import org.nullpath.units.Units;
import org.nullpath.units.UnitException;

/**
 * Reads single values out of the tree. Each method either returns the value or adds one problem at
 * the node and returns a marker: NaN for numbers, null for objects. NaN is a safe marker because no
 * accepted quantity is ever NaN.
 */
final class Values {
    private final Problems problems;

    Values(Problems problems) {
        this.problems = problems;
    }

    Problems problems() {
        return problems;
    }

    /** Words for what a node is, for "got ..." in messages. */
    static String describe(Node n) {
        if (n instanceof MapNode) {
            return "a mapping";
        }
        if (n instanceof ListNode l) {
            return "a list of " + l.items().size();
        }
        Scalar s = (Scalar) n;
        return switch (s.type()) {
            case NULL -> "nothing";
            case BOOLEAN -> "the boolean '" + s.text() + "'";
            case BINARY -> "binary data";
            case NUMBER -> "the number '" + s.text() + "'";
            case TEXT -> "'" + s.text() + "'";
        };
    }

    /** A number in a message: up to 10 significant digits, no exponent for ordinary sizes. */
    static String format(double x) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        if (x == 0) {
            return "0";
        }
        BigDecimal b = new BigDecimal(x).round(new MathContext(10)).stripTrailingZeros();
        double a = Math.abs(x);
        return a >= 1e-6 && a < 1e15 ? b.toPlainString() : b.toString();
    }

    private static boolean nonFinite(Scalar s) {
        return s.type() == ScalarType.NUMBER && !Double.isFinite(s.number());
    }

    /** A quantity {@code NUMBER UNIT} of dimension {@code d}, in SI (dB for gains and ratios); NaN on a problem. */
    double quantity(Node n, String path, Dimension d) {
        if (!(n instanceof Scalar s) || s.type() == ScalarType.NULL || s.type() == ScalarType.BINARY) {
            problems.at(n, path, "expected " + d.description() + " ('NUMBER UNIT', e.g. " + Units.example(d) + "), got "
                    + describe(n));
            return Double.NaN;
        }
        if (nonFinite(s)) {
            problems.at(n, path, "expected " + d.description() + ", got a non-finite number '" + s.text() + "'");
            return Double.NaN;
        }
        try {
            return Units.parse(s.text(), d).si();
        } catch (UnitException e) {
            problems.at(n, path, e.getMessage());
            return Double.NaN;
        }
    }

    /** A plain (dimensionless) number; NaN on a problem. */
    double number(Node n, String path) {
        if (n instanceof Scalar s && s.type() == ScalarType.NUMBER) {
            if (!Double.isFinite(s.number())) {
                problems.at(n, path, "expected a plain number, got a non-finite number '" + s.text() + "'");
                return Double.NaN;
            }
            return s.number();
        }
        if (n instanceof Scalar s && s.type() == ScalarType.TEXT) {
            try {
                return Units.parse(s.text(), Dimension.DIMENSIONLESS).si();
            } catch (UnitException e) {
                problems.at(n, path, e.getMessage());
                return Double.NaN;
            }
        }
        problems.at(n, path, "expected a plain number (e.g. 0.6), got " + describe(n));
        return Double.NaN;
    }

    /**
     * A list of exactly three quantities of dimension {@code d} (plain numbers for DIMENSIONLESS); null on a
     * problem. Every element is checked, so each bad one is reported.
     */
    Vec3 vector(Node n, String path, Dimension d) {
        if (!(n instanceof ListNode l) || l.items().size() != 3) {
            String form = switch (d) {
                case DIMENSIONLESS -> "three plain numbers such as [1, 0, 0]";
                case SPEED -> "three speeds such as [0 c, 0.1 c, 0 c]";
                case LENGTH -> "three lengths such as [0 ly, 4.2 ly, 0 ly]";
                default -> "three quantities of " + d.description();
            };
            problems.at(n, path, "expected a list of " + form + ", got " + describe(n));
            return null;
        }
        double[] c = new double[3];
        boolean ok = true;
        for (int i = 0; i < 3; i++) {
            Node e = l.items().get(i);
            c[i] = d == Dimension.DIMENSIONLESS ? number(e, KeyPaths.item(path, i)) : quantity(e, KeyPaths.item(path, i), d);
            ok &= !Double.isNaN(c[i]);
        }
        return ok ? new Vec3(c[0], c[1], c[2]) : null;
    }

    /** A list of quantities; null when {@code n} is not a list or any element is wrong (every problem added). */
    List<Double> quantities(Node n, String path, Dimension d, String what) {
        return list(n, path, d, what, (item, itemPath) -> quantity(item, itemPath, d));
    }

    /** Reads one number of a list at its key path; NaN on a problem (added). */
    @FunctionalInterface
    interface ItemReader {
        double read(Node item, String itemPath);
    }

    /**
     * A list of numbers, each read by {@code one}; null when {@code n} is not a list (a problem naming a list of
     * {@code what} of dimension {@code d}) or any element is wrong (every problem added).
     */
    List<Double> list(Node n, String path, Dimension d, String what, ItemReader one) {
        if (!(n instanceof ListNode l)) {
            problems.at(n, path, "expected a list of " + what + " such as [" + Units.example(d).replace("'", "") + "], got "
                    + describe(n));
            return null;
        }
        List<Double> out = new ArrayList<>(l.items().size());
        boolean ok = true;
        for (int i = 0; i < l.items().size(); i++) {
            double q = one.read(l.items().get(i), KeyPaths.item(path, i));
            ok &= !Double.isNaN(q);
            out.add(q);
        }
        return ok ? out : null;
    }

    /** Text (a plain or quoted scalar that is not null); null on a problem. */
    String text(Node n, String path, String what) {
        if (n instanceof Scalar s && s.type() != ScalarType.NULL && s.type() != ScalarType.BINARY) {
            return s.text();
        }
        problems.at(n, path, "expected " + what + ", got " + describe(n));
        return null;
    }

    /** true or false. */
    Optional<Boolean> bool(Node n, String path) {
        if (n instanceof Scalar s && s.type() == ScalarType.BOOLEAN) {
            return Optional.of(s.number() == 1);
        }
        problems.at(n, path, "expected true or false, got " + describe(n));
        return Optional.empty();
    }
}
