// The sheet file appears whole or not at all: it is drawn in memory and saved by the same atomic
// save as board files, and a board it cannot draw (an absurd hole pitch) writes nothing.
#include <doctest/doctest.h>

#include <unistd.h>

#include <filesystem>
#include <fstream>
#include <string>

#include "../test_support.hpp"
#include "editor/sheet/sheet.hpp"
#include "netcheck/file/board_file.hpp"

namespace fs = std::filesystem;

namespace {

// A fresh folder of its own, removed afterwards.
struct Folder {
    fs::path path = fs::temp_directory_path() /
                    ("stripsmith-sheet-output-" + std::to_string(static_cast<long>(::getpid())));
    Folder() {
        fs::remove_all(path);
        fs::create_directories(path);
    }
    ~Folder() { fs::remove_all(path); }
    std::size_t fileCount() const {
        return static_cast<std::size_t>(std::distance(fs::directory_iterator(path), {}));
    }
};

netcheck::Board testBoard() {
    std::string path = test_support::sourcePath("tests/sheet/boards/booster.board.json");
    auto read = netcheck::readBoard(test_support::readTextFile(path), path);
    REQUIRE_MESSAGE(read.ok(), (read.error ? read.error->describe() : ""));
    return *read.value;
}

}  // namespace

TEST_CASE("sheet output is atomic") {
    Folder folder;
    netcheck::Board board = testBoard();
    const fs::path out = folder.path / "sheet.pdf";

    SUBCASE("a pitch no board has writes no file and says why") {
        // A pitch of 1e6 mm once ended in a FreeType error half-way through, leaving a partial
        // PDF; 1e308 kept cairo busy for many minutes.
        for (double pitch : {1e6, 1e308, 0.01}) {
            CAPTURE(pitch);
            board.pitchMm = pitch;
            const auto error = sheet::exportSheet(board, {}, out.string());
            REQUIRE(error.has_value());
            CHECK(error->find("is outside 0.5 to 10 mm") != std::string::npos);
            CHECK(folder.fileCount() == 0);
        }
    }
    SUBCASE("a new sheet replaces the old one and leaves nothing else behind") {
        std::ofstream(out) << "old sheet";
        REQUIRE_FALSE(sheet::exportSheet(board, {}, out.string()).has_value());
        CHECK(test_support::readTextFile(out.string()).starts_with("%PDF-"));
        CHECK(folder.fileCount() == 1);  // no temporary file, no backup
    }
}
