// What identifies the material a sign-off report covers: file digests and the git commit.
#pragma once

#include <filesystem>
#include <string>
#include <string_view>

namespace plumb {

// SHA-256 (FIPS 180-4) of `bytes`, as 64 lowercase hexadecimal digits.
std::string sha256_hex(std::string_view bytes);

// The commit checked out in the git repository holding `folder` (read from .git, without
// running git); empty when there is none or it cannot be read.
std::string git_commit_of(const std::filesystem::path& folder);

} // namespace plumb
