package dev.countercheck.report;

/**
 * The drawings' look: colours, line weights and dash patterns, as SVG presentation attributes.
 * Each kind of item differs from the others by its line pattern as well as its colour, and an item
 * that fails is drawn heavy and dashed and carries a boxed tag, so that a print in grey still tells
 * them apart. The legend draws its samples from these same constants.
 */
final class Styles {

    /** The font of every drawing: a common sans-serif on screen; in the PDF the one it embeds ({@link PdfFonts#TEXT}). */
    static final String FONT = "Liberation Sans, DejaVu Sans Condensed, Arial, Helvetica, sans-serif";

    static final String INK = "#1f2a33";
    static final String FAIL_COLOUR = "#b3261e";

    static final String CAP = "fill=\"#efece4\" stroke=\"" + INK + "\" stroke-width=\"1.6\"";
    static final String CAP_SECTION = "fill=\"#e4e0d5\" stroke=\"" + INK + "\" stroke-width=\"1.6\"";
    static final String PILE = "fill=\"#fbfaf6\" stroke=\"" + INK + "\" stroke-width=\"1.3\"";
    static final String PILE_BELOW = "fill=\"#d8d2c4\" stroke=\"" + INK + "\" stroke-width=\"1.3\"";
    static final String PILE_FAIL = "fill=\"#fbfaf6\" stroke=\"" + FAIL_COLOUR
            + "\" stroke-width=\"3.2\" stroke-dasharray=\"7 3\"";
    static final String COLUMN_EDGE = "fill=\"none\" stroke=\"" + INK + "\" stroke-width=\"1.6\"";
    static final String COLUMN_EDGE_FAIL = "fill=\"none\" stroke=\"" + FAIL_COLOUR
            + "\" stroke-width=\"3.2\" stroke-dasharray=\"7 3\"";
    static final String HATCH_COLOUR = "#7d7566";
    static final String BAR_COLOUR = "#2f5d8a";
    static final String BAR_TOP_COLOUR = "#5f86ad";
    static final String BAR_X = "stroke=\"" + BAR_COLOUR + "\" stroke-width=\"0.9\"";
    static final String BAR_Y = "stroke=\"" + BAR_COLOUR + "\" stroke-width=\"0.9\" stroke-dasharray=\"10 2\"";
    static final String BAR_TOP = "stroke=\"" + BAR_TOP_COLOUR + "\" stroke-width=\"0.9\" stroke-dasharray=\"2 3\"";
    static final String BAR_FAIL = "stroke=\"" + FAIL_COLOUR + "\" stroke-width=\"1.3\" stroke-dasharray=\"7 3\"";
    static final String BAR_FILL = "fill=\"" + BAR_COLOUR + "\" stroke=\"none\"";
    static final String BAR_TOP_FILL = "fill=\"" + BAR_TOP_COLOUR + "\" stroke=\"none\"";
    static final String BAR_FILL_FAIL = "fill=\"" + FAIL_COLOUR + "\" stroke=\"" + FAIL_COLOUR + "\" stroke-width=\"1\"";
    static final String SHEAR = "stroke=\"#5b3f8c\" stroke-width=\"1.4\" stroke-dasharray=\"12 3 2 3\"";
    static final String SHEAR_FAIL = "stroke=\"" + FAIL_COLOUR + "\" stroke-width=\"3.2\" stroke-dasharray=\"7 3\"";
    static final String PERIMETER = "fill=\"none\" stroke=\"#16766a\" stroke-width=\"1.5\" stroke-dasharray=\"6 3\"";
    static final String PERIMETER_FAIL = "fill=\"none\" stroke=\"" + FAIL_COLOUR
            + "\" stroke-width=\"3.2\" stroke-dasharray=\"7 3\"";
    static final String SPREAD_LINE = "stroke=\"#8a6a12\" stroke-width=\"1\" stroke-dasharray=\"1.5 2\"";
    static final String SPREAD = "fill=\"none\" " + SPREAD_LINE;
    static final String SPREAD_POINT = "fill=\"#8a6a12\" stroke=\"none\"";
    static final String CUT = "stroke=\"" + INK + "\" stroke-width=\"0.9\" stroke-dasharray=\"18 3 3 3\"";
    static final String ARROW_HEAD = "fill=\"" + INK + "\"";
    static final String ARROW_SHAFT = "stroke=\"" + INK + "\" stroke-width=\"1\"";
    static final String LEADER = "stroke=\"#9aa1aa\" stroke-width=\"0.6\"";
    static final String DIMENSION = "stroke=\"#4d5560\" stroke-width=\"0.8\"";
    static final String DIMENSION_FAIL = "stroke=\"" + FAIL_COLOUR + "\" stroke-width=\"2\"";
    static final String BREAK = "fill=\"none\" stroke=\"" + INK + "\" stroke-width=\"1\"";
    static final String LABEL_BACK = "fill=\"#ffffff\" fill-opacity=\"0.85\" stroke=\"none\"";
    static final String TAG_BOX = "fill=\"#ffffff\" stroke=\"" + FAIL_COLOUR + "\" stroke-width=\"2\"";

    // No text of size 12: the PDF renderer's SVG module (openhtmltopdf 1.1.31) draws text of exactly the
    // size it registers its fonts at, 12, as a dot.
    static final String TEXT = "font-size=\"11\" fill=\"" + INK + "\"";
    static final String TEXT_SMALL = "font-size=\"9.5\" fill=\"#4d5560\"";
    static final String TEXT_PILE = "font-size=\"12.5\" font-weight=\"bold\" fill=\"" + INK + "\"";
    static final String TEXT_FAIL = "font-size=\"11\" font-weight=\"bold\" fill=\"" + FAIL_COLOUR + "\"";
    static final String TEXT_CUT = "font-size=\"13\" font-weight=\"bold\" fill=\"" + INK + "\"";

    private Styles() {
    }
}
