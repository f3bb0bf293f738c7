package com.baysheet.notice;

import com.baysheet.engine.InputError;
import jakarta.mail.internet.AddressException;
import jakarta.mail.internet.InternetAddress;

import java.util.Locale;

/**
 * How the office sends its e-mail notices: through the firm's own SMTP server, switched on or off. The password is
 * not here: it is a secret kept as the server's other secrets are (a file named at start), never stored or shown.
 *
 * @param port     the server's port, 1 to 65535 (587 for STARTTLS and 465 for TLS are the usual ones)
 * @param username the account to log in with, blank for a server that takes mail without a login
 * @param officeAddress the address people reach this server at ({@code https://calc.firm.example}), for the links in
 *                      notices; blank for notices without a link (never taken from a request, whose Host anyone sets)
 */
public record MailSettings(boolean on, String host, int port, Security security, String username, String fromAddress,
                           String officeAddress) {
    /** How the connection to the server is protected. */
    public enum Security {
        /** Plain SMTP: for a server on the office's own machine or network only. */
        NONE("none (plain SMTP)"),
        /** Plain SMTP upgraded with STARTTLS before anything is sent; the server must offer it. */
        STARTTLS("STARTTLS"),
        /** TLS from the first byte (SMTPS). */
        TLS("TLS");

        private final String label;

        Security(String label) { this.label = label; }

        public String label() { return label; }

        public static Security parse(String field, String text) {
            if (text != null) for (Security s : values()) if (s.name().equalsIgnoreCase(text.strip())) return s;
            throw new InputError(field, text == null ? "nothing" : "\"" + text + "\"", "must be one of NONE, STARTTLS, TLS");
        }
    }

    /** No notices: the settings of an office that has not set up its mail server. */
    public static final MailSettings OFF = new MailSettings(false, "", 587, Security.STARTTLS, "", "", "");

    public MailSettings {
        host = host == null ? "" : host.strip();
        username = username == null ? "" : username.strip();
        fromAddress = fromAddress == null ? "" : fromAddress.strip();
        officeAddress = officeAddress == null ? "" : officeAddress.strip().replaceAll("/+$", "");
        if (!officeAddress.isEmpty() && !officeAddress.matches("https?://[A-Za-z0-9.\\-\\[\\]:]+(/[A-Za-z0-9._~\\-/]*)?") || officeAddress.length() > 200)
            throw new InputError("officeAddress", "\"" + officeAddress + "\"", "must be the server's address as people reach it, such as https://calc.firm.example");
        if (security == null) throw new InputError("security", "nothing", "must be one of NONE, STARTTLS, TLS");
        if (port < 1 || port > 65535) throw new InputError("port", String.valueOf(port), "must be a port number from 1 to 65535");
        if (!host.isEmpty() && !host.matches("[A-Za-z0-9.:\\-\\[\\]]{1,253}"))
            throw new InputError("host", "\"" + host + "\"", "must be a host name or an IP address");
        if (username.length() > 254) throw new InputError("username", username.length() + " characters", "at most 254");
        if (!fromAddress.isEmpty()) address("fromAddress", fromAddress);
        if (on && host.isEmpty()) throw new InputError("host", "blank", "name the mail server before switching notices on");
        if (on && fromAddress.isEmpty()) throw new InputError("fromAddress", "blank", "give the address notices come from before switching them on");
    }

    /** An e-mail address as the notices' sender or a person's, checked strictly; an input error names the field. */
    public static InternetAddress address(String field, String text) {
        try {
            if (text == null || text.isBlank() || text.length() > 254) throw new AddressException("blank or too long");
            InternetAddress a = new InternetAddress(text.strip(), true);
            if (!a.getAddress().contains("@")) throw new AddressException("no @");
            return a;
        } catch (AddressException e) {
            throw new InputError(field, "\"" + text + "\"", "must be one e-mail address, such as checks@firm.example");
        }
    }

    /** The address of a page of this server for a notice's link, or blank when the office gave no address. */
    public String link(String path) { return officeAddress.isEmpty() ? "" : officeAddress + path; }

    /** The host and port as the last error names them. */
    public String server() { return host + ":" + port + " (" + security.label().toLowerCase(Locale.ROOT) + ")"; }
}
