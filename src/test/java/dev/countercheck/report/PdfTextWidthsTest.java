package dev.countercheck.report;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** The shortcut of {@link PdfTextWidths} depends on a private field of the renderer's PDF device. */
class PdfTextWidthsTest {

    @Test
    void readsTheCurrentFontOfThisVersionOfTheRenderersDevice() {
        // after an upgrade of openhtmltopdf that renames the field, texts are still drawn, by the device's slower path
        assertThat(PdfTextWidths.readsTheDevicesFont()).as("PdfBoxFastOutputDevice._font is read").isTrue();
    }
}
