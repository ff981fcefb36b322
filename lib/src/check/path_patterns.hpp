// Glob patterns for the settings file's include and exclude lists.
#pragma once

#include <string_view>

namespace plumb {

// `*` matches within one folder name, `**` across folders, `?` one character. A pattern that
// matches a folder matches everything under it. `path` is relative, with '/' separators.
bool path_matches(std::string_view pattern, std::string_view path);

} // namespace plumb
