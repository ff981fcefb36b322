// The project's `use` graph, from a light scan of each file's `use "..."` lines, so that a
// hook given a changed dictionary also checks the calcs built on it.
#include "check/path_patterns.hpp"
#include "model/user_file.hpp"
#include "notation/markdown.hpp"
#include "plumb/accepted.hpp"
#include "plumb/settings.hpp"

#include <algorithm>
#include <fstream>
#include <map>
#include <sstream>

namespace plumb {

namespace fs = std::filesystem;

namespace {

std::string key_of(const fs::path& p) {
    std::error_code ec;
    const fs::path canonical = fs::weakly_canonical(p, ec);
    return ec ? p.lexically_normal().string() : canonical.string();
}

// The paths a file's `use` lines name, resolved against its folder.
std::vector<std::string> uses_in(const fs::path& file) {
    std::string text = read_user_file(file).text; // unreadable: no uses (checking says why)
    if (file.extension() == ".md")
        text = plumb_blocks_of(text);
    std::vector<std::string> out;
    std::istringstream lines(text);
    for (std::string line; std::getline(lines, line);) {
        std::size_t at = line.find_first_not_of(" \t");
        if (at == std::string::npos || line.compare(at, 3, "use") != 0)
            continue;
        at = line.find_first_not_of(" \t", at + 3);
        if (at == std::string::npos || line[at] != '"')
            continue;
        const std::size_t close = line.find('"', at + 1);
        if (close == std::string::npos)
            continue;
        out.push_back(key_of(file.parent_path() / line.substr(at + 1, close - at - 1)));
    }
    return out;
}

} // namespace

std::vector<fs::path> files_using(const std::vector<fs::path>& changed,
                                  const check_options& options) {
    const fs::path root = options.project_root.empty() ? fs::path(".") : options.project_root;
    std::map<std::string, std::pair<fs::path, std::vector<std::string>>> graph;
    std::error_code ec;
    fs::recursive_directory_iterator it(root, fs::directory_options::skip_permission_denied, ec);
    for (; !ec && it != fs::recursive_directory_iterator(); it.increment(ec)) {
        std::error_code type_ec;
        if (!it->is_regular_file(type_ec))
            continue;
        const fs::path& p = it->path();
        if (p.extension() != ".plumb" && p.extension() != ".md")
            continue;
        const std::string relative = project_relative(p, root);
        if (std::any_of(
                options.exclude.begin(), options.exclude.end(),
                [&](const std::string& pattern) { return path_matches(pattern, relative); }))
            continue;
        graph.emplace(key_of(p), std::make_pair(p, uses_in(p)));
    }
    std::vector<std::string> reached;
    for (const auto& c : changed)
        reached.push_back(key_of(c));
    const std::size_t given = reached.size();
    for (bool grew = true; grew;) {
        grew = false;
        for (const auto& [key, entry] : graph) {
            if (std::find(reached.begin(), reached.end(), key) != reached.end())
                continue;
            const auto& uses = entry.second;
            if (std::any_of(uses.begin(), uses.end(), [&](const std::string& u) {
                    return std::find(reached.begin(), reached.end(), u) != reached.end();
                })) {
                reached.push_back(key);
                grew = true;
            }
        }
    }
    std::vector<fs::path> out;
    for (std::size_t i = given; i < reached.size(); ++i)
        out.push_back(graph.at(reached[i]).first);
    std::sort(out.begin(), out.end());
    return out;
}

} // namespace plumb
