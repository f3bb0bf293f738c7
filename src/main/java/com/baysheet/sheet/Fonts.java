package com.baysheet.sheet;

import com.lowagie.text.Font;
import com.lowagie.text.pdf.BaseFont;

import java.awt.Color;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.security.SecureRandom;
import java.util.SplittableRandom;

/**
 * The one typeface of every sheet, DejaVu Sans Condensed (open licence, shipped in fonts/), embedded as
 * an Identity-H subset as PDF/A-1b requires. The font files are read once; each document parses its own
 * BaseFont, because OpenPDF keeps subset state on the font and draws the subset's name prefix from a
 * random source, which is seeded here from the document's content so that the bytes repeat.
 */
final class Fonts {
    private static final byte[] REGULAR = load("fonts/DejaVuSansCondensed.ttf");
    private static final byte[] BOLD = load("fonts/DejaVuSansCondensed-Bold.ttf");

    static final Color INK = new Color(0x1a, 0x1a, 0x1a);
    static final Color GREY = new Color(0x6b, 0x6b, 0x6b);
    static final Color RULE = new Color(0xa0, 0xa0, 0xa0);
    static final Color SHADE = new Color(0xee, 0xee, 0xee);
    static final Color MARK = new Color(0xb0, 0x1c, 0x1c);

    final BaseFont regular;
    final BaseFont bold;

    private Fonts(BaseFont regular, BaseFont bold) {
        this.regular = regular;
        this.bold = bold;
    }

    static Fonts create(long seed) {
        BaseFont r = font("DejaVuSansCondensed.ttf", REGULAR), b = font("DejaVuSansCondensed-Bold.ttf", BOLD);
        r.setSecureRandom(new SeededRandom(seed));
        b.setSecureRandom(new SeededRandom(seed + 1));
        return new Fonts(r, b);
    }

    Font body() { return new Font(regular, 7.5f, Font.NORMAL, INK); }
    Font bodyBold() { return new Font(bold, 7.5f, Font.NORMAL, INK); }
    Font small() { return new Font(regular, 6.5f, Font.NORMAL, INK); }
    Font smallGrey() { return new Font(regular, 6.5f, Font.NORMAL, GREY); }
    Font smallBold() { return new Font(bold, 6.5f, Font.NORMAL, INK); }
    Font heading() { return new Font(bold, 9f, Font.NORMAL, INK); }
    Font title() { return new Font(bold, 16f, Font.NORMAL, INK); }
    Font mark() { return new Font(bold, 7.5f, Font.NORMAL, MARK); }

    private static BaseFont font(String name, byte[] bytes) {
        try {
            return BaseFont.createFont(name, BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false, bytes, null);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (com.lowagie.text.DocumentException e) {
            throw new IllegalStateException("bundled font " + name + " unreadable", e);
        }
    }

    private static byte[] load(String resource) {
        try (InputStream in = Fonts.class.getClassLoader().getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("bundled font missing from the classpath: " + resource);
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A repeatable source for the subset prefix only; nothing secret is drawn from it. */
    private static final class SeededRandom extends SecureRandom {
        private final SplittableRandom random;

        SeededRandom(long seed) { this.random = new SplittableRandom(seed); }

        @Override
        public void nextBytes(byte[] bytes) { random.nextBytes(bytes); }

        @Override
        public double nextDouble() { return random.nextDouble(); }
    }
}
