package com.baysheet.e2e;

import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Screenshots of a failed browser story, in target/e2e-screenshots/, with the page's HTML beside them. */
final class Screenshots {
    static final Path DIR = Path.of("target", "e2e-screenshots");

    private Screenshots() {}

    static void save(WebDriver driver, String name) {
        try {
            Files.createDirectories(DIR);
            byte[] png = ((TakesScreenshot) driver).getScreenshotAs(OutputType.BYTES);
            Files.write(DIR.resolve(name + ".png"), png);
            Files.writeString(DIR.resolve(name + ".html"), driver.getCurrentUrl() + "\n" + driver.getPageSource());
            System.err.println("browser story failed on " + driver.getCurrentUrl() + "; screenshot " + DIR.resolve(name + ".png").toAbsolutePath());
        } catch (IOException | RuntimeException e) {
            System.err.println("could not save the screenshot: " + e);
        }
    }
}
