package org.mobident;

/**
 * The one checked error of the engine: something in a user's file or setting cannot be used.
 * It always says where: the file, the line (1-based; 0 when the problem is not tied to a line)
 * and the field (column or option name; {@code null} when not tied to a field).
 */
public class InputException extends Exception {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final long line;
    private final String field;
    private final String problem;

    public InputException(String file, long line, String field, String problem) {
        this(file, line, field, problem, null);
    }

    public InputException(String file, long line, String field, String problem, Throwable cause) {
        super(format(file, line, field, problem), cause);
        this.file = file;
        this.line = line;
        this.field = field;
        this.problem = problem;
    }

    /** The file (as the user named it) or a label such as {@code "options"}. */
    public String file() {
        return file;
    }

    /** 1-based line number, or 0 when the problem concerns the whole file. */
    public long line() {
        return line;
    }

    /** Column or option name, or {@code null}. */
    public String field() {
        return field;
    }

    /** The problem alone, without the location. */
    public String problem() {
        return problem;
    }

    private static String format(String file, long line, String field, String problem) {
        StringBuilder sb = new StringBuilder();
        sb.append(file == null ? "(input)" : file);
        if (line > 0) {
            sb.append(", line ").append(line);
        }
        if (field != null && !field.isEmpty()) {
            sb.append(", field '").append(field).append('\'');
        }
        sb.append(": ").append(problem);
        return sb.toString();
    }
}
