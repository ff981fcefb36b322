// The symbols one file can see: its dictionaries', its `use`d files' and its own.
#pragma once

#include "plumb/diagnostic.hpp"
#include "plumb/dimension.hpp"

#include <optional>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace plumb {

struct symbol_entry {
    std::optional<dimension> dim; // empty when its declaration had an error (already reported)
    location declared_at;
    std::string_view description;
    bool local = false; // declared in the file being checked, not in a dictionary
    bool used = false;
};

class symbol_table {
  public:
    [[nodiscard]] symbol_entry* find(std::string_view name) {
        const auto it = entries_.find(name);
        return it == entries_.end() ? nullptr : &it->second;
    }
    // Inserts, or returns the entry already there (second = false).
    std::pair<symbol_entry*, bool> insert(std::string_view name, const symbol_entry& entry) {
        auto [it, inserted] = entries_.try_emplace(name, entry);
        return {&it->second, inserted};
    }
    // Declared names closest to `name`, for "did you mean".
    [[nodiscard]] std::vector<std::string_view> nearest(std::string_view name,
                                                        std::size_t limit = 3) const;

    [[nodiscard]] const std::unordered_map<std::string_view, symbol_entry>& entries() const {
        return entries_;
    }

  private:
    std::unordered_map<std::string_view, symbol_entry> entries_;
};

} // namespace plumb
