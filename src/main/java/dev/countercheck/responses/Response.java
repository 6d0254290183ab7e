package dev.countercheck.responses;

import java.util.Optional;

/**
 * The designer's answer to one finding, as read from a filled-in response sheet.
 *
 * @param findingId the finding's stable id
 * @param text      the response, as written (may hold commas, quotes, line breaks, any script)
 * @param status    agreed, disputed or will-revise; empty when the designer gave none
 * @param where     the row's place in the sheet, for messages ({@code responses.xlsx Sheet1!A7})
 */
public record Response(String findingId, String text, Optional<ResponseStatus> status, String where) {
}
