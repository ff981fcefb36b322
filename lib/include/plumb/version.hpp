// The library's version, as CMake's project() states it.
#pragma once

#include <string_view>

namespace plumb {
std::string_view version();
} // namespace plumb
