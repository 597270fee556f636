// Board file format v1 (`*.board.json`) and circuit files: reading with located errors, writing.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <variant>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/file/file_error.hpp"
#include "netcheck/file/read_limits.hpp"

namespace netcheck {

inline constexpr std::string_view kBoardFormat = "stripsmith-board";
inline constexpr int kBoardVersion = 1;

/// Either a value or the first error found. Readers never return a half-read document.
template <class T>
struct ReadResult {
    std::optional<T> value;
    std::optional<FileError> error;
    std::vector<std::string> notes;  ///< non-fatal remarks (e.g. written by a newer version)
    bool ok() const { return value.has_value(); }
};

/// Parses board file text. `fileName` is only used in messages.
ReadResult<Board> readBoard(std::string_view text, std::string_view fileName,
                            const ReadLimits& limits = {});

/// Serialises to v1 JSON (2-space indent, stable key order, unknown keys kept).
std::string writeBoard(const Board& board);

/// Circuit file: the same shape as a board file's `circuit` object.
ReadResult<Circuit> readCircuit(std::string_view text, std::string_view fileName,
                                const ReadLimits& limits = {});
std::string writeCircuit(const Circuit& circuit);

}  // namespace netcheck
