#include "plumb/version.hpp"

namespace plumb {
std::string_view version() {
    return PLUMB_VERSION;
}
} // namespace plumb
