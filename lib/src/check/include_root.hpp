// A folder that `use` lines may not leave: the sandbox in which fuzz targets and services
// check untrusted text, so that no path it names reaches the rest of the file system.
#pragma once

#include <filesystem>
#include <optional>
#include <string_view>

namespace plumb {

// Where `use "written"` leads from a file in `using_folder` (taken under `root` when
// relative), with symbolic links and ".." resolved; empty when that lies outside `root`, as an
// absolute path, a climb out or a link out of it does.
std::optional<std::filesystem::path> path_inside_root(const std::filesystem::path& root,
                                                      const std::filesystem::path& using_folder,
                                                      std::string_view written);

} // namespace plumb
