package dev.countercheck.cli;

import dev.countercheck.review.Review;
import picocli.CommandLine.IVersionProvider;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;

/** The tool's name and version, from the build. */
public final class Version implements IVersionProvider {

    public static Review.ToolInfo tool() {
        Properties p = new Properties();
        try (InputStream in = Version.class.getResourceAsStream("/countercheck-version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return new Review.ToolInfo("countercheck", p.getProperty("version", "unknown"));
    }

    @Override
    public String[] getVersion() {
        return new String[] {"countercheck " + tool().version()};
    }
}
