package com.baysheet.notice;

import jakarta.mail.Message;
import jakarta.mail.MessagingException;
import jakarta.mail.Session;
import jakarta.mail.Transport;
import jakarta.mail.internet.InternetAddress;
import jakarta.mail.internet.MimeMessage;

import java.nio.charset.StandardCharsets;
import java.util.Properties;

/**
 * Sends one notice through the firm's SMTP server with Jakarta Mail (Angus Mail's SMTP transport). Every wait on
 * the server is bounded ({@link #TIMEOUT_MS}), so a server that hangs costs one send, never a thread for good.
 */
final class Mailer {
    /** Connecting, reading and writing each give up after this long: a mail server answers in well under a second. */
    static final int TIMEOUT_MS = 10_000;

    private Mailer() {}

    static void send(MailSettings s, String password, Notice n) throws MessagingException {
        Session session = Session.getInstance(properties(s));
        MimeMessage m = new MimeMessage(session);
        m.setFrom(MailSettings.address("fromAddress", s.fromAddress()));
        InternetAddress[] to = n.to().stream().map(a -> MailSettings.address("to", a)).toArray(InternetAddress[]::new);
        m.setRecipients(Message.RecipientType.TO, to);
        m.setSubject(n.subject(), StandardCharsets.UTF_8.name());
        m.setText(n.text(), StandardCharsets.UTF_8.name());
        if (s.username().isEmpty()) Transport.send(m);
        else Transport.send(m, s.username(), password == null ? "" : password);
    }

    /** The session's properties (the SMTP transport's own names: Angus Mail, package org.eclipse.angus.mail.smtp). */
    static Properties properties(MailSettings s) {
        Properties p = new Properties();
        p.put("mail.transport.protocol", "smtp");
        p.put("mail.smtp.host", s.host());
        p.put("mail.smtp.port", String.valueOf(s.port()));
        p.put("mail.smtp.auth", String.valueOf(!s.username().isEmpty()));
        p.put("mail.smtp.connectiontimeout", String.valueOf(TIMEOUT_MS));
        p.put("mail.smtp.timeout", String.valueOf(TIMEOUT_MS));
        p.put("mail.smtp.writetimeout", String.valueOf(TIMEOUT_MS));
        switch (s.security()) {
            case STARTTLS -> {
                // required: a server that does not offer STARTTLS is refused rather than sent the password in clear
                p.put("mail.smtp.starttls.enable", "true");
                p.put("mail.smtp.starttls.required", "true");
                p.put("mail.smtp.ssl.checkserveridentity", "true");
            }
            case TLS -> {
                p.put("mail.smtp.ssl.enable", "true");
                p.put("mail.smtp.ssl.checkserveridentity", "true");
            }
            case NONE -> { }
        }
        return p;
    }
}
