// The benchmark's input: a generated set of calc files that look like an engineering office's,
// the same on every run for a given size, with a known list of deliberately wrong formulas.
#pragma once

#include <cstddef>
#include <cstdint>
#include <filesystem>
#include <string>
#include <string_view>
#include <vector>

namespace plumb_bench {

// A formula written wrong on purpose; the checker must flag it and nothing else.
struct planted_formula {
    std::string file; // path relative to the corpus directory, '/'-separated
    std::uint32_t first_line = 0;
    std::uint32_t last_line = 0; // differs from first_line for a continued formula
    std::string_view rule;       // the rule id the mistake should trigger
};

struct corpus_summary {
    std::size_t files = 0; // formula files plus the dictionary
    std::size_t equations = 0;
    std::size_t bytes = 0;
    std::size_t dictionary_symbols = 0;
    std::vector<planted_formula> planted;
};

// Fixed so that two runs, or two machines, time the same text.
inline constexpr std::uint64_t rng_start = 0x706c756d62'2024ULL;

// Writes dictionary.plumb and about a hundred formula files under `dir` (which must exist)
// holding `equations` formulas in total. Throws std::runtime_error when a file cannot be written.
corpus_summary write_corpus(const std::filesystem::path& dir, std::size_t equations,
                            std::uint64_t start = rng_start);

// A self-contained file of ten consistent formulas, for timing one small check from process start;
// with_typo misspells a name in the last one, so that the check reports an undeclared name.
enum class small_file_variant { clean, with_typo };
void write_small_file(const std::filesystem::path& file,
                      small_file_variant variant = small_file_variant::clean);

} // namespace plumb_bench
