package dev.countercheck.responses;

/**
 * One cell of a response sheet as read.
 *
 * @param text  its text, as written
 * @param where its place for messages: {@code file Sheet1!E7} in a workbook, {@code file:line:column (E7)} in CSV
 */
record SheetCell(String text, String where) {

    /** {@code E7} for column 4 (from 0) of row 7 (from 1). */
    static String address(int column, int row) {
        StringBuilder letters = new StringBuilder();
        for (int c = column + 1; c > 0; c = (c - 1) / 26) {
            letters.insert(0, (char) ('A' + (c - 1) % 26));
        }
        return letters.toString() + row;
    }
}
