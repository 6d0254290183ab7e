package dev.countercheck.cli;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.Optional;

/**
 * The date a review states: {@code --date} when given, else SOURCE_DATE_EPOCH (seconds since
 * 1970, UTC) when set, else today (UTC). Fixing either makes reruns byte-identical. Years have four
 * digits: a date such as {@code +10000-01-01} is refused.
 */
final class ReviewDate {

    private ReviewDate() {
    }

    static String resolve(Optional<String> option, Optional<String> sourceDateEpoch, Clock clock) {
        if (option.isPresent()) {
            try {
                if (!option.get().matches("\\d{4}-\\d{2}-\\d{2}")) {
                    throw new DateTimeParseException("not YYYY-MM-DD", option.get(), 0);
                }
                return LocalDate.parse(option.get()).toString();
            } catch (DateTimeParseException e) {
                throw new UsageException("--date '" + option.get() + "' is not a date of the form YYYY-MM-DD");
            }
        }
        if (sourceDateEpoch.isPresent() && !sourceDateEpoch.get().isBlank()) {
            try {
                long seconds = Long.parseLong(sourceDateEpoch.get().trim());
                LocalDate date = Instant.ofEpochSecond(seconds).atZone(ZoneOffset.UTC).toLocalDate();
                if (date.getYear() < 1000 || date.getYear() > 9999) {
                    throw new NumberFormatException("not a four-digit year");
                }
                return date.toString();
            } catch (NumberFormatException | java.time.DateTimeException e) {
                throw new UsageException("SOURCE_DATE_EPOCH '" + sourceDateEpoch.get()
                        + "' is not a number of seconds since 1970-01-01");
            }
        }
        return LocalDate.now(clock.withZone(ZoneOffset.UTC)).toString();
    }
}
