package org.baywright.calc;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * The small formula language of calculation sheets: numbers, symbols, {@code + − · / ^}, postfix
 * {@code ² ³ ⁴}, parentheses and brackets, {@code √(…)}, {@code min(…, …)}, {@code max(…, …)} and
 * {@code π}. Multiplication is always written {@code ·}.
 *
 * <p>It serves two purposes: printing the substituted line of a sheet (each symbol replaced by its
 * value and unit), and checking, in tests, that the formula printed evaluates to the value the
 * engine computed with the same inputs, so that the printed formula is the executed one.
 */
public final class Formula {
    private Formula() {
    }

    /** A token of a formula. */
    public record Token(Type type, String text, double number) {
    }

    /** Token types. */
    public enum Type {
        NUMBER, SYMBOL, OP, OPEN, CLOSE, COMMA, POWER2, POWER3, POWER4, ROOT, SPACE
    }

    /** Splits a formula into tokens; white space is kept so the text can be rebuilt. */
    public static List<Token> tokenize(String f) {
        List<Token> out = new ArrayList<>();
        int i = 0;
        while (i < f.length()) {
            char c = f.charAt(i);
            if (Character.isWhitespace(c)) {
                int j = i;
                while (j < f.length() && Character.isWhitespace(f.charAt(j))) {
                    j++;
                }
                out.add(new Token(Type.SPACE, f.substring(i, j), 0));
                i = j;
            } else if (Character.isDigit(c) || (c == '.' && i + 1 < f.length() && Character.isDigit(f.charAt(i + 1)))) {
                int j = i;
                while (j < f.length() && (Character.isDigit(f.charAt(j)) || f.charAt(j) == '.')) {
                    j++;
                }
                String s = f.substring(i, j);
                out.add(new Token(Type.NUMBER, s, Double.parseDouble(s)));
                i = j;
            } else if (Character.isLetter(c)) {
                int j = i + 1;
                while (j < f.length() && (Character.isLetterOrDigit(f.charAt(j)) || f.charAt(j) == '_' || f.charAt(j) == '′')) {
                    j++;
                }
                out.add(new Token(Type.SYMBOL, f.substring(i, j), 0));
                i = j;
            } else {
                Type t = switch (c) {
                    case '+', '-', '−', '·', '*', '/', '^' -> Type.OP;
                    case '(', '[' -> Type.OPEN;
                    case ')', ']' -> Type.CLOSE;
                    case ',' -> Type.COMMA;
                    case '²' -> Type.POWER2;
                    case '³' -> Type.POWER3;
                    case '⁴' -> Type.POWER4;
                    case '√' -> Type.ROOT;
                    default -> throw new IllegalArgumentException("formula \"" + f + "\": unexpected character '" + c + "'");
                };
                out.add(new Token(t, String.valueOf(c), 0));
                i++;
            }
        }
        return out;
    }

    /** Evaluates a formula with the given symbol values. */
    public static double evaluate(String formula, Map<String, Double> values) {
        Parser p = new Parser(formula, tokenize(formula).stream().filter(t -> t.type() != Type.SPACE).toList(),
                name -> {
                    Double v = values.get(name);
                    if (v != null) {
                        return v;
                    }
                    if (name.equals("π")) {
                        return Math.PI;
                    }
                    throw new IllegalArgumentException("formula \"" + formula + "\": no value for symbol " + name);
                });
        double v = p.expr();
        if (p.pos != p.tokens.size()) {
            throw new IllegalArgumentException("formula \"" + formula + "\": unexpected " + p.tokens.get(p.pos).text());
        }
        return v;
    }

    /** Rebuilds the formula text with each symbol replaced by {@code render.apply(symbol)} when not null. */
    public static String substitute(String formula, Function<String, String> render) {
        StringBuilder sb = new StringBuilder();
        for (Token t : tokenize(formula)) {
            if (t.type() == Type.SYMBOL) {
                String r = render.apply(t.text());
                sb.append(r != null ? r : t.text());
            } else if (t.type() == Type.OP && !t.text().equals("^")) {
                sb.append(' ').append(t.text().equals("-") ? "−" : t.text()).append(' ');
            } else {
                sb.append(t.text());
            }
        }
        return sb.toString().replaceAll(" {2,}", " ").replace("( ", "(").trim();
    }

    private static final class Parser {
        final String src;
        final List<Token> tokens;
        final Function<String, Double> lookup;
        int pos;

        Parser(String src, List<Token> tokens, Function<String, Double> lookup) {
            this.src = src;
            this.tokens = tokens;
            this.lookup = lookup;
        }

        Token peek() {
            return pos < tokens.size() ? tokens.get(pos) : null;
        }

        boolean isOp(String... ops) {
            Token t = peek();
            if (t == null || t.type() != Type.OP) {
                return false;
            }
            for (String o : ops) {
                if (t.text().equals(o)) {
                    return true;
                }
            }
            return false;
        }

        double expr() {
            double v = term();
            while (isOp("+", "-", "−")) {
                String op = tokens.get(pos++).text();
                double r = term();
                v = op.equals("+") ? v + r : v - r;
            }
            return v;
        }

        double term() {
            double v = unary();
            while (isOp("·", "*", "/")) {
                String op = tokens.get(pos++).text();
                double r = unary();
                v = op.equals("/") ? v / r : v * r;
            }
            return v;
        }

        double unary() {
            if (isOp("-", "−")) {
                pos++;
                return -unary();
            }
            return power();
        }

        double power() {
            double b = postfix();
            if (isOp("^")) {
                pos++;
                return Math.pow(b, unary());
            }
            return b;
        }

        double postfix() {
            double v = primary();
            while (peek() != null) {
                Type t = peek().type();
                if (t == Type.POWER2) {
                    v = v * v;
                } else if (t == Type.POWER3) {
                    v = v * v * v;
                } else if (t == Type.POWER4) {
                    v = v * v * v * v;
                } else {
                    break;
                }
                pos++;
            }
            return v;
        }

        double primary() {
            Token t = peek();
            if (t == null) {
                throw new IllegalArgumentException("formula \"" + src + "\" ends too early");
            }
            pos++;
            switch (t.type()) {
                case NUMBER:
                    return t.number();
                case ROOT:
                    return Math.sqrt(primary());
                case OPEN: {
                    double v = expr();
                    expect(Type.CLOSE);
                    return v;
                }
                case SYMBOL: {
                    Token n = peek();
                    if ((t.text().equals("min") || t.text().equals("max")) && n != null && n.type() == Type.OPEN) {
                        pos++;
                        double v = expr();
                        while (peek() != null && peek().type() == Type.COMMA) {
                            pos++;
                            double w = expr();
                            v = t.text().equals("min") ? Math.min(v, w) : Math.max(v, w);
                        }
                        expect(Type.CLOSE);
                        return v;
                    }
                    return lookup.apply(t.text());
                }
                default:
                    throw new IllegalArgumentException("formula \"" + src + "\": unexpected " + t.text());
            }
        }

        void expect(Type type) {
            Token t = peek();
            if (t == null || t.type() != type) {
                throw new IllegalArgumentException("formula \"" + src + "\": expected " + type + " at token " + pos);
            }
            pos++;
        }
    }
}
