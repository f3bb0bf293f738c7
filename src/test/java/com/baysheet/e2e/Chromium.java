package com.baysheet.e2e;

import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Map;

/**
 * Debian's Chromium, headless, through Debian's chromedriver. Both paths are given explicitly so that
 * Selenium never looks for (or downloads) a driver or a browser of its own.
 */
final class Chromium {
    static final Path BINARY = Path.of("/usr/bin/chromium");
    static final Path DRIVER = Path.of("/usr/bin/chromedriver");

    private Chromium() {}

    /** Why the browser tests cannot run here, or null when they can. */
    static String missing() {
        if (!Files.isExecutable(BINARY)) return BINARY + " is missing (apt-get install -y chromium)";
        if (!Files.isExecutable(DRIVER)) return DRIVER + " is missing (apt-get install -y chromium-driver)";
        return null;
    }

    /** A fresh headless browser with its own profile, saving downloads into {@code downloads} without asking. */
    static ChromeDriver start(Path downloads) throws IOException {
        Path profile = Files.createTempDirectory("baysheet-chromium-");
        ChromeOptions o = new ChromeOptions();
        o.setBinary(BINARY.toFile());
        o.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--disable-quic",
                "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--window-size=1280,900", "--user-data-dir=" + profile);
        o.setExperimentalOption("prefs", Map.of(
                "download.default_directory", downloads.toAbsolutePath().toString(),
                "download.prompt_for_download", false,
                "plugins.always_open_pdf_externally", true,
                "safebrowsing.enabled", false));
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(new File(DRIVER.toString())).usingAnyFreePort().build();
        ChromeDriver d = new ChromeDriver(service, o);
        d.manage().timeouts().pageLoadTimeout(Duration.ofSeconds(60));
        return d;
    }
}
