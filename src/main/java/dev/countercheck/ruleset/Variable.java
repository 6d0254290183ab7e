package dev.countercheck.ruleset;

/**
 * A variable the engine gives the rules of one scope: its type and unit.
 *
 * @param unit    the unit of a number ({@code "-"} when dimensionless); empty for text and booleans
 * @param example a typical value, used to check the types of the rules' expressions at load
 * @param symbol  the standard's symbol the report writes for the name ({@code φ} for {@code phi}), empty when the
 *                name has none and is written as it is
 */
public record Variable(Type type, String unit, String description, Object example, String symbol) {

    /** What kind of value a variable holds. */
    public enum Type { NUMBER, TEXT, BOOLEAN, TEXT_LIST }

    public static Variable number(String unit, String description, double example) {
        return new Variable(Type.NUMBER, unit, description, example, "");
    }

    public static Variable text(String description, String example) {
        return new Variable(Type.TEXT, "", description, example, "");
    }

    public static Variable bool(String description) {
        return new Variable(Type.BOOLEAN, "", description, Boolean.TRUE, "");
    }

    public static Variable textList(String description, java.util.List<String> example) {
        return new Variable(Type.TEXT_LIST, "", description, example, "");
    }

    /** The same variable, written {@code symbol} in the report's derivations. */
    public Variable written(String symbol) {
        return new Variable(type, unit, description, example, symbol);
    }
}
