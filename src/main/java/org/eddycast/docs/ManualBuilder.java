package org.eddycast.docs;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.commonmark.Extension;
import org.commonmark.ext.gfm.tables.TablesExtension;
import org.commonmark.node.AbstractVisitor;
import org.commonmark.node.Image;
import org.commonmark.node.Link;
import org.commonmark.node.Node;
import org.commonmark.parser.Parser;
import org.commonmark.renderer.html.HtmlRenderer;

/**
 * Renders the manual to one self-contained HTML file: the chapters of {@code manual/README.md} in order, every
 * image embedded as a data URI (a page that references a missing image fails the build with the page and the
 * image named), links between chapters turned into links within the file, and the validation-record chapter
 * generated from the test suite's records. Run by the build in the {@code verify} phase, after the tests have
 * written the screenshots and the records.
 *
 * <p>Arguments: manual directory, screenshot directory, validation-record directory, output HTML file, and
 * optionally {@value #WITHOUT_TEST_OUTPUTS}: the copy bundled into the jar at package time is built that way,
 * so that it exists even when the tests were skipped; a screenshot or validation record not written yet is then
 * replaced by a line saying how to get it, instead of failing the build.
 */
public final class ManualBuilder {

    private static final List<Extension> EXTENSIONS = List.of(TablesExtension.create());
    private static final Map<String, String> IMAGE_TYPES = Map.of("png", "image/png", "jpg", "image/jpeg",
            "jpeg", "image/jpeg", "svg", "image/svg+xml", "gif", "image/gif");

    private final Path manualDir;
    private final Path screenshotDir;
    private final Path validationDir;
    private final boolean withoutTestOutputs;
    private final Parser parser = Parser.builder().extensions(EXTENSIONS).build();
    private final HtmlRenderer renderer = HtmlRenderer.builder().extensions(EXTENSIONS).build();

    /** The option that builds the manual even when the tests have not written their outputs yet. */
    public static final String WITHOUT_TEST_OUTPUTS = "--without-test-outputs";

    public ManualBuilder(Path manualDir, Path screenshotDir, Path validationDir) {
        this(manualDir, screenshotDir, validationDir, false);
    }

    /**
     * @param withoutTestOutputs true to stand a line in for a screenshot or validation record the tests have
     *                           not written yet
     */
    public ManualBuilder(Path manualDir, Path screenshotDir, Path validationDir, boolean withoutTestOutputs) {
        this.manualDir = manualDir;
        this.screenshotDir = screenshotDir;
        this.validationDir = validationDir;
        this.withoutTestOutputs = withoutTestOutputs;
    }

    public static void main(String[] args) throws IOException {
        boolean lenient = args.length == 5 && WITHOUT_TEST_OUTPUTS.equals(args[4]);
        if (args.length != 4 && !lenient) {
            throw new IllegalArgumentException("usage: ManualBuilder MANUAL_DIR SCREENSHOT_DIR VALIDATION_DIR OUT.html"
                    + " [" + WITHOUT_TEST_OUTPUTS + "] (got " + args.length + " arguments)");
        }
        Path out = Path.of(args[3]);
        String html = new ManualBuilder(Path.of(args[0]), Path.of(args[1]), Path.of(args[2]), lenient).html();
        Files.createDirectories(out.toAbsolutePath().getParent());
        Files.writeString(out, html, StandardCharsets.UTF_8);
        if (!lenient) {
            // the copy for the jar is written quietly, as part of an ordinary package build
            System.out.println("manual written to " + out + " (" + html.length() / 1024 + " KiB)");
        }
    }

    /** The whole manual as one HTML document. */
    public String html() {
        ManualContents contents = ManualContents.read(manualDir);
        List<String> anchors = contents.chapters().stream().map(ManualContents.Chapter::anchor).toList();
        StringBuilder body = new StringBuilder();
        List<String> problems = new ArrayList<>();
        for (ManualContents.Chapter c : contents.chapters()) {
            String markdown = c.generated() ? validationChapter(c.title()) : read(manualDir.resolve(c.file()));
            Node doc = parser.parse(markdown);
            doc.accept(new Rewriter(c.file(), contents, problems));
            body.append("<section class=\"chapter\" id=\"").append(c.anchor()).append("\">\n")
                    .append(renderer.render(doc)).append("</section>\n");
        }
        if (!problems.isEmpty()) {
            throw new ManualBuildException("the manual cannot be built:\n  " + String.join("\n  ", problems));
        }
        StringBuilder toc = new StringBuilder("<nav class=\"contents\"><h2>Contents</h2><ol>\n");
        for (int i = 0; i < anchors.size(); i++) {
            toc.append("<li><a href=\"#").append(anchors.get(i)).append("\">")
                    .append(escape(contents.chapters().get(i).title())).append("</a></li>\n");
        }
        toc.append("</ol></nav>\n");
        return "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>"
                + escape(contents.title()) + "</title>\n<style>\n" + STYLE + "</style>\n</head>\n<body>\n<header><h1>"
                + escape(contents.title()) + "</h1></header>\n" + toc + body + "</body>\n</html>\n";
    }

    private String validationChapter(String title) {
        try {
            return ValidationChapter.markdown(title, ValidationChapter.read(validationDir));
        } catch (ManualBuildException e) {
            if (!withoutTestOutputs) {
                throw e;
            }
            return "# " + title + "\n\nThe test suite writes this chapter: every check against an outside value, "
                    + "with its source, the expected and computed values and the verdict. This copy of the manual "
                    + "was built without running the tests; `mvn -B verify` builds it with the record.\n";
        }
    }

    private static String read(Path file) {
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new ManualBuildException("cannot read " + file + ": " + e.getMessage(), e);
        }
    }

    /** Embeds images and turns links to other chapters into links inside the one file. */
    private final class Rewriter extends AbstractVisitor {
        private final String page;
        private final Map<String, String> chapterAnchors;
        private final List<String> problems;

        Rewriter(String page, ManualContents contents, List<String> problems) {
            this.page = page;
            this.chapterAnchors = contents.chapters().stream()
                    .collect(Collectors.toMap(ManualContents.Chapter::file, ManualContents.Chapter::anchor));
            this.problems = problems;
        }

        @Override
        public void visit(Image image) {
            String dest = image.getDestination();
            if (!dest.startsWith("data:")) {
                Path file = locate(dest);
                if (file == null && withoutTestOutputs) {
                    image.insertAfter(new org.commonmark.node.Text("[picture: " + altText(image) + "; the test "
                            + "suite draws it, and 'mvn -B verify' puts it here]"));
                    image.unlink();
                    return;
                } else if (file == null) {
                    problems.add(page + " references the image " + dest + ", which is neither at "
                            + manualDir.resolve(dest).normalize() + " nor in " + screenshotDir
                            + " (screenshots are written by the tests: run 'mvn -B verify')");
                } else {
                    image.setDestination(dataUri(file));
                }
            }
            visitChildren(image);
        }

        @Override
        public void visit(Link link) {
            String dest = link.getDestination();
            int hash = dest.indexOf('#');
            String file = hash < 0 ? dest : dest.substring(0, hash);
            if (chapterAnchors.containsKey(file)) {
                link.setDestination("#" + (hash < 0 ? chapterAnchors.get(file) : dest.substring(hash + 1)));
            }
            visitChildren(link);
        }
    }

    private static String altText(Image image) {
        StringBuilder sb = new StringBuilder();
        for (Node n = image.getFirstChild(); n != null; n = n.getNext()) {
            if (n instanceof org.commonmark.node.Text t) {
                sb.append(t.getLiteral());
            }
        }
        return sb.toString();
    }

    /** The image file: relative to the manual directory, else by its file name among the screenshots. */
    private Path locate(String dest) {
        Path relative = manualDir.resolve(dest).normalize();
        if (Files.isRegularFile(relative)) {
            return relative;
        }
        Path shot = screenshotDir.resolve(Path.of(dest).getFileName().toString());
        return Files.isRegularFile(shot) ? shot : null;
    }

    private static String dataUri(Path file) {
        String name = file.getFileName().toString();
        String ext = name.substring(name.lastIndexOf('.') + 1).toLowerCase(Locale.ROOT);
        String type = IMAGE_TYPES.get(ext);
        if (type == null) {
            throw new ManualBuildException("image " + file + ": type '" + ext + "' not supported; use one of "
                    + IMAGE_TYPES.keySet());
        }
        try {
            return "data:" + type + ";base64," + Base64.getEncoder().encodeToString(Files.readAllBytes(file));
        } catch (IOException e) {
            throw new ManualBuildException("cannot read image " + file + ": " + e.getMessage(), e);
        }
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private static final String STYLE = """
            body { font-family: system-ui, -apple-system, "Segoe UI", sans-serif; line-height: 1.5; color: #1d2329;
                   max-width: 60em; margin: 0 auto; padding: 1em 2em 4em; }
            header h1 { border-bottom: 2px solid #2b6a8f; padding-bottom: 0.3em; }
            h1 { font-size: 1.7em; margin-top: 2em; } h2 { font-size: 1.3em; margin-top: 1.5em; }
            nav.contents { background: #f3f6f8; padding: 0.5em 1.5em; border-radius: 4px; }
            section.chapter { border-top: 1px solid #d5dde3; margin-top: 2em; }
            code, pre { font-family: ui-monospace, "DejaVu Sans Mono", monospace; font-size: 0.92em; }
            pre { background: #f3f6f8; padding: 0.7em 1em; overflow-x: auto; border-radius: 4px; }
            table { border-collapse: collapse; margin: 1em 0; font-size: 0.92em; }
            th, td { border: 1px solid #c9d3db; padding: 0.3em 0.6em; vertical-align: top; }
            th { background: #e8eef2; }
            img { max-width: 100%; border: 1px solid #c9d3db; margin: 0.5em 0; }
            @media print { section.chapter { page-break-before: always; } nav.contents { page-break-after: always; } }
            """;
}
