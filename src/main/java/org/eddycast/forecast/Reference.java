package org.eddycast.forecast;

/**
 * A published source: authors, year, title and where it appeared.
 *
 * @param authors for example "Fischer, List, Koh, Imberger & Brooks"
 * @param year    year of publication
 * @param title   title of the paper or book
 * @param where   journal with volume and first page, or publisher and chapter; may be empty
 */
public record Reference(String authors, int year, String title, String where) {

    public Reference {
        if (authors == null || authors.isBlank() || title == null || title.isBlank()) {
            throw new IllegalArgumentException("a reference needs authors and a title");
        }
        where = where == null ? "" : where;
    }

    /** "Authors year, Title, where". */
    public String cite() {
        return authors + " " + year + ", " + title + (where.isEmpty() ? "" : ", " + where);
    }

    @Override
    public String toString() {
        return cite();
    }
}
