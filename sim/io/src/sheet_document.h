#pragma once
// Private to sim/io: a printable document as sections of paragraphs, lists and tables, and its
// two renderings, plain text (lines of at most about 100 characters) and self-contained HTML
// laid out for printing. The set-up sheets are built as one of these.
#include <string>
#include <vector>

namespace swarf::io::detail {

/// A table: a head row and body rows of plain text cells.
struct Table {
    std::vector<std::string> head;
    std::vector<std::vector<std::string>> rows;
};

/// A paragraph, a list (plain, numbered or of warnings) or a table.
struct Block {
    enum class Kind { Para, List, Numbered, Table, Warn } kind = Kind::Para;
    std::vector<std::string> lines; ///< Para: one line; lists: one entry per item
    Table table;                    ///< Table only
};

/// A titled section of blocks.
struct Section {
    std::string title;
    std::vector<Block> blocks;
};

/// The whole document.
struct Document {
    std::string title, subtitle;
    std::vector<Section> sections;
};

/// A paragraph block.
Block paragraph(std::string text);
/// A list block of the given kind (List, Numbered or Warn).
Block listBlock(std::vector<std::string> items, Block::Kind kind = Block::Kind::List);
/// A table block.
Block tableBlock(Table table);

/// Plain text: titles underlined, paragraphs wrapped at 98 columns, lists marked "- " (warnings
/// "! "), tables in aligned columns.
std::string renderText(const Document& doc);

/// One self-contained HTML page (inline CSS, no scripts), for A4 or Letter.
std::string renderHtml(const Document& doc);

} // namespace swarf::io::detail
