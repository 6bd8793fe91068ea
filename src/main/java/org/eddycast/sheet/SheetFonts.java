package org.eddycast.sheet;

import java.awt.Font;
import java.awt.FontFormatException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

/**
 * The sheet's typeface: Roboto (regular and bold), an open font under the Apache License 2.0, shipped in the
 * FlatLaf font artifact on the class path. The same font files are drawn on screen and paper and embedded (as
 * subsets) in every PDF, so a sheet looks the same wherever it is opened and no font is substituted.
 */
public final class SheetFonts {

    private static final String FOLDER = "/com/formdev/flatlaf/fonts/roboto/";
    private static final String REGULAR_FILE = "Roboto-Regular.ttf";
    private static final String BOLD_FILE = "Roboto-Bold.ttf";
    private static final Font REGULAR = load(REGULAR_FILE);
    private static final Font BOLD = load(BOLD_FILE);

    private SheetFonts() {
    }

    /** The regular face at a size in points. */
    public static Font regular(float size) {
        return REGULAR.deriveFont(Font.PLAIN, size);
    }

    /** The bold face at a size in points. */
    public static Font bold(float size) {
        return BOLD.deriveFont(Font.PLAIN, size);
    }

    /** Embeds both faces in a document and maps the sheet's fonts to them in the drawer. */
    static void register(PdfBoxGraphics2DFontTextDrawer drawer, PDDocument doc) throws IOException {
        drawer.registerFont(REGULAR.getFontName(), embed(doc, REGULAR_FILE));
        drawer.registerFont(BOLD.getFontName(), embed(doc, BOLD_FILE));
    }

    private static PDType0Font embed(PDDocument doc, String file) throws IOException {
        try (InputStream in = stream(file)) {
            return PDType0Font.load(doc, in, true);
        }
    }

    private static InputStream stream(String file) {
        InputStream in = SheetFonts.class.getResourceAsStream(FOLDER + file);
        if (in == null) {
            throw new IllegalStateException("the sheet's font " + FOLDER + file + " is not on the class path; the "
                    + "build adds it from the flatlaf-fonts-roboto artifact");
        }
        return in;
    }

    private static Font load(String file) {
        try (InputStream in = stream(file)) {
            return Font.createFont(Font.TRUETYPE_FONT, in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("the sheet's font " + file + " could not be read: " + e.getMessage(), e);
        }
    }
}
