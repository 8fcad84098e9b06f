package org.wurtzkit.materials.data;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A small line-annotated tree built from the token stream of Jackson's {@link JsonParser} (the
 * parsing itself is Jackson's). Keeping the line of every key and value lets the validator of
 * {@link JsonParameterSetReader} report the line of any problem, and building the whole tree first
 * lets every message name the set even when the {@code "name"} key comes late in the file.
 */
final class JsonTree {
    private JsonTree() {
    }

    /** A JSON value with the line on which it starts. */
    sealed interface Node permits Obj, Arr, Str, Num, Other {
        /** {@return 1-based line on which the value starts} */
        int line();

        /** {@return a short description for messages, e.g. "the string \"abc\""} */
        String describe();
    }

    /** One key of an object, with the line of the key itself. */
    record Member(String key, int line, Node value) {
    }

    /** A JSON object; members in file order. */
    static final class Obj implements Node {
        private final int line;
        private final Map<String, Member> members = new LinkedHashMap<>();

        Obj(int line) {
            this.line = line;
        }

        @Override
        public int line() {
            return line;
        }

        /** {@return members in file order (unmodifiable)} */
        Map<String, Member> members() {
            return Collections.unmodifiableMap(members);
        }

        /** {@return the member, or null} */
        Member get(String key) {
            return members.get(key);
        }

        @Override
        public String describe() {
            return "an object";
        }
    }

    /** A JSON array. */
    record Arr(List<Node> elements, int line) implements Node {
        @Override
        public String describe() {
            return "an array";
        }
    }

    /** A JSON string. */
    record Str(String text, int line) implements Node {
        @Override
        public String describe() {
            return "the string \"" + text + "\"";
        }
    }

    /** A JSON number, with its text as written. */
    record Num(double value, String text, int line) implements Node {
        @Override
        public String describe() {
            return "the number " + text;
        }
    }

    /** true, false or null. */
    record Other(String text, int line) implements Node {
        @Override
        public String describe() {
            return "the literal " + text;
        }
    }

    /** A key that occurs twice in one object (reported after the tree is built, when the set name is known). */
    record Duplicate(String path, int line, int firstLine) {
    }

    /** A syntax failure of the token stream (malformed or truncated JSON). */
    static final class SyntaxFailure extends Exception {
        private static final long serialVersionUID = 1L;
        private final transient Obj partialRoot;
        private final String path;
        private final int line;
        private final String problem;

        SyntaxFailure(Obj partialRoot, String path, int line, String problem, Throwable cause) {
            super(problem, cause);
            this.partialRoot = partialRoot;
            this.path = path;
            this.line = line;
            this.problem = problem;
        }

        Obj partialRoot() {
            return partialRoot;
        }

        String path() {
            return path;
        }

        int line() {
            return line;
        }

        String problem() {
            return problem;
        }
    }

    /** The result: the root value and the first duplicated key, if any. */
    record Parsed(Node root, Duplicate firstDuplicate) {
    }

    /**
     * Reads one JSON document into a tree.
     *
     * @param parser a parser positioned before the first token
     * @return the tree
     * @throws SyntaxFailure on malformed, truncated or trailing content
     * @throws IOException   on an I/O failure of the underlying stream
     */
    static Parsed read(JsonParser parser) throws SyntaxFailure, IOException {
        TreeBuilder b = new TreeBuilder(parser);
        return b.document();
    }

    /** Dotted path of keys, for messages. */
    static String path(Deque<String> stack) {
        if (stack.isEmpty()) {
            return "(root)";
        }
        List<String> parts = new ArrayList<>(stack);
        Collections.reverse(parts);
        return String.join(".", parts);
    }

    private static final class TreeBuilder {
        private final JsonParser p;
        private final Deque<String> stack = new ArrayDeque<>();
        private Obj root;
        private Duplicate firstDuplicate;
        private int values;

        TreeBuilder(JsonParser p) {
            this.p = p;
        }

        Parsed document() throws SyntaxFailure, IOException {
            try {
                JsonToken t = p.nextToken();
                if (t == null) {
                    throw new SyntaxFailure(null, "(root)", Math.max(1, lineNow()), "the file is empty", null);
                }
                Node n = value(t);
                JsonToken extra = p.nextToken();
                if (extra != null) {
                    throw new SyntaxFailure(root, "(root)", tokenLine(),
                            "unexpected content after the end of the top-level value", null);
                }
                return new Parsed(n, firstDuplicate);
            } catch (StreamConstraintsException e) {
                throw new SyntaxFailure(root, path(stack), Math.max(1, lineNow()), String.format(Locale.ROOT,
                        "the file exceeds the reader's limits (at most %d bytes, strings and nesting within them): %s",
                        JsonParameterSetReader.MAX_FILE_BYTES, e.getOriginalMessage().replace('\n', ' ')), e);
            } catch (JsonProcessingException e) {
                JsonLocation loc = e.getLocation();
                int line = loc != null && loc.getLineNr() > 0 ? loc.getLineNr() : Math.max(1, lineNow());
                throw new SyntaxFailure(root, path(stack), line,
                        "malformed JSON (" + e.getOriginalMessage().replace('\n', ' ') + ")", e);
            }
        }

        private int tokenLine() {
            JsonLocation l = p.currentTokenLocation();
            return l == null ? 0 : l.getLineNr();
        }

        private int lineNow() {
            JsonLocation l = p.currentLocation();
            return l == null ? 0 : l.getLineNr();
        }

        private Node value(JsonToken t) throws IOException, SyntaxFailure {
            int line = tokenLine();
            if (++values > JsonParameterSetReader.MAX_JSON_VALUES) {
                throw new SyntaxFailure(root, path(stack), line, String.format(Locale.ROOT,
                        "the file holds more than %d JSON values (a built-in parameter set has under 500)",
                        JsonParameterSetReader.MAX_JSON_VALUES), null);
            }
            switch (t) {
                case START_OBJECT:
                    return object(line);
                case START_ARRAY: {
                    List<Node> elements = new ArrayList<>();
                    JsonToken e;
                    int i = 0;
                    while ((e = p.nextToken()) != JsonToken.END_ARRAY) {
                        if (e == null) {
                            throw new SyntaxFailure(root, path(stack), Math.max(1, lineNow()),
                                    "the file ends inside an array", null);
                        }
                        stack.push("[" + i++ + "]");
                        elements.add(value(e));
                        stack.pop();
                    }
                    return new Arr(List.copyOf(elements), line);
                }
                case VALUE_STRING:
                    return new Str(p.getText(), line);
                case VALUE_NUMBER_INT:
                case VALUE_NUMBER_FLOAT:
                    return new Num(p.getDoubleValue(), p.getText(), line);
                case VALUE_TRUE:
                case VALUE_FALSE:
                case VALUE_NULL:
                    return new Other(p.getText(), line);
                default:
                    throw new SyntaxFailure(root, path(stack), line, "unexpected token " + t, null);
            }
        }

        private Obj object(int line) throws IOException, SyntaxFailure {
            Obj o = new Obj(line);
            if (root == null) {
                root = o;
            }
            JsonToken t;
            while ((t = p.nextToken()) != JsonToken.END_OBJECT) {
                if (t == null) {
                    throw new SyntaxFailure(root, path(stack), Math.max(1, lineNow()),
                            "the file ends inside an object (truncated file?)", null);
                }
                // Jackson guarantees FIELD_NAME here for well-formed input and throws otherwise
                String key = p.currentName();
                int keyLine = tokenLine();
                stack.push(key);
                JsonToken v = p.nextToken();
                if (v == null) {
                    throw new SyntaxFailure(root, path(stack), Math.max(1, lineNow()),
                            "the file ends after a key, before its value (truncated file?)", null);
                }
                Node value = value(v);
                Member old = o.members.get(key);
                if (old != null) {
                    if (firstDuplicate == null) {
                        firstDuplicate = new Duplicate(path(stack), keyLine, old.line());
                    }
                } else {
                    o.members.put(key, new Member(key, keyLine, value));
                }
                stack.pop();
            }
            return o;
        }
    }
}
