// SARIF 2.1.0 (OASIS Standard, with errata 01) for code-scanning services: one run, the rules
// as reportingDescriptors, a result per finding with its location and the other terms as
// related locations, and accepted findings as suppressions with their reasons.
#include "plumb/accepted.hpp"
#include "plumb/render.hpp"
#include "plumb/rules.hpp"
#include "plumb/version.hpp"
#include "report/json_text.hpp"

#include <fmt/format.h>

namespace plumb {

namespace fs = std::filesystem;

namespace {

constexpr std::string_view schema_uri =
    "https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json";
constexpr std::string_view root_base_id = "PROJECTROOT";

std::string str(std::string_view s) {
    std::string out;
    append_json_string(out, valid_utf8(s));
    return out;
}

// RFC 3986: everything but unreserved characters and '/' percent-encoded, byte by byte.
std::string uri_path(std::string_view path) {
    std::string out;
    for (const char c : path) {
        const auto u = static_cast<unsigned char>(c);
        if ((u >= 'a' && u <= 'z') || (u >= 'A' && u <= 'Z') || (u >= '0' && u <= '9') ||
            c == '-' || c == '.' || c == '_' || c == '~' || c == '/')
            out += c;
        else
            out += fmt::format("%{:02X}", u);
    }
    return out;
}

std::string_view level_of(severity s) {
    return s == severity::error ? "error" : s == severity::warning ? "warning" : "note";
}

class sarif_writer {
  public:
    sarif_writer(const check_report& report, const fs::path& root) : report_(report), root_(root) {}

    std::string write() {
        std::string out;
        out += fmt::format("{{\n  \"$schema\": {},\n  \"version\": \"2.1.0\",\n  \"runs\": [{{\n",
                           str(schema_uri));
        out += "    \"tool\": {\"driver\": {\"name\": \"plumb\", ";
        out += fmt::format("\"version\": {}, \"semanticVersion\": {},\n", str(version()),
                           str(version()));
        out += "      \"rules\": [";
        const auto all = rules::all();
        for (std::size_t i = 0; i < all.size(); ++i) {
            out += fmt::format("{}\n        {{\"id\": {}, \"name\": {}, \"shortDescription\": "
                               "{{\"text\": {}}}, \"fullDescription\": {{\"text\": {}}}}}",
                               i == 0 ? "" : ",", str(all[i].id), str(camel_name(all[i].id)),
                               str(all[i].summary), str(sentence(all[i].summary)));
        }
        out += "\n      ]}},\n";
        std::error_code ec;
        const fs::path absolute_root = fs::weakly_canonical(root_.empty() ? "." : root_, ec);
        out +=
            fmt::format("    \"originalUriBaseIds\": {{{}: {{\"uri\": {}}}}},\n", str(root_base_id),
                        str("file://" + uri_path(absolute_root.generic_string() + "/")));
        out += "    \"columnKind\": \"unicodeCodePoints\",\n";
        out += "    \"results\": [";
        bool first = true;
        for (const auto& d : report_.diagnostics) {
            out += first ? "\n      " : ",\n      ";
            first = false;
            result(out, d);
        }
        out += first ? "]\n" : "\n    ]\n";
        out += "  }]\n}\n";
        return out;
    }

  private:
    const check_report& report_;
    fs::path root_;

    static std::string camel_name(std::string_view id) {
        std::string out;
        bool upper = true;
        for (const char c : id) {
            if (c == '-') {
                upper = true;
                continue;
            }
            out += upper && c >= 'a' && c <= 'z' ? static_cast<char>(c - 'a' + 'A') : c;
            upper = false;
        }
        return out;
    }

    static std::string sentence(std::string_view summary) {
        std::string out(summary);
        if (!out.empty() && out.front() >= 'a' && out.front() <= 'z')
            out.front() = static_cast<char>(out.front() - 'a' + 'A');
        return out + ".";
    }

    [[nodiscard]] std::size_t rule_index(std::string_view id) const {
        const auto all = rules::all();
        for (std::size_t i = 0; i < all.size(); ++i)
            if (all[i].id == id)
                return i;
        return 0;
    }

    // "physicalLocation": the file and, in a text file, the region. A workbook's cell has no
    // line and column a viewer could open (those are in plumb's listing of its formulas), so it
    // is the workbook alone, with the sheet and cell as a logical location beside it.
    std::string physical(const location& where) const {
        const std::string relative = project_relative(where.file->path(), root_);
        const bool under_root = !relative.empty() && relative.front() != '/';
        const std::string artifact =
            fmt::format("{{\"uri\": {}{}}}",
                        str(under_root ? uri_path(relative) : "file://" + uri_path(relative)),
                        under_root ? fmt::format(", \"uriBaseId\": {}", str(root_base_id)) : "");
        if (const cell_place* cell = where.file->cell_at(where.range.begin))
            return fmt::format("\"physicalLocation\": {{\"artifactLocation\": {}}}, "
                               "\"logicalLocations\": [{{\"name\": {}, "
                               "\"fullyQualifiedName\": {}}}]",
                               artifact, str(cell->cell), str(cell_text(*cell)));
        const line_column b = where.file->position(where.range.begin);
        const line_column e = where.file->position(where.range.end);
        // SARIF's endColumn is the column after the region, as ours is; an empty region ends
        // where it starts.
        return fmt::format("\"physicalLocation\": {{\"artifactLocation\": {}, \"region\": "
                           "{{\"startLine\": {}, \"startColumn\": {}, \"endLine\": {}, "
                           "\"endColumn\": {}}}}}",
                           artifact, b.line, b.column, e.line, e.column);
    }

    void result(std::string& out, const diagnostic& d) const {
        std::string text = d.message;
        for (const auto& n : d.notes)
            text += "; " + n.message;
        out += fmt::format("{{\"ruleId\": {}, \"ruleIndex\": {}, \"level\": \"{}\", "
                           "\"message\": {{\"text\": {}}}",
                           str(d.rule), rule_index(d.rule), level_of(d.level), str(text));
        if (d.where.file != nullptr)
            out += fmt::format(",\n        \"locations\": [{{{}}}]", physical(d.where));
        std::vector<std::string> related;
        for (const auto& t : d.terms)
            if (t.where.file != nullptr)
                related.push_back(fmt::format(
                    "{{\"id\": {}, {}, \"message\": {{\"text\": {}}}}}", related.size(),
                    physical(t.where), str(fmt::format("'{}' is {}", t.text, t.dim.to_string()))));
        for (const auto& n : d.notes)
            if (n.where.file != nullptr)
                related.push_back(fmt::format("{{\"id\": {}, {}, \"message\": {{\"text\": {}}}}}",
                                              related.size(), physical(n.where), str(n.message)));
        if (!related.empty()) {
            out += ",\n        \"relatedLocations\": [";
            for (std::size_t i = 0; i < related.size(); ++i)
                out += (i == 0 ? "" : ", ") + related[i];
            out += "]";
        }
        if (d.accepted) {
            // An inline mark is a suppression in the source; an entry of the file of accepted
            // findings is external to it.
            out += fmt::format(",\n        \"suppressions\": [{{\"kind\": \"{}\", \"status\": "
                               "\"accepted\", \"justification\": {}",
                               d.accepted->by_inline_mark ? "inSource" : "external",
                               str(d.accepted->reason));
            if (d.accepted->mark.file != nullptr)
                out += fmt::format(", \"location\": {{{}}}", physical(d.accepted->mark));
            out += "}]";
        }
        out += "}";
    }
};

} // namespace

std::string render_sarif(const check_report& report, const fs::path& root) {
    return sarif_writer(report, root).write();
}

} // namespace plumb
