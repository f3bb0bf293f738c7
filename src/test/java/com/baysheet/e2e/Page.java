package com.baysheet.e2e;

import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebDriverException;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What a person does on a Baysheet page, in the browser: follow a link by its text, fill a field by its
 * label's field name, press a button by its text and wait for the next page. Every page it lands on is
 * checked for form fields without a label; the findings are kept for the end of the story.
 */
final class Page {
    private static final Duration WAIT = Duration.ofSeconds(30);
    /** Fields that need a label: every control a person fills or ticks. */
    private static final String UNLABELLED = """
            return Array.from(document.querySelectorAll('input, select, textarea'))
              .filter(e => !['hidden', 'submit', 'button', 'reset', 'image'].includes(e.type))
              .filter(e => !(e.labels && e.labels.length > 0) && !e.getAttribute('aria-label')
                           && !e.getAttribute('aria-labelledby') && !e.getAttribute('title'))
              .map(e => e.tagName.toLowerCase() + '[name=' + (e.name || '?') + ']');
            """;

    final WebDriver driver;
    final String base;
    final Map<String, List<String>> unlabelled = new LinkedHashMap<>();
    /** Forms sent with method post so far (each button press or Enter that posts one): the cost of an entry in submissions. */
    int posts;

    Page(WebDriver driver, String base) {
        this.driver = driver;
        this.base = base;
    }

    void open(String path) {
        driver.get(base + path);
        landed();
    }

    String path() {
        String url = driver.getCurrentUrl();
        return url.startsWith(base) ? url.substring(base.length()) : url;
    }

    String text() { return driver.findElement(By.tagName("body")).getText(); }

    String html() { return driver.getPageSource(); }

    WebElement field(String name) { return driver.findElement(By.name(name)); }

    WebElement field(WebElement form, String name) { return form.findElement(By.name(name)); }

    WebElement form(String css) { return driver.findElement(By.cssSelector(css)); }

    void type(WebElement form, String name, String value) {
        WebElement f = field(form, name);
        f.clear();
        f.sendKeys(value);
    }

    void choose(WebElement form, String name, String value) {
        new Select(field(form, name)).selectByValue(value);
    }

    /** Follows the first link with exactly this text. */
    void follow(String linkText) {
        navigate(() -> driver.findElement(By.linkText(linkText)).click());
    }

    /** Follows the first link whose address contains this. */
    void followHref(String part) {
        navigate(() -> driver.findElement(By.cssSelector("a[href*='" + part + "']")).click());
    }

    /** Presses the submit button with this text inside the given form. */
    void press(WebElement form, String buttonText) {
        WebElement b = form.findElements(By.tagName("button")).stream()
                .filter(x -> x.getText().strip().equals(buttonText)).findFirst()
                .orElseThrow(() -> new AssertionError("no button \"" + buttonText + "\" in the form on " + path()));
        countIfPost(b);
        navigate(b::click);
    }

    /** Presses the first button on the page with this text. */
    void press(String buttonText) {
        WebElement b = driver.findElements(By.tagName("button")).stream()
                .filter(x -> x.getText().strip().equals(buttonText)).findFirst()
                .orElseThrow(() -> new AssertionError("no button \"" + buttonText + "\" on " + path()));
        countIfPost(b);
        navigate(b::click);
    }

    /** Presses keys as a keyboard does, into whatever has the focus. */
    void keys(CharSequence... keys) {
        new Actions(driver).sendKeys(keys).perform();
    }

    /** Presses Tab until the field with this name has the focus (a keyboard user's way to reach it). */
    void tabTo(String name) {
        for (int i = 0; i < 60; i++) {
            if (name.equals(js("return document.activeElement && document.activeElement.name"))) return;
            keys(Keys.TAB);
        }
        throw new AssertionError("Tab never reached the field " + name + " on " + path());
    }

    /** Keys that end by submitting a form (Enter): waits for the next page. */
    void keysThenWait(CharSequence... keys) {
        if (Boolean.TRUE.equals(js("var f = document.activeElement && document.activeElement.form;"
                + " return !!f && f.method.toLowerCase() === 'post'"))) posts++;
        navigate(() -> keys(keys));
    }

    /** Counts a press of this button when it sends its form with method post. */
    private void countIfPost(WebElement button) {
        if (Boolean.TRUE.equals(js("var f = arguments[0].form; return !!f && f.method.toLowerCase() === 'post'", button))) posts++;
    }

    Object js(String script, Object... args) {
        return ((JavascriptExecutor) driver).executeScript(script, args);
    }

    /** Runs an action that loads another page, and waits until the new document has loaded. */
    private void navigate(Runnable action) {
        js("window.baysheetOldPage = true");
        action.run();
        new WebDriverWait(driver, WAIT).ignoring(WebDriverException.class)
                .until(d -> js("return window.baysheetOldPage === undefined && document.readyState === 'complete'"));
        landed();
    }

    private void landed() {
        new WebDriverWait(driver, WAIT).until(d -> "complete".equals(js("return document.readyState")));
        @SuppressWarnings("unchecked")
        List<String> missing = new ArrayList<>((List<String>) js(UNLABELLED));
        if (!missing.isEmpty()) unlabelled.merge(path().replaceAll("\\d+", "N").replaceAll("\\?.*", ""), missing, (a, b) -> a);
    }
}
