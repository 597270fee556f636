// Files that are not plain files: a FIFO blocks a reader forever (opening it waits for a writer,
// reading it waits for data), a device such as /dev/zero never ends. Every reader goes through
// readFileLimited, which refuses them before reading anything, with a message naming the file.
#include <sys/stat.h>
#include <unistd.h>

#include <filesystem>
#include <random>
#include <string>

#include <doctest/doctest.h>

#include "netcheck/file/file_io.hpp"

using namespace netcheck;

namespace {

// A fresh folder that removes itself.
struct ScratchFolder {
    std::filesystem::path path = std::filesystem::temp_directory_path() /
                                 ("stripsmith-special-" + std::to_string(std::random_device()()));
    ScratchFolder() { std::filesystem::create_directories(path); }
    ~ScratchFolder() { std::filesystem::remove_all(path); }
};

}  // namespace

TEST_CASE("files that are not plain files are refused before reading") {
    SUBCASE("a FIFO with no writer: refused at once, not waited on") {
        ScratchFolder folder;
        const std::string fifo = (folder.path / "f.board.json").string();
        REQUIRE(::mkfifo(fifo.c_str(), 0600) == 0);
        const auto result = readFileLimited(fifo, 1000);
        REQUIRE(result.error.has_value());
        CHECK(result.error->describe() == fifo + ": this is not a plain file (a pipe or FIFO)");
    }
    SUBCASE("an endless device") {
        const auto result = readFileLimited("/dev/zero", 100000);
        REQUIRE(result.error.has_value());
        CHECK(result.error->describe() == "/dev/zero: this is not a plain file (a device)");
    }
    SUBCASE("a folder keeps its own message") {
        ScratchFolder folder;
        const auto result = readFileLimited(folder.path.string(), 1000);
        REQUIRE(result.error.has_value());
        CHECK(result.error->message == "this is a folder, not a file");
    }
}
