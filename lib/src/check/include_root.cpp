#include "check/include_root.hpp"

#include <algorithm>
#include <system_error>

namespace plumb {

namespace fs = std::filesystem;

namespace {

// Absolute, with links and ".." resolved as far as the path exists; no trailing separator.
std::optional<fs::path> resolved(const fs::path& p) {
    std::error_code ec;
    const fs::path absolute = fs::absolute(p, ec);
    if (ec)
        return std::nullopt;
    fs::path out = fs::weakly_canonical(absolute, ec);
    if (ec)
        return std::nullopt;
    if (out.has_relative_path() && out.filename().empty())
        out = out.parent_path();
    return out;
}

} // namespace

std::optional<fs::path> path_inside_root(const fs::path& root, const fs::path& using_folder,
                                         std::string_view written) {
    const auto inside = resolved(root);
    if (!inside)
        return std::nullopt;
    const fs::path folder = using_folder.is_absolute() ? using_folder : *inside / using_folder;
    const auto target = resolved(folder / fs::path(written));
    if (!target)
        return std::nullopt;
    // Compared by whole components, so that /sandbox-2 is not inside /sandbox.
    const auto [in_root, in_target] =
        std::mismatch(inside->begin(), inside->end(), target->begin(), target->end());
    if (in_root != inside->end())
        return std::nullopt;
    return target;
}

} // namespace plumb
