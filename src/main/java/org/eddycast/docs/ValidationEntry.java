package org.eddycast.docs;

/**
 * One check of the tool against a value from outside the project, as the test suite recorded it: what was
 * checked, where the expected value comes from, the tool's estimate with its own interval (when it has one), the
 * range the test accepts, and the verdict. Written by the tests to {@code target/validation/} and read by
 * {@link ValidationChapter}; never typed by hand.
 *
 * @param check       what was checked, in words
 * @param source      where the expected value comes from (author, year, title; or "derived", "from memory",
 *                    "common practice" as the test says)
 * @param expected    the outside value
 * @param estimate    the tool's value
 * @param estimateLow low end of the estimate's 95% interval, or null for a deterministic value
 * @param estimateHigh high end of the estimate's 95% interval, or null for a deterministic value
 * @param acceptLow   the lowest estimate the test accepts
 * @param acceptHigh  the highest estimate the test accepts
 * @param criterion   how the accepted range was derived, in words
 * @param passed      the test's verdict
 * @param recordedBy  the test class and method that recorded it
 */
public record ValidationEntry(String check, String source, double expected, double estimate, Double estimateLow,
                              Double estimateHigh, double acceptLow, double acceptHigh, String criterion,
                              boolean passed, String recordedBy) {

    public ValidationEntry {
        if (check == null || check.isBlank()) {
            throw new IllegalArgumentException("validation entry: check must name what was checked");
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("validation entry '" + check + "': source must not be empty");
        }
        if ((estimateLow == null) != (estimateHigh == null)) {
            throw new IllegalArgumentException("validation entry '" + check
                    + "': give both ends of the estimate's interval or neither");
        }
    }
}
