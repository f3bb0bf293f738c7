package com.baysheet.e2e;

import com.baysheet.web.Html;
import org.jsoup.nodes.Element;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The check by the batch, in the browser, on the story's project: the engineer submits a whole level at once, the
 * checker finds the count on the home page, approves a selection in one action and issues in one action, where the
 * sheet not yet approved is refused and the page says why. Every assertion reads the page as HTML ({@link Html}).
 */
final class BatchCheck {
    private static final String PROJECT = "Pier Street Offices";

    private final Page page;

    BatchCheck(Page page) {
        this.page = page;
    }

    /**
     * As the engineer, from the sheets list: the level's sheets not yet submitted, listed in the check queue, all
     * ticked with one press and submitted together. Returns how many went.
     */
    int submitLevel(String level) {
        page.follow("Projects");
        page.follow(PROJECT);
        page.follow("Sheets and check");
        page.follow("Filter by level, role and state in the check queue");
        WebElement f = page.form("form.filters");
        page.choose(f, "show", "mine");
        page.choose(f, "level", level);
        page.press(f, "Filter");
        String html = page.html();
        List<String> waiting = Html.texts(html, "table#queue tbody td.waiting");
        assertThat(waiting).as("the level's sheets nobody has submitted").hasSizeGreaterThanOrEqualTo(3).containsOnly("not yet submitted");
        assertThat(Html.texts(html, "table#queue tbody td:eq(2)")).containsOnly(level);
        int n = waiting.size();

        tickAll(n);
        page.press("Submit ticked for check");
        html = page.html();
        assertThat(Html.text(html, "#batch-summary")).isEqualTo(n + " done, 0 refused.");
        assertThat(Html.texts(html, "#batch-outcomes td.outcome")).hasSize(n).containsOnly("done: submitted for check");
        return n;
    }

    /**
     * As the checker, on the home page: the sheets awaiting their check counted, in all and on the project's line,
     * which leads to its queue; there every sheet but the last is ticked and approved in one action. Returns the
     * mark left unapproved.
     */
    String approveAllButOne(int submitted) {
        page.open("/projects");
        String home = page.html();
        assertThat(Html.text(home, "#waiting li[data-waiting=TO_CHECK] strong")).isEqualTo(String.valueOf(submitted));
        Element line = Html.all(home, "table.list tbody tr").stream().filter(r -> r.text().contains(PROJECT)).findFirst().orElseThrow();
        assertThat(line.selectFirst("td.waiting").text()).isEqualTo(String.valueOf(submitted));
        page.open(line.selectFirst("td.waiting a").attr("href"));

        String html = page.html();
        assertThat(Html.text(html, "#waiting-counts li[data-waiting=TO_CHECK] strong")).isEqualTo(String.valueOf(submitted));
        assertThat(Html.texts(html, "table#queue tbody td.waiting")).hasSize(submitted).containsOnly("awaiting your check");
        tickAll(submitted);
        List<WebElement> rows = page.driver.findElements(By.cssSelector("table#queue tbody tr"));
        WebElement last = rows.get(rows.size() - 1);
        String left = last.findElement(By.cssSelector("td:nth-child(2) a")).getText();
        last.findElement(By.cssSelector("input[name='sheet']")).click();
        page.press("Approve ticked");

        html = page.html();
        assertThat(Html.text(html, "#batch-summary")).isEqualTo((submitted - 1) + " done, 0 refused.");
        assertThat(Html.texts(html, "#batch-outcomes td.outcome")).containsOnly("done: approved");
        assertThat(Html.texts(html, "#batch-outcomes td a")).doesNotContain(left);
        assertThat(Html.text(html, "#waiting-counts li[data-waiting=TO_CHECK] strong")).isEqualTo("1");
        assertThat(Html.text(html, "#waiting-counts li[data-waiting=TO_ISSUE] strong")).isEqualTo(String.valueOf(submitted - 1));
        return left;
    }

    /**
     * As the checker: everything waiting for them ticked and issued in one action, after the confirmation page; the
     * sheet still awaiting its check is refused with the rules' reason, and the others are issued.
     */
    void issueWithOneRefused(int submitted, String notApproved, String description) {
        WebElement f = page.form("form.filters");
        page.choose(f, "show", "mine");
        page.press(f, "Filter");
        tickAll(submitted);
        page.press("Issue ticked…");

        String html = page.html();
        assertThat(page.path()).contains("/batch/issue");
        assertThat(Html.text(html, "#ready")).isEqualTo((submitted - 1) + " of " + submitted + " sheets are approved and ready for you to issue.");
        WebElement confirm = page.form("#confirm-issue");
        page.type(confirm, "description", description);
        page.press(confirm, "Issue these sheets");

        html = page.html();
        assertThat(Html.text(html, "#batch-summary")).isEqualTo((submitted - 1) + " done, 1 refused.");
        Element refused = Html.one(html, "#batch-outcomes tr.refused");
        assertThat(refused.selectFirst("a").text()).isEqualTo(notApproved);
        assertThat(refused.selectFirst("td.outcome").text())
                .isEqualTo("refused: Cannot issue: the sheet is submitted for check; only an approved sheet is issued");
        assertThat(Html.texts(html, "#batch-outcomes tr.done td.outcome")).hasSize(submitted - 1).containsOnly("done: issued");

        // one of those issued, on its own page: issued with the batch's description
        String issued = Html.one(html, "#batch-outcomes tr.done a").attr("href");
        page.open(issued);
        assertThat(page.driver.findElement(By.id("state")).getText()).isEqualTo("issued");
        assertThat(Html.texts(page.html(), "#revisions td")).contains(description);
        page.open(Html.one(html, "#batch-outcomes tr.refused a").attr("href"));
        assertThat(page.driver.findElement(By.id("state")).getText()).as("the refused sheet is left as it was").isEqualTo("submitted for check");
    }

    /** One press of the queue's own button ticks every sheet it lists. */
    private void tickAll(int listed) {
        page.driver.findElement(By.id("tick-all")).click();
        assertThat(page.driver.findElements(By.cssSelector("table#queue input[name='sheet']")).stream().filter(WebElement::isSelected).count())
                .as("every listed sheet ticked").isEqualTo(listed);
    }
}
