package com.baysheet.e2e;

import com.baysheet.auth.Tokens;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The whole story of one sheet in a real browser (Debian's Chromium, headless), against the shipped jar as a
 * process of its own on a new, empty office (full-strength password hashing, the access filter, form tokens,
 * every template and static file as packaged): the administrator's set-up, two users,
 * an engineer entering a project, its grid, levels and bays, reading members and a take-down, downloading
 * and submitting a sheet; a checker marking up a step and returning it; the engineer answering and
 * resubmitting; the checker approving and issuing; the issued PDF downloaded and verified by upload; then the rest of
 * the level by the batch ({@link BatchCheck}): submitted at once, counted on the checker's home page, a selection
 * approved in one action and issued in another, where the sheet not yet approved is refused saying why.
 * Along the way every page is checked for unlabelled form fields, and the set-up and login forms are filled
 * and sent with the keyboard alone.
 */
class BrowserStoryIT {
    private static final String ADMIN_PASSWORD = "harbour lights 42";
    private static final String ENGINEER_PASSWORD = "gravel path 1987";
    private static final String CHECKER_PASSWORD = "slate roof 2231";
    private static final String MARKUP = "Is this K_LL right for a girder? <script>alert('x')</script>";
    private static final String REPLY = "Yes: interior girder, K_LL = 2 (Table 4.7-1).";

    @TempDir
    static Path dir;
    static ChildServer server;
    static ChromeDriver driver;
    static Path downloads;
    Page page;

    @BeforeAll
    static void start() throws Exception {
        String missing = Chromium.missing();
        if (missing != null) System.out.println("BrowserStoryIT skipped: " + missing);
        Assumptions.assumeTrue(missing == null, "browser tests need Debian's chromium and chromium-driver: " + missing);
        server = ChildServer.start(dir.resolve("data"), false);
        downloads = Files.createTempDirectory("baysheet-downloads-");
        driver = Chromium.start(downloads);
        driver.executeCdpCommand("Browser.setDownloadBehavior", Map.of("behavior", "allow",
                "downloadPath", downloads.toAbsolutePath().toString()));
    }

    @AfterAll
    static void stop() throws InterruptedException {
        if (driver != null) driver.quit();
        if (server != null) server.close();
    }

    @Test
    void oneSheetFromSetUpToIssuedAndVerified() throws Exception {
        page = new Page(driver, server.base());
        try {
            story();
        } catch (Throwable t) {
            Screenshots.save(driver, "story-" + Instant.now().toString().replace(':', '-'));
            System.out.println("BrowserStoryIT: the server's log follows\n" + server.logText());
            throw t;
        }
        assertThat(page.unlabelled).as("form fields without a label, by page").isEmpty();
    }

    private void story() throws Exception {
        setUpAdministratorByKeyboard();
        String erinCode = addUser("erin", "Erin Marsh", "EM", "engineer");
        String chrisCode = addUser("chris", "Chris Vale", "CV", "checker");
        assertThat(page.text()).contains("Erin Marsh").contains("Chris Vale");
        page.press("Log out");
        assertThat(page.path()).startsWith("/login");

        firstPasswordWithCode("chris", chrisCode, CHECKER_PASSWORD);
        firstLogInByKeyboard("chris", CHECKER_PASSWORD);
        page.press("Log out");
        firstPasswordWithCode("erin", erinCode, ENGINEER_PASSWORD);
        firstLogInByKeyboard("erin", ENGINEER_PASSWORD);
        int before = page.posts;
        enterProject();
        enterGridAndLevels();
        enterBays();
        int entry = page.posts - before;
        System.out.println("BrowserStoryIT: the three-storey entry (project, grid, Level 2 and Roof, their bays) took "
                + entry + " form submissions");
        assertThat(entry).as("form submissions of the three-storey entry, one per press that posts a form").isPositive();
        String member = readMembersAndTakeDown(); // the girder's mark: its sheet is the mark's
        openSheet(member);
        Path checking = download("Checking copy (PDF)");
        assertThat(Files.readAllBytes(checking)).startsWith("%PDF".getBytes());
        page.press("Submit for check");
        assertThat(state()).isEqualTo("submitted for check");
        page.press("Log out");

        logInByKeyboard("chris", CHECKER_PASSWORD);
        openSheet(member);
        markUpAStepAndReturn();
        page.press("Log out");

        logInByKeyboard("erin", ENGINEER_PASSWORD);
        openSheet(member);
        assertThat(state()).isEqualTo("returned with markups");
        WebElement reply = page.form(".markup form[action$='/reply']");
        page.type(reply, "text", REPLY);
        page.press(reply, "Reply");
        page.press("Resubmit");
        assertThat(state()).isEqualTo("resubmitted");
        page.press("Log out");

        logInByKeyboard("chris", CHECKER_PASSWORD);
        openSheet(member);
        assertThat(page.text()).contains(REPLY);
        page.press("Resolve");
        page.press("Approve");
        assertThat(state()).isEqualTo("approved");
        assertThat(page.form("#titleblock").getText()).contains("CV");
        WebElement issue = page.form("form[action$='/issue']");
        page.type(issue, "description", "First issue");
        page.press(issue, "Issue");
        assertThat(state()).isEqualTo("issued");
        assertThat(page.text()).contains("First issue");
        String sha = page.form("#titleblock").getText().replaceAll("(?s).*SHA-256 ([0-9a-f]{64}).*", "$1");
        assertThat(sha).hasSize(64);
        Path issued = download("Issued copy (PDF)");
        assertThat(Tokens.sha256(Files.readAllBytes(issued))).as("the downloaded issued revision is the frozen one").isEqualTo(sha);
        verifyByUpload(issued, sha);
        page.press("Log out");

        // then the rest of Level 2 by the batch: submitted at once, approved and issued in one action each
        BatchCheck batch = new BatchCheck(page);
        logInByKeyboard("erin", ENGINEER_PASSWORD);
        int submitted = batch.submitLevel("Level 2");
        System.out.println("BrowserStoryIT: the rest of Level 2 went by the batch: " + submitted + " sheets submitted at once");
        page.press("Log out");
        logInByKeyboard("chris", CHECKER_PASSWORD);
        String left = batch.approveAllButOne(submitted);
        batch.issueWithOneRefused(submitted, left, "Level 2 first issue");
        page.press("Log out");
    }

    private void setUpAdministratorByKeyboard() throws InterruptedException {
        page.open("/");
        assertThat(page.path()).as("a new office starts at the one-time set-up").startsWith("/setup");
        page.tabTo("setupCode");
        page.keys(server.setupCode());
        page.tabTo("username");
        page.keys("admin", Keys.TAB, "Ada Byrne", Keys.TAB, "AB", Keys.TAB, ADMIN_PASSWORD, Keys.TAB, ADMIN_PASSWORD);
        page.keysThenWait(Keys.ENTER);
        assertThat(page.path()).startsWith("/admin/users");
    }

    /** Adds a person with no password: the one-time set-up code the page shows once is returned for them. */
    private String addUser(String username, String fullName, String initials, String role) {
        WebElement f = page.form("#add-user");
        page.type(f, "username", username);
        page.type(f, "fullName", fullName);
        page.type(f, "initials", initials);
        page.choose(f, "role", role);
        assertThat(f.findElements(By.cssSelector("input[type='password']"))).as("the administrator sets no password").isEmpty();
        page.press(f, "Add user");
        assertThat(page.text()).contains(fullName, "you never see");
        String code = page.form("#setup-code code").getText().strip();
        assertThat(code).matches("[2-9A-Z]{4}(-[2-9A-Z]{4}){4}");
        page.follow("Back to users");
        assertThat(page.path()).startsWith("/admin/users");
        assertThat(page.text()).contains(fullName).doesNotContain(code);
        return code;
    }

    /** The person, not logged in, chooses their own password with the code from the administrator. */
    private void firstPasswordWithCode(String username, String code, String own) {
        if (!page.path().startsWith("/login")) page.open("/login");
        page.follow("choose your password");
        assertThat(page.path()).startsWith("/account/reset");
        WebElement f = page.form("#reset-form");
        page.type(f, "username", username);
        page.type(f, "code", code);
        page.type(f, "newPassword", own);
        page.type(f, "confirmPassword", own);
        page.press(f, "Set my password");
        assertThat(page.path()).as("back at the login, to log in as usual").startsWith("/login");
    }

    /** The first login is told of the code the person used (made by the administrator), then goes on. */
    private void firstLogInByKeyboard(String username, String own) {
        page.tabTo("username");
        page.keys(username, Keys.TAB, own);
        page.keysThenWait(Keys.ENTER);
        assertThat(page.text()).contains("made for you by admin", "to set a new password");
        page.follow("Continue");
        assertThat(page.path()).as("logged in as " + username).startsWith("/projects");
    }

    private void logInByKeyboard(String username, String password) {
        if (!page.path().startsWith("/login")) page.open("/login");
        page.tabTo("username");
        page.keys(username, Keys.TAB, password);
        page.keysThenWait(Keys.ENTER);
        assertThat(page.path()).as("logged in as " + username).startsWith("/projects");
    }

    private void enterProject() {
        page.follow("New project");
        WebElement f = page.form("form[action='/projects']");
        page.type(f, "jobNumber", "26-014");
        page.type(f, "name", "Pier Street Offices");
        page.type(f, "address", "14 Pier Street");
        page.type(f, "client", "Pier Street Holdings");
        f.findElement(By.cssSelector("input[name='units'][value='US']")).click();
        page.press(f, "Create project");
        assertThat(page.path()).matches("/projects/\\d+");
        assertThat(page.text()).contains("Pier Street Offices");
    }

    private void enterGridAndLevels() {
        page.follow("Levels and grid");
        WebElement grid = page.form("#grid-form");
        page.type(grid, "x.names", "1 2 3 4");
        page.type(grid, "x.spacings", "30 30 25");
        page.type(grid, "y.names", "A B C");
        page.type(grid, "y.spacings", "25 25");
        page.press(grid, "Save grid");
        assertThat(page.text()).contains("3 × 2 bays");
        addLevel("Level 2", "14", null);
        addLevel("Roof", "28", "0.25");
        assertThat(page.text()).contains("Level 2").contains("Roof");
    }

    private void addLevel(String name, String elevation, String roofSlope) {
        WebElement f = page.form("#level-form");
        page.type(f, "name", name);
        page.type(f, "elevation", elevation);
        if (roofSlope != null) {
            page.field(f, "roof").click();
            page.type(f, "roofSlope", roofSlope);
        }
        page.press(f, "Add level");
        assertThat(page.path()).endsWith("/levels");
        assertThat(page.text()).doesNotContain("must be");
    }

    private void enterBays() {
        WebElement row = page.driver.findElements(By.cssSelector("table.list tr")).stream()
                .filter(r -> r.getText().startsWith("Level 2")).findFirst().orElseThrow();
        pageFollowIn(row, "Edit bays");
        // the whole level at once from the "all" heading, then two bays of the south row as a corridor
        page.driver.findElement(By.cssSelector("button[data-pick='all']")).click();
        assignTicked("office", "65");
        assertThat(page.driver.findElements(By.cssSelector("#bay-grid td .bay-use")).stream()
                .filter(e -> !e.getText().isBlank()).count()).isEqualTo(6);
        List<WebElement> boxes = page.driver.findElements(By.cssSelector("#bay-grid td input[name='cells']"));
        boxes.get(0).click();
        boxes.get(1).click();
        // the two ticked bays agree on everything: the script says what they hold and starts the form from it
        assertThat(page.driver.findElement(By.id("selection-summary")).getText()).startsWith("2 bays ticked: Offices × 2");
        assertThat(page.field(page.form("#bay-form"), "deadLoad").getAttribute("value")).isEqualTo("65");
        assignTicked("office-corridor", "65");
        // after Apply the form keeps the values just applied
        assertThat(page.field(page.form("#bay-form"), "occupancy").getAttribute("value")).isEqualTo("office-corridor");
        Set<String> uses = page.driver.findElements(By.cssSelector("#bay-grid td .bay-use")).stream()
                .map(WebElement::getText).collect(Collectors.toSet());
        assertThat(uses).hasSize(2);

        pageFollowIn(page.driver.findElement(By.cssSelector("p.level-switch")), "Roof");
        page.driver.findElement(By.cssSelector("button[data-pick='all']")).click();
        assignTicked("roof-ordinary", "20");
    }

    private void assignTicked(String occupancy, String deadLoad) {
        WebElement f = page.form("#bay-form");
        page.choose(f, "occupancy", occupancy);
        page.type(f, "deadLoad", deadLoad);
        page.choose(f, "beams", "Y");
        page.type(f, "infillBeams", "2");
        page.press(f, "Apply to selected bays");
        assertThat(page.path().replaceAll("\\?.*", "")).endsWith("/bays");
        assertThat(page.driver.findElements(By.cssSelector(".form-errors, .error"))).allSatisfy(e -> assertThat(e.getText()).isBlank());
    }

    /** Reads the girders of Level 2, one girder's record, and a column take-down; returns that girder's mark. */
    private String readMembersAndTakeDown() {
        page.follow("Members");
        WebElement filter = page.form("form.filters");
        page.choose(filter, "level", "Level 2");
        page.choose(filter, "role", "GIRDER");
        page.press(filter, "Filter");
        List<WebElement> links = page.driver.findElements(By.cssSelector("table.members tbody a"));
        assertThat(links).isNotEmpty();
        String name = links.get(0).getText();
        pageFollowIn(page.driver.findElement(By.cssSelector("table.members tbody")), name);
        assertThat(page.text()).contains(name).contains("licensed engineer").contains("4.7");
        String mark = page.driver.findElement(By.cssSelector("#mark a")).getText();
        assertThat(mark).startsWith("G");

        page.follow("Column take-downs");
        WebElement firstStack = page.driver.findElement(By.cssSelector("table a[href*='/takedowns/']"));
        pageFollowIn(firstStack.findElement(By.xpath("..")), firstStack.getText());
        assertThat(page.text()).contains("Roof").contains("Level 2").contains("licensed engineer");
        return mark;
    }

    private void openSheet(String member) {
        page.follow("Projects");
        page.follow("Pier Street Offices");
        page.follow("Sheets and check");
        pageFollowIn(page.form("#sheets"), member);
        assertThat(page.path()).startsWith("/review/projects/");
    }

    private void markUpAStepAndReturn() {
        assertThat(state()).isEqualTo("submitted for check");
        WebElement f = page.form("#add-markup form");
        WebElement target = page.field(f, "target");
        String step = target.findElements(By.tagName("option")).stream().map(o -> o.getAttribute("value"))
                .filter(v -> v.startsWith("step:")).findFirst().orElseThrow();
        page.choose(f, "target", step);
        page.type(f, "text", MARKUP);
        page.press(f, "Add markup");
        WebElement row = page.driver.findElement(By.id("step-" + step.substring("step:".length())));
        assertThat(row.getText()).as("the markup sits beside its step, shown as text").contains(MARKUP);
        page.press("Return with markups");
        assertThat(state()).isEqualTo("returned with markups");
    }

    private void verifyByUpload(Path pdf, String sha) {
        page.follow("Verify a PDF");
        WebElement f = page.form("#verify-form");
        page.field(f, "pdf").sendKeys(pdf.toAbsolutePath().toString());
        page.press(f, "Verify");
        assertThat(page.text()).contains("Matches an issued revision").contains(sha).contains("revision 0");
    }

    private String state() { return page.driver.findElement(By.id("state")).getText(); }

    private void pageFollowIn(WebElement scope, String linkText) {
        WebElement link = scope.findElement(By.linkText(linkText));
        String href = link.getAttribute("href");
        page.open(href.substring(page.base.length()));
    }

    /** Clicks a download link and waits for the file to arrive whole. */
    private Path download(String linkText) throws Exception {
        Set<Path> before = listing();
        page.driver.findElement(By.linkText(linkText)).click();
        for (int i = 0; i < 300; i++) {
            List<Path> fresh = listing().stream().filter(p -> !before.contains(p))
                    .filter(p -> p.toString().endsWith(".pdf")).toList();
            if (!fresh.isEmpty() && Files.size(fresh.get(0)) > 0) return fresh.get(0);
            Thread.sleep(100);
        }
        throw new AssertionError("no download arrived after clicking " + linkText + "; folder has " + listing());
    }

    private Set<Path> listing() throws Exception {
        try (Stream<Path> s = Files.list(downloads)) {
            return s.collect(Collectors.toSet());
        }
    }
}
