package org.eddycast.docs;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The manual's table of contents, read from {@code manual/README.md}: its first heading is the title, and each
 * numbered list item {@code N. [Title](file.md)} is a chapter, in order. The chapter
 * {@value #GENERATED_CHAPTER} is not a file: the build generates it from the test suite's records.
 *
 * @param title    the manual's title
 * @param chapters the chapters in reading order
 */
public record ManualContents(String title, List<Chapter> chapters) {

    /** The chapter the build writes from {@code target/validation/}. */
    public static final String GENERATED_CHAPTER = "validation-record.md";

    private static final Pattern ITEM = Pattern.compile("^\\s*\\d+\\.\\s+\\[([^\\]]+)]\\(([^)#]+\\.md)\\)\\s*$");
    private static final Pattern TITLE = Pattern.compile("^#\\s+(.+)$");

    /**
     * One chapter.
     *
     * @param title its title in the contents
     * @param file  its Markdown file name, relative to the manual directory
     */
    public record Chapter(String title, String file) {

        /** The anchor of the chapter in the single HTML file: its file name without ".md". */
        public String anchor() {
            return file.substring(0, file.length() - ".md".length()).replaceAll("[^A-Za-z0-9-]", "-");
        }

        /** True for the chapter the build generates. */
        public boolean generated() {
            return GENERATED_CHAPTER.equals(file);
        }
    }

    public ManualContents {
        chapters = List.copyOf(chapters);
    }

    /** Reads the contents of the manual in the given directory; every listed chapter file must exist. */
    public static ManualContents read(Path manualDir) {
        Path readme = manualDir.resolve("README.md");
        List<String> lines;
        try {
            lines = Files.readAllLines(readme);
        } catch (IOException e) {
            throw new ManualBuildException("cannot read the manual's contents " + readme + ": " + e.getMessage(), e);
        }
        String title = "Manual";
        List<Chapter> chapters = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            Matcher t = TITLE.matcher(lines.get(i));
            if (t.matches() && chapters.isEmpty()) {
                title = t.group(1).trim();
            }
            Matcher m = ITEM.matcher(lines.get(i));
            if (m.matches()) {
                Chapter c = new Chapter(m.group(1).trim(), m.group(2).trim());
                if (!c.generated() && !Files.isRegularFile(manualDir.resolve(c.file()))) {
                    throw new ManualBuildException(readme + " line " + (i + 1) + ": chapter file " + c.file()
                            + " does not exist in " + manualDir);
                }
                chapters.add(c);
            }
        }
        if (chapters.isEmpty()) {
            throw new ManualBuildException(readme + " lists no chapters: expected lines like '1. [Title](file.md)'");
        }
        return new ManualContents(title, chapters);
    }
}
