package dev.countercheck.submission;

import java.util.Optional;

/** The {@code project:} block: free text identifying the design; every field optional. */
public record Project(Optional<String> title, Optional<String> reference, Optional<String> revision,
                      Optional<String> preparedBy, Optional<String> date) {

    public static Project empty() {
        return new Project(Optional.empty(), Optional.empty(), Optional.empty(), Optional.empty(),
                Optional.empty());
    }
}
