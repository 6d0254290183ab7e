package dev.countercheck.ruleset;

import java.util.Optional;

/**
 * The values a ruleset parameter may plausibly take, by kind. A value outside is a slip (a unit,
 * a decimal point) or a value the formulas cannot use (a partial factor of 0 divides by zero), and
 * is refused at its place in the ruleset rather than met as a failure during a review. The kind
 * comes from the parameter's name and unit; the ranges are wide (common practice):
 * <ul>
 *   <li>partial factors ({@code gamma_*}, no unit): 1 to 5, EN 1990 and EN 1992-1-1 2.4.2.4 use 1.0
 *       to 1.5, and a factor below 1 would reduce a load or raise a resistance;
 *   <li>other factors ({@code *_factor}, no unit): greater than 0, at most 100 (they scale or divide);
 *   <li>other plain numbers: 0 to 100, as a submission's plain numbers;
 *   <li>unit weights (kN/m3): 1 to 100, concrete weighs some 25;
 *   <li>lengths (mm): 0 to 100 m, as a submission's lengths;
 *   <li>moduli ({@code *_modulus}, MPa): 1000 to 1 000 000 (steel 200 000, EN 1992-1-1 3.2.7(4));
 *   <li>stresses (MPa): 0 to 1000, as a submission's stresses; ground pressures (kPa): 0 to 1 000 000, the same;
 *   <li>angles (deg): greater than 0, less than 90.
 * </ul>
 */
final class ParameterRanges {

    private ParameterRanges() {
    }

    /**
     * Why {@code value} is not plausible for the parameter {@code name} in {@code unit}; empty when it is.
     *
     * @param written the value as the file writes it, for the message
     */
    static Optional<String> problem(String name, String unit, double value, String written) {
        if ("-".equals(unit) && name.startsWith("gamma_")) {
            return outside(value, written, 1, true, 5, true, "a partial factor", "from 1 to 5: a factor below 1 would reduce a"
                    + " load or raise a resistance");
        }
        if ("-".equals(unit) && name.endsWith("_factor")) {
            return outside(value, written, 0, false, 100, true, "a factor", "greater than 0 and at most 100");
        }
        if ("MPa".equals(unit) && name.endsWith("_modulus")) {
            return outside(value, written, 1000, true, 1e6, true, "a modulus", "from 1000 to 1000000 MPa (steel: 200000 MPa)");
        }
        return switch (unit) {
            case "-" -> outside(value, written, 0, true, 100, true, "a plain number", "from 0 to 100");
            case "kN/m3" -> outside(value, written, 1, true, 100, true, "a unit weight", "from 1 to 100 kN/m3 (concrete weighs"
                    + " some 25 kN/m3)");
            case "mm" -> outside(value, written, 0, true, 1e5, true, "a length", "from 0 to 100000 mm (100 m)");
            case "MPa" -> outside(value, written, 0, true, 1000, true, "a stress", "from 0 to 1000 MPa");
            case "kPa" -> outside(value, written, 0, true, 1e6, true, "a pressure", "from 0 to 1000000 kPa (1000 MPa)");
            case "deg" -> outside(value, written, 0, false, 90, false, "an angle", "greater than 0° and less than 90°");
            default -> Optional.empty();
        };
    }

    private static Optional<String> outside(double value, String written, double least, boolean leastAllowed, double most,
                                            boolean mostAllowed, String kind, String range) {
        boolean aboveLeast = leastAllowed ? value >= least : value > least;
        boolean belowMost = mostAllowed ? value <= most : value < most;
        if (aboveLeast && belowMost) {
            return Optional.empty();
        }
        return Optional.of(written + " is not plausible for " + kind + ": it must be "
                + range);
    }
}
