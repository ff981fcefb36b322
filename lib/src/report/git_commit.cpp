// The checked-out commit, read from the repository's files as git lays them out (HEAD, loose
// refs, packed-refs; a worktree's .git file and its commondir), so that no git is needed.
#include "plumb/provenance.hpp"

#include "model/user_file.hpp"

#include <algorithm>
#include <sstream>

namespace plumb {

namespace fs = std::filesystem;

namespace {

std::string first_line(const fs::path& file) {
    // HEAD and refs are a line each; anything larger is not git's.
    std::string line = read_user_file(file, 4096).text;
    line.erase(std::min(line.find('\n'), line.size()));
    while (!line.empty() && (line.back() == '\r' || line.back() == ' '))
        line.pop_back();
    return line;
}

bool is_object_id(std::string_view s) {
    if (s.size() != 40 && s.size() != 64)
        return false;
    for (const char c : s)
        if (!((c >= '0' && c <= '9') || (c >= 'a' && c <= 'f')))
            return false;
    return true;
}

// The folder holding HEAD for the repository that contains `folder`.
fs::path git_dir_of(fs::path folder) {
    std::error_code ec;
    folder = fs::weakly_canonical(folder, ec);
    for (int depth = 0; depth < 256 && !folder.empty(); ++depth) {
        const fs::path dot_git = folder / ".git";
        if (fs::is_directory(dot_git, ec))
            return dot_git;
        if (fs::is_regular_file(dot_git, ec)) {
            const std::string line = first_line(dot_git);
            if (line.rfind("gitdir: ", 0) == 0) {
                fs::path dir = line.substr(8);
                return dir.is_relative() ? folder / dir : dir;
            }
        }
        if (folder.parent_path() == folder)
            break;
        folder = folder.parent_path();
    }
    return {};
}

std::string resolve_ref(const fs::path& git_dir, const fs::path& common_dir,
                        const std::string& ref) {
    for (const fs::path& dir : {git_dir, common_dir}) {
        const std::string loose = first_line(dir / ref);
        if (is_object_id(loose))
            return loose;
    }
    std::istringstream packed(read_user_file(common_dir / "packed-refs").text);
    for (std::string line; std::getline(packed, line);) {
        const std::size_t space = line.find(' ');
        if (space != std::string::npos && line.substr(space + 1) == ref &&
            is_object_id(line.substr(0, space)))
            return line.substr(0, space);
    }
    return {};
}

} // namespace

std::string git_commit_of(const fs::path& folder) {
    const fs::path git_dir = git_dir_of(folder);
    if (git_dir.empty())
        return {};
    fs::path common_dir = git_dir;
    if (const std::string common = first_line(git_dir / "commondir"); !common.empty())
        common_dir = fs::path(common).is_relative() ? git_dir / common : fs::path(common);
    const std::string head = first_line(git_dir / "HEAD");
    if (is_object_id(head))
        return head; // detached
    if (head.rfind("ref: ", 0) != 0)
        return {};
    return resolve_ref(git_dir, common_dir, head.substr(5));
}

} // namespace plumb
