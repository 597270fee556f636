// Where the editor finds its assets: beside its own folder (bin/../share/stripsmith, which the
// build tree mirrors), or $STRIPSMITH_ASSETS; a missing file is named, with where it was looked for.
#include <doctest/doctest.h>

#include <cstdlib>
#include <filesystem>
#include <optional>
#include <string>

#include "editor/app/look.hpp"

using namespace stripsmith;
namespace fs = std::filesystem;

namespace {

/// Sets (or, with nullopt, unsets) STRIPSMITH_ASSETS for one scope, then puts back what was there.
class AssetsVariable {
public:
    explicit AssetsVariable(const std::optional<std::string>& value) {
        if (const char* old = std::getenv("STRIPSMITH_ASSETS")) old_ = old;
        if (value) setenv("STRIPSMITH_ASSETS", value->c_str(), 1);
        else unsetenv("STRIPSMITH_ASSETS");
    }
    ~AssetsVariable() {
        if (old_) setenv("STRIPSMITH_ASSETS", old_->c_str(), 1);
        else unsetenv("STRIPSMITH_ASSETS");
    }
    AssetsVariable(const AssetsVariable&) = delete;
    AssetsVariable& operator=(const AssetsVariable&) = delete;

private:
    std::optional<std::string> old_;
};

}  // namespace

TEST_CASE("assets: found beside the program, never in the current directory") {
    const AssetsVariable unset(std::nullopt);
    const fs::path program = fs::read_symlink("/proc/self/exe");
    const fs::path expected =
        (program.parent_path().parent_path() / "share" / "stripsmith").lexically_normal();
    CHECK(fs::path(assetsFolder()) == expected);
    // This test program sits in build/bin like the editor: the build copied assets/ beside it.
    CHECK(fs::is_regular_file(expected / "fonts" / "DejaVuSans.ttf"));
    CHECK(missingAssets().empty());

    // Changing the current directory changes nothing.
    const fs::path before = fs::current_path();
    fs::current_path(fs::temp_directory_path());
    CHECK(fs::path(assetsFolder()) == expected);
    fs::current_path(before);
}

TEST_CASE("assets: a missing file is named with the folder it was looked for in") {
    const fs::path empty = fs::temp_directory_path() / "stripsmith-unit-assets-empty";
    fs::create_directories(empty);
    const AssetsVariable set(empty.string());
    CHECK(assetsFolder() == empty.string());
    const std::string message = missingAssets();
    CHECK(message.find("missing " + (empty / "fonts" / "DejaVuSans.ttf").string()) == 0);
    CHECK(message.find("STRIPSMITH_ASSETS") != std::string::npos);
    fs::remove_all(empty);
}

TEST_CASE("assets: STRIPSMITH_ASSETS must be absolute (not read from the current directory)") {
    const AssetsVariable set(std::string("assets"));
    CHECK(missingAssets().find("must be an absolute path") != std::string::npos);
}
