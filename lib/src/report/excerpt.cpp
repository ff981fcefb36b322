// Layout of the excerpt, for example:
//
//     NPSH_a = p_atm/(ρ_w*{g_n}) + (z_cw - z_pump) - h_fs - p_vap
//              └───────a───────┘   └──────b──────┘   └c─┘   ╘═d═╛
//     a  [L]             length
//     ...
//   ▶ d  [M L^-1 T^-2]   pressure or stress   ◀ does not match
//
// The term the finding is about gets a double brace and a ▶ row, so it stands out without
// colour. Terms too narrow for their key carry a tick and the key on a line of its own below.
#include "report/excerpt.hpp"

#include "report/display_line.hpp"

#include <algorithm>
#include <fmt/format.h>

namespace plumb {
namespace {

// Lines wider than this are shown as a window around the finding.
constexpr std::uint32_t max_shown_columns = 140;
// Cells of context kept left of the finding in such a window.
constexpr std::uint32_t window_lead = 40;
constexpr std::string_view indent = "    ";
constexpr std::size_t longest_quoted_term = 40;

struct mark {
    std::uint32_t first = 0; // display cells [first, last) of the line
    std::uint32_t last = 0;
    bool on_line = false;      // on the excerpt's line (else only in the ledger)
    bool visible = false;      // within the shown window
    bool heavy = false;        // the place the finding is about
    std::string key;           // empty: no ledger row
    std::size_t key_index = 0; // the ledger's order
    const term* t = nullptr;   // null for a primary range that no term covers
    std::uint32_t row = 0;     // brace row, once placed
    bool key_below = false;    // the brace is too narrow to hold the key
};

struct glyphs {
    std::string_view left, fill, right, single;
};
constexpr glyphs light{"\u2514", "\u2500", "\u2518", "\u2502"}; // └ ─ ┘ │
constexpr glyphs heavy{"\u2558", "\u2550", "\u255B", "\u2551"}; // ╘ ═ ╛ ║

// a..z, then A..Z, then a1, b1...: a sum with many odd terms still gets distinct keys.
std::string key_for(std::size_t i) {
    constexpr std::size_t letters = 26;
    if (i < letters)
        return std::string(1, static_cast<char>('a' + i));
    if (i < 2 * letters)
        return std::string(1, static_cast<char>('A' + (i - letters)));
    return fmt::format("{}{}", static_cast<char>('a' + i % letters), i / letters - 1);
}

bool same_place(const location& a, const location& b) {
    return a.file == b.file && a.range.begin == b.range.begin && a.range.end == b.range.end;
}

// Byte where the line's trailing comment starts, or npos; a '#' inside a quoted description
// starts none.
std::size_t comment_start(std::string_view line) {
    bool quoted = false;
    for (std::size_t i = 0; i < line.size(); ++i) {
        if (line[i] == '"')
            quoted = !quoted;
        else if (line[i] == '#' && !quoted)
            return i;
    }
    return std::string_view::npos;
}

// A line laid out once for all the findings on it: a generated line may carry thousands,
// and laying it out (or scanning it for its comment or a cell) for each would make the
// report quadratic in the line's length.
struct laid_out_line {
    std::uint64_t file_serial = 0;
    std::uint32_t line = 0;
    display_line shown;
    std::vector<std::uint32_t> byte_of_cell; // in shown.text, per display cell, and its end
    std::size_t comment = std::string_view::npos;

    // The byte of shown.text where `cell` starts; its end when the text is shorter.
    [[nodiscard]] std::size_t byte_at(std::uint32_t cell) const {
        return cell < byte_of_cell.size() ? byte_of_cell[cell] : shown.text.size();
    }
};

// The layout of one line, kept for the next finding on the same thread; valid until the next
// call.
const laid_out_line& laid_out(const source_file& file, std::uint32_t line) {
    thread_local laid_out_line cached;
    if (cached.file_serial == file.serial() && cached.line == line)
        return cached;
    const std::string_view whole = file.line_text(line);
    cached.file_serial = file.serial();
    cached.line = line;
    cached.shown = layout(whole);
    cached.comment = comment_start(whole);
    cached.byte_of_cell.clear();
    const std::string& text = cached.shown.text;
    for (std::size_t i = 0; i < text.size(); ++i)
        if (starts_a_cell(text, i))
            cached.byte_of_cell.push_back(static_cast<std::uint32_t>(i));
    cached.byte_of_cell.push_back(static_cast<std::uint32_t>(text.size()));
    return cached;
}

std::string padded(std::string_view text, std::uint32_t cells) {
    std::string out(text);
    const std::uint32_t have = cell_count(text);
    if (have < cells)
        out.append(cells - have, ' ');
    return out;
}

std::string shortened(std::string_view text) {
    if (text.size() <= longest_quoted_term)
        return std::string(text);
    std::size_t cut = longest_quoted_term;
    while (cut > 0 && (static_cast<unsigned char>(text[cut]) & 0xC0) == 0x80)
        --cut;
    return std::string(text.substr(0, cut)) + "\u2026";
}

// One line of drawing, cell by cell, with a colour per cell.
struct canvas_line {
    std::vector<std::string_view> glyph;
    std::vector<std::string_view> colour;

    explicit canvas_line(std::size_t width) : glyph(width, " "), colour(width) {}

    [[nodiscard]] bool free(std::uint32_t from, std::uint32_t to) const {
        for (std::uint32_t c = from; c < to && c < glyph.size(); ++c)
            if (glyph[c] != " ")
                return false;
        return true;
    }
    void put(std::uint32_t cell, std::string_view g, std::string_view c) {
        if (cell >= glyph.size()) {
            glyph.resize(cell + 1, " ");
            colour.resize(cell + 1);
        }
        glyph[cell] = g;
        colour[cell] = c;
    }
    [[nodiscard]] std::string render(const palette::painter& paint) const {
        std::size_t end = glyph.size();
        while (end > 0 && glyph[end - 1] == " ")
            --end;
        std::string out;
        for (std::size_t i = 0; i < end;) {
            std::size_t j = i;
            std::string run;
            while (j < end && colour[j] == colour[i])
                run += glyph[j++];
            out += colour[i].empty() ? run : paint(colour[i], run);
            i = j;
        }
        return out;
    }
};

// A brace row and, when a narrow brace needs it, the line of keys below it.
struct row_block {
    canvas_line braces;
    canvas_line keys;
    bool has_keys = false;
    explicit row_block(std::size_t width) : braces(width), keys(width) {}
};

class excerpt {
  public:
    excerpt(const diagnostic& d, const palette::painter& paint)
        : d_(d), paint_(paint), file_(*d.where.file),
          line_number_(file_.position(d.where.range.begin).line),
          line_begin_(file_.line_start(line_number_)) {}

    void render(std::string& out) {
        collect_marks();
        cut_line();
        choose_window();
        assign_keys();
        place();
        draw(out);
        ledger(out);
    }

  private:
    const diagnostic& d_;
    const palette::painter& paint_;
    const source_file& file_;
    std::uint32_t line_number_;
    std::uint32_t line_begin_;
    std::string_view line_;
    const laid_out_line* laid_ = nullptr;
    const display_line* shown_ = nullptr;
    std::vector<mark> marks_;
    std::uint32_t first_cell_ = 0;
    std::uint32_t last_cell_ = 0;
    bool cut_left_ = false;
    bool cut_right_ = false;
    std::vector<row_block> rows_;

    [[nodiscard]] bool on_this_line(const location& where) const {
        return where.file == &file_ && file_.position(where.range.begin).line == line_number_;
    }
    [[nodiscard]] std::size_t to_line(std::uint32_t offset) const {
        return std::min<std::size_t>(offset > line_begin_ ? offset - line_begin_ : 0,
                                     file_.line_text(line_number_).size());
    }

    void collect_marks() {
        const bool any_differs =
            std::any_of(d_.terms.begin(), d_.terms.end(), [](const term& t) { return t.differs; });
        bool primary_covered = false;
        for (const auto& t : d_.terms) {
            mark m;
            m.t = &t;
            const bool primary = same_place(t.where, d_.where);
            primary_covered = primary_covered || primary;
            m.heavy = t.differs || (!any_differs && primary);
            m.on_line = on_this_line(t.where);
            marks_.push_back(m);
        }
        if (!primary_covered) {
            mark m;
            m.heavy = true;
            m.on_line = true;
            marks_.push_back(m);
        }
    }

    [[nodiscard]] span range_of(const mark& m) const {
        return m.t ? m.t->where.range : d_.where.range;
    }

    // Cells come from the whole line; the text shown stops before a trailing comment (unless a
    // term reaches into it) and its trailing blanks. A mark that starts at the comment (a syntax
    // error: something was expected before it) stays where it is, over blank cells.
    void cut_line() {
        const std::string_view whole = file_.line_text(line_number_);
        laid_ = &laid_out(file_, line_number_);
        shown_ = &laid_->shown;
        line_ = whole;
        bool into_comment = false;
        const std::size_t hash = laid_->comment;
        for (auto& m : marks_) {
            if (!m.on_line)
                continue;
            const span r = range_of(m);
            const std::size_t b = to_line(r.begin);
            const std::size_t e = to_line(r.end);
            into_comment = into_comment || (hash != std::string_view::npos && b > hash) ||
                           (hash != std::string_view::npos && b < hash && e > hash);
            m.first = shown_->cell[b];
            m.last = std::max(shown_->cell[std::max(b, e)], m.first + 1);
        }
        if (hash != std::string_view::npos && !into_comment)
            line_ = whole.substr(0, hash);
        while (!line_.empty() &&
               (line_.back() == ' ' || line_.back() == '\t' || line_.back() == '\r'))
            line_.remove_suffix(1);
    }

    void choose_window() {
        const std::uint32_t width = shown_->cell[line_.size()]; // of the text shown
        std::uint32_t extent = width;
        std::uint32_t leftmost = width;
        for (const auto& m : marks_)
            if (m.on_line) {
                extent = std::max(extent, m.last);
                leftmost = std::min(leftmost, m.first);
            }
        if (extent > max_shown_columns) {
            const std::uint32_t focus = first_cell_of_primary();
            first_cell_ = focus > window_lead ? focus - window_lead : 0;
            last_cell_ = std::min(extent, first_cell_ + max_shown_columns);
            cut_left_ = first_cell_ > 0;
            cut_right_ = last_cell_ < width;
        } else {
            // Indentation in the file says nothing here: the excerpt has its own.
            std::uint32_t blank = 0;
            while (blank < shown_->text.size() && shown_->text[blank] == ' ')
                ++blank;
            first_cell_ = std::min(blank, leftmost);
            last_cell_ = extent;
        }
        for (auto& m : marks_) {
            m.visible = m.on_line && m.first >= first_cell_ && m.last <= last_cell_;
            // The term the finding is about always keeps its marker: one wider than the window
            // is drawn to the window's edge rather than dropped.
            if (m.on_line && !m.visible && is_primary(m) && m.first >= first_cell_ &&
                m.first < last_cell_) {
                m.last = last_cell_;
                m.visible = true;
            }
        }
    }

    [[nodiscard]] bool is_primary(const mark& m) const {
        return m.t == nullptr || same_place(m.t->where, d_.where);
    }

    [[nodiscard]] std::uint32_t first_cell_of_primary() const {
        for (const auto& m : marks_)
            if (m.on_line && is_primary(m))
                return m.first;
        return shown_->cell[to_line(d_.where.range.begin)];
    }

    // Keys run left to right along the line, then the terms shown only in the ledger.
    void assign_keys() {
        std::vector<mark*> order;
        for (auto& m : marks_)
            if (m.t != nullptr || !d_.mark_label.empty())
                order.push_back(&m);
        std::stable_sort(order.begin(), order.end(), [](const mark* a, const mark* b) {
            if (a->visible != b->visible)
                return a->visible;
            if (!a->visible)
                return false;
            return a->first != b->first ? a->first < b->first : a->last > b->last;
        });
        for (std::size_t i = 0; i < order.size(); ++i) {
            order[i]->key = key_for(i);
            order[i]->key_index = i;
        }
    }

    [[nodiscard]] std::uint32_t column(std::uint32_t cell) const {
        return cell - first_cell_ + (cut_left_ ? 1 : 0);
    }

    // Inner terms sit nearest the formula, the braces around them further down.
    void place() {
        std::vector<mark*> order;
        for (auto& m : marks_)
            if (m.visible)
                order.push_back(&m);
        std::stable_sort(order.begin(), order.end(), [](const mark* a, const mark* b) {
            const std::uint32_t wa = a->last - a->first;
            const std::uint32_t wb = b->last - b->first;
            return wa != wb ? wa < wb : a->first < b->first;
        });
        const std::size_t width = column(last_cell_) + 1;
        for (mark* m : order) {
            const std::uint32_t from = column(m->first);
            const std::uint32_t to = column(m->last);
            const auto key_cells = static_cast<std::uint32_t>(m->key.size());
            m->key_below = !m->key.empty() && to - from < key_cells + 2;
            std::size_t r = 0;
            for (;; ++r) {
                if (r == rows_.size())
                    rows_.emplace_back(width);
                row_block& row = rows_[r];
                // A key below keeps a blank cell from its neighbours, so "ab" never reads as
                // one key.
                const bool keys_fit =
                    !m->key_below || row.keys.free(from > 0 ? from - 1 : 0, from + key_cells + 1);
                if (row.braces.free(from, to) && keys_fit)
                    break;
            }
            m->row = static_cast<std::uint32_t>(r);
            draw_brace(*m, rows_[r], from, to);
        }
    }

    void draw_brace(const mark& m, row_block& row, std::uint32_t from, std::uint32_t to) {
        const glyphs& g = m.heavy ? heavy : light;
        const std::string_view colour = m.heavy ? palette::odd_term : palette::term;
        const std::uint32_t w = to - from;
        if (w == 1) {
            row.braces.put(from, g.single, colour);
        } else {
            for (std::uint32_t c = from; c < to; ++c)
                row.braces.put(c, c == from ? g.left : c + 1 == to ? g.right : g.fill, colour);
        }
        if (m.key.empty())
            return;
        if (m.key_below) {
            for (std::size_t i = 0; i < m.key.size(); ++i)
                row.keys.put(from + static_cast<std::uint32_t>(i),
                             std::string_view(m.key).substr(i, 1), colour);
            row.has_keys = true;
            return;
        }
        const std::uint32_t inner = w - 2;
        const auto key_cells = static_cast<std::uint32_t>(m.key.size());
        const std::uint32_t at = from + 1 + (inner - key_cells) / 2;
        for (std::size_t i = 0; i < m.key.size(); ++i)
            row.braces.put(at + static_cast<std::uint32_t>(i), std::string_view(m.key).substr(i, 1),
                           colour);
    }

    void draw(std::string& out) const {
        const std::size_t b = laid_->byte_at(first_cell_);
        const std::size_t e = laid_->byte_at(std::min(last_cell_, shown_->cell[line_.size()]));
        out += fmt::format("{}{}{}{}\n", indent, cut_left_ ? "\u2026" : "",
                           std::string_view(shown_->text).substr(b, e - b),
                           cut_right_ ? "\u2026" : "");
        for (const auto& row : rows_) {
            const std::string braces = row.braces.render(paint_);
            if (!braces.empty())
                out += fmt::format("{}{}\n", indent, braces);
            if (row.has_keys)
                out += fmt::format("{}{}\n", indent, row.keys.render(paint_));
        }
    }

    // Where a term that has no brace in the excerpt stands.
    [[nodiscard]] std::string whereabouts(const mark& m) const {
        const std::string text = fmt::format("'{}'", shortened(m.t->text));
        if (m.on_line)
            return fmt::format("{}, beyond the part shown", text);
        if (m.t->where.file == nullptr)
            return text;
        const line_column p = m.t->where.file->position(m.t->where.range.begin);
        if (m.t->where.file == &file_)
            return fmt::format("at line {}: {}", p.line, text);
        return fmt::format("at {}:{}: {}", m.t->where.file->path(), p.line, text);
    }

    void ledger(std::string& out) const {
        std::vector<const mark*> rows;
        for (const auto& m : marks_)
            if (!m.key.empty())
                rows.push_back(&m);
        std::sort(rows.begin(), rows.end(),
                  [](const mark* a, const mark* b) { return a->key_index < b->key_index; });
        std::uint32_t key_width = 0, dim_width = 0, name_width = 0;
        for (const mark* m : rows) {
            key_width = std::max(key_width, cell_count(m->key));
            if (m->t != nullptr) {
                dim_width = std::max(dim_width, cell_count(m->t->dim.to_string()));
                name_width = std::max(name_width, cell_count(quantity_name(m->t->dim)));
            }
        }
        for (const mark* m : rows) {
            std::string body;
            if (m->t == nullptr) {
                body = d_.mark_label;
            } else {
                const std::string dim = padded(m->t->dim.to_string(), dim_width);
                body = m->heavy ? dim : paint_(palette::term, dim);
                body += "  " + padded(quantity_name(m->t->dim), name_width);
                if (!m->visible)
                    body += "  " + whereabouts(*m);
                if (m->t->differs)
                    body += "  \u25C0 does not match";
            }
            while (!body.empty() && body.back() == ' ')
                body.pop_back();
            const std::string row = fmt::format("{}  {}", padded(m->key, key_width), body);
            if (m->heavy)
                out += fmt::format("  {}\n", paint_(palette::odd_term, "\u25B6 " + row));
            else
                out += fmt::format("{}{}\n", indent, row);
        }
    }
};

} // namespace

void render_excerpt(std::string& out, const diagnostic& d, const palette::painter& paint) {
    excerpt(d, paint).render(out);
}

} // namespace plumb
