// Property tests with fixed seeds: random edit sequences (every command kind, drags, undo, redo,
// saves) undo back to the starting board byte for byte and redo to the end exactly; every board
// reached by editing survives write -> read unchanged; the unsaved state follows the history.
#include <functional>
#include <optional>
#include <random>
#include <string>
#include <vector>

#include <doctest/doctest.h>

#include "netcheck/file/board_file.hpp"
#include "netcheck/edit/edit.hpp"
#include "test_support.hpp"

using namespace netcheck;
using namespace netcheck::edit;

namespace {

// What a new element's `extra` holds: an empty object, as the reader gives back (a default
// constructed json would be null).
const nlohmann::json kNoExtra = nlohmann::json::object();

// Builds a command from the board it will run on. A proposal is tried on a copy first; only
// changes that leave a valid board (one the file reader accepts) are performed.
using Proposal = std::function<std::unique_ptr<Command>(const Board&)>;

// Proposes random edits of every kind, choosing values as it goes.
class RandomEdits {
public:
    explicit RandomEdits(std::mt19937& rng) : rng_(rng) {}

    Proposal propose(const Board& board) {
        switch (number(0, 15)) {
            case 0: return addPart(board);
            case 1: return pick(board.parts.size(), [](const Board& b, std::size_t i) {
                return std::make_unique<RemovePart>(b, i);
            });
            case 2: return replacePart(board);
            case 3: return addLink(board);
            case 4: return replaceLink(board);
            case 5: return pick(board.links.size(), [](const Board& b, std::size_t i) {
                return std::make_unique<RemoveLink>(b, i);
            });
            case 6: return cut(board);
            case 7: return offboard(board);
            case 8: return wire(board);
            case 9: return title();
            case 10: return circuit(board);
            case 11: return resize(board);
            case 12: {
                const int margin = number(0, 2);
                return [margin](const Board& b) { return trimToUsedArea(b, margin); };
            }
            case 13: {
                auto selection = randomSelection(board);
                return [selection](const Board& b) { return deleteElements(b, selection); };
            }
            case 14: {
                auto selection = randomSelection(board);
                const int rows = number(-2, 2), cols = number(-2, 2);
                return [=](const Board& b) { return moveElements(b, selection, rows, cols); };
            }
            default: return group(board);
        }
    }

    /// One step of dragging part `index` by one hole, or nothing when there is no such part.
    Proposal dragStep(const Board& board, std::size_t index) {
        if (index >= board.parts.size()) return nullptr;
        const int rows = number(-1, 1), cols = number(-1, 1);
        return [=](const Board& b) {
            return moveElements(b, {{ElementRef::Kind::Part, index}}, rows, cols);
        };
    }

    int number(int low, int high) { return std::uniform_int_distribution<int>(low, high)(rng_); }

private:
    Hole hole(const Board& board) { return {number(0, board.rows - 1), number(0, board.cols - 1)}; }

    std::size_t index(std::size_t size) {
        return static_cast<std::size_t>(number(0, static_cast<int>(size) - 1));
    }

    std::optional<std::size_t> insertIndex(std::size_t size) {
        if (number(0, 1) == 0) return std::nullopt;  // append
        return static_cast<std::size_t>(number(0, static_cast<int>(size)));
    }

    template <class Make>
    Proposal pick(std::size_t size, Make make) {
        if (size == 0) return nullptr;
        const std::size_t i = index(size);
        return [i, make](const Board& b) { return make(b, i); };
    }

    Proposal addPart(const Board& board) {
        Part part{"E" + std::to_string(nextRef_++), "resistor", "4k7", {}, kNoExtra};
        const int pins = number(2, 3);
        if (pins == 3) part.kind = "bjt";
        for (int p = 1; p <= pins; ++p) part.pins.push_back({std::to_string(p), hole(board)});
        const auto at = insertIndex(board.parts.size());
        return [part, at](const Board&) { return std::make_unique<AddPart>(part, at); };
    }

    Proposal replacePart(const Board& board) {
        if (board.parts.empty()) return nullptr;
        const std::size_t i = index(board.parts.size());
        Part part = board.parts[i];
        switch (number(0, 4)) {
            case 0: part.pins[index(part.pins.size())].hole = hole(board); break;
            case 1: part.value = std::to_string(number(1, 999)) + "k"; break;
            case 2: part.ref = "E" + std::to_string(nextRef_++); break;
            case 3: std::swap(part.pins.front().name, part.pins.back().name); break;
            default: part.extra["standing"] = number(0, 1) == 1; break;
        }
        return [i, part](const Board& b) { return std::make_unique<ReplacePart>(b, i, part); };
    }

    Proposal addLink(const Board& board) {
        const Link link{hole(board), hole(board), number(0, 4) == 0, kNoExtra};
        const auto at = insertIndex(board.links.size());
        return [link, at](const Board&) { return std::make_unique<AddLink>(link, at); };
    }

    Proposal replaceLink(const Board& board) {
        if (board.links.empty()) return nullptr;
        const std::size_t i = index(board.links.size());
        Link link = board.links[i];
        (number(0, 1) == 0 ? link.from : link.to) = hole(board);
        if (number(0, 3) == 0) link.copperSide = !link.copperSide;
        return [i, link](const Board& b) { return std::make_unique<ReplaceLink>(b, i, link); };
    }

    Proposal cut(const Board& board) {
        if (board.cols < 2) return nullptr;
        Cut cut{hole(board), Cut::Kind::Hole};
        if (number(0, 1) == 1) {
            cut.kind = Cut::Kind::Between;
            cut.hole.col = number(0, board.cols - 2);
        }
        if (!board.cuts.empty() && number(0, 3) == 0) {  // drag an existing cut
            const std::size_t i = index(board.cuts.size());
            return [i, cut](const Board& b) { return std::make_unique<ReplaceCut>(b, i, cut); };
        }
        return [cut](const Board& b) { return toggleCut(b, cut); };
    }

    Proposal offboard(const Board& board) {
        const int choice = number(0, 2);
        if (choice == 0 || board.offboard.empty()) {
            OffboardPart part{"Y" + std::to_string(nextRef_++), "pot", "B100k", {"1", "2", "3"},
                              kNoExtra};
            const auto at = insertIndex(board.offboard.size());
            return [part, at](const Board&) { return std::make_unique<AddOffboard>(part, at); };
        }
        const std::size_t i = index(board.offboard.size());
        if (choice == 1) {
            return [i](const Board& b) {
                return deleteElements(b, {{ElementRef::Kind::Offboard, i}});
            };
        }
        OffboardPart part = board.offboard[i];
        part.value = "A" + std::to_string(number(1, 500)) + "k";
        return [i, part](const Board& b) { return std::make_unique<ReplaceOffboard>(b, i, part); };
    }

    Endpoint endpoint(const Board& board) {
        if (board.offboard.empty() || number(0, 1) == 0) return Endpoint::atHole(hole(board));
        const OffboardPart& part = board.offboard[index(board.offboard.size())];
        return Endpoint::atLug({part.ref, part.pins[index(part.pins.size())]});
    }

    Proposal wire(const Board& board) {
        static const std::vector<std::string> kColours{"red", "black", "", "green"};
        const int choice = number(0, 2);
        if (choice == 0 || board.wires.empty()) {
            const Wire wire{endpoint(board), endpoint(board), kColours[index(4)], kNoExtra};
            const auto at = insertIndex(board.wires.size());
            return [wire, at](const Board&) { return std::make_unique<AddWire>(wire, at); };
        }
        const std::size_t i = index(board.wires.size());
        if (choice == 1) return [i](const Board& b) { return std::make_unique<RemoveWire>(b, i); };
        Wire wire = board.wires[i];
        wire.color = kColours[index(4)];
        if (number(0, 1) == 0) wire.to = endpoint(board);
        return [i, wire](const Board& b) { return std::make_unique<ReplaceWire>(b, i, wire); };
    }

    Proposal title() {
        static const std::vector<std::string> kTitles{"", "Fuzz", "Tremolo \u2013 rev B",
                                                      "Ünïcode \"quoted\" \\ title"};
        const std::string text = kTitles[index(kTitles.size())];
        return [text](const Board& b) { return std::make_unique<SetTitle>(b, text); };
    }

    Proposal circuit(const Board& board) {
        if (number(0, 2) == 0) {
            return [](const Board& b) { return std::make_unique<SetCircuit>(b, std::nullopt); };
        }
        Circuit circuit;
        for (const Part& part : board.parts) {
            circuit.parts[part.ref] = CircuitPart{part.kind, part.value, {}, kNoExtra};
            for (const Pin& pin : part.pins) {
                circuit.nets["N" + std::to_string(number(1, 3))].push_back({part.ref, pin.name});
            }
        }
        return [circuit](const Board& b) { return std::make_unique<SetCircuit>(b, circuit); };
    }

    Proposal resize(const Board& board) {
        EdgeChange change{number(-2, 2), number(-2, 2), number(-3, 3), number(-3, 3)};
        const int rows = board.rows + change.top + change.bottom;
        const int cols = board.cols + change.left + change.right;
        if (rows < 1 || cols < 2 || rows > 40 || cols > 50) return nullptr;
        return [change](const Board& b) { return std::make_unique<ResizeBoard>(b, change); };
    }

    std::vector<ElementRef> randomSelection(const Board& board) {
        std::vector<ElementRef> selection;
        const auto add = [&](ElementRef::Kind kind, std::size_t size) {
            if (size > 0 && number(0, 1) == 1) selection.push_back({kind, index(size)});
        };
        for (int round = 0; round < 2; ++round) {
            add(ElementRef::Kind::Part, board.parts.size());
            add(ElementRef::Kind::Link, board.links.size());
            add(ElementRef::Kind::Cut, board.cuts.size());
            add(ElementRef::Kind::Offboard, board.offboard.size());
            add(ElementRef::Kind::Wire, board.wires.size());
        }
        return selection;
    }

    // A paste-like group: a few additions and a title change as one step.
    Proposal group(const Board& board) {
        std::vector<Proposal> members{addPart(board), addLink(board), title()};
        return [members](const Board& b) {
            std::vector<std::unique_ptr<Command>> commands;
            for (const Proposal& member : members) commands.push_back(member(b));
            return std::make_unique<CompoundCommand>("Paste", std::move(commands));
        };
    }

    std::mt19937& rng_;
    int nextRef_ = 1;
};

// The board if the file reader takes it back unchanged, else nothing (the change is dropped).
bool survivesRoundTrip(const Board& board) {
    const auto back = readBoard(writeBoard(board), "edited.board.json");
    return back.ok() && *back.value == board;
}

// Follows the history with the states it should hold at each depth, and the saved state.
struct Expected {
    std::vector<std::string> states;  // writeBoard text at depth 0, 1, ...
    std::optional<std::size_t> savedDepth = 0;
    std::string savedText;
};

struct Walk {
    Board board;
    History history;
    Expected expected;
    int performed = 0;
    int merged = 0;

    explicit Walk(Board start) : board(std::move(start)) {
        expected.states.push_back(writeBoard(board));
        expected.savedText = expected.states[0];
    }

    // Tries the proposal on a copy; performs it when it gives a valid, changed board.
    bool tryPerform(const Proposal& proposal, int mergeKey) {
        if (!proposal) return false;
        Board trial = board;
        auto command = proposal(trial);
        if (!command) return false;
        command->apply(trial);
        if (trial == board || !survivesRoundTrip(trial)) return false;
        const std::size_t before = history.depth();
        history.perform(proposal(board), board, mergeKey);
        REQUIRE(board == trial);
        auto& states = expected.states;
        if (history.depth() == before) {
            // Merged into the previous step of the same drag.
            REQUIRE(mergeKey != 0);
            states.back() = writeBoard(board);
            ++merged;
        } else {
            REQUIRE(history.depth() == before + 1);
            if (expected.savedDepth && *expected.savedDepth > before) expected.savedDepth.reset();
            states.resize(before + 1);
            states.push_back(writeBoard(board));
            ++performed;
        }
        return true;
    }

    void checkState() {
        REQUIRE(writeBoard(board) == expected.states[history.depth()]);
        const bool modified = expected.savedDepth != history.depth();
        REQUIRE(history.isModified() == modified);
        if (!modified) REQUIRE(writeBoard(board) == expected.savedText);
    }

    void save() {
        history.markSaved();
        expected.savedDepth = history.depth();
        expected.savedText = writeBoard(board);
    }
};

}  // namespace

TEST_CASE("properties") {
    SUBCASE("random edits undo to the start byte for byte and redo to the end exactly") {
        int totalSteps = 0, totalMerged = 0;
        for (unsigned seed = 1; seed <= 32; ++seed) {
            CAPTURE(seed);
            std::mt19937 rng(seed);
            test_support::RandomBoardOptions options;
            options.maxRows = 16;
            options.maxCols = 24;
            const Board start = test_support::randomBoard(rng, options);
            const std::string startText = writeBoard(start);
            RandomEdits edits(rng);
            Walk walk(start);
            int dragKey = 0;
            for (int step = 0; step < 400; ++step) {
                const int action = edits.number(0, 99);
                if (action < 8) {
                    walk.history.undo(walk.board);
                } else if (action < 12) {
                    walk.history.redo(walk.board);
                } else if (action < 15) {
                    walk.save();
                } else if (action < 25) {
                    // A drag: several one-hole moves of one part with one merge key.
                    const std::size_t part = walk.board.parts.empty()
                        ? 0 : static_cast<std::size_t>(edits.number(
                              0, static_cast<int>(walk.board.parts.size()) - 1));
                    ++dragKey;
                    const std::size_t before = walk.history.depth();
                    const int moves = edits.number(2, 6);
                    for (int m = 0; m < moves; ++m) {
                        walk.tryPerform(edits.dragStep(walk.board, part), dragKey);
                    }
                    walk.history.endMerge();
                    REQUIRE(walk.history.depth() <= before + 1);
                } else {
                    walk.tryPerform(edits.propose(walk.board), 0);
                }
                walk.checkState();
            }
            totalSteps += walk.performed;
            totalMerged += walk.merged;

            while (walk.history.redo(walk.board)) walk.checkState();
            const std::string endText = writeBoard(walk.board);
            REQUIRE(endText == walk.expected.states.back());
            while (walk.history.undo(walk.board)) walk.checkState();
            CHECK(writeBoard(walk.board) == startText);
            CHECK(walk.board == start);
            while (walk.history.redo(walk.board)) {}
            CHECK(writeBoard(walk.board) == endText);
        }
        MESSAGE("performed " << totalSteps << " edits and merged " << totalMerged
                             << " drag steps over 32 seeds");
        CHECK(totalSteps > 6000);
        CHECK(totalMerged > 600);
    }

    SUBCASE("every board reached by editing survives write -> read unchanged") {
        // Edits the reader rejects (a cut moved onto another cut, say) are skipped; every board
        // it accepts must read back equal and write the same text again.
        int kept = 0;
        for (unsigned seed = 100; seed < 110; ++seed) {
            CAPTURE(seed);
            std::mt19937 rng(seed);
            Board board = test_support::randomBoard(rng);
            RandomEdits edits(rng);
            for (int step = 0; step < 200; ++step) {
                const Proposal proposal = edits.propose(board);
                if (!proposal) continue;
                Board trial = board;
                auto command = proposal(trial);
                if (!command) continue;
                command->apply(trial);
                const std::string written = writeBoard(trial);
                const auto back = readBoard(written, "edited.board.json");
                if (!back.ok()) continue;  // an invalid proposal (e.g. a duplicate cut): skip it
                CAPTURE(written);
                REQUIRE(*back.value == trial);
                REQUIRE(writeBoard(*back.value) == written);
                board = std::move(trial);
                ++kept;
            }
        }
        CHECK(kept > 1000);
    }
}
