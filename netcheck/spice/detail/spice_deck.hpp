// Reading a SPICE deck into logical lines: title, comments, continuations, inline comments and
// separators, by the SPICE3/ngspice deck rules. Private to the importer.
#pragma once

#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace netcheck::spice {

/// A malformed deck: the 1-based line and what is wrong. Caught by importSpice.
struct DeckError {
    int line = 0;
    std::string message;
};

/// One field of a line. `key` is set when the field is a parameter name followed by `=`.
struct Field {
    std::string text;
    bool key = false;
};

/// One logical line (continuations joined), comments removed.
struct DeckLine {
    enum class Type { Element, Command, Annotation };
    Type type = Type::Element;
    int line = 0;               ///< first physical line
    std::vector<Field> fields;  ///< separated by blanks , = ( )
    std::string rest;           ///< annotations: the text after the annotation word, trimmed
};

/// The deck: its title and its lines up to `.end`, with `.control` blocks left out.
struct Deck {
    std::string title;
    std::vector<DeckLine> lines;
    std::vector<std::pair<int, std::string>> notes;  ///< (line, remark) made while reading
};

/// Splits `text` into logical lines. The first line is always the title. Lines whose first
/// non-blank character is `*` are comments, except `*@word ...` annotations (our own). A `+` in
/// column 1 continues the previous non-comment line. `$ `, `//` and `;` start end-of-line comments.
/// Throws DeckError for a continuation with nothing to continue.
Deck readDeck(std::string_view text);

/// Splits a line body into fields at blanks and the separators , = ( ).
std::vector<Field> splitFields(std::string_view body);

/// Lower-case copy (ASCII): SPICE names compare case-insensitively.
std::string lower(std::string_view text);

/// Upper-case copy (ASCII).
std::string upper(std::string_view text);

}  // namespace netcheck::spice
