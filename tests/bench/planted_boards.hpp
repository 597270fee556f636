// Planted cases for the layout engine: random compact boards that are correct by construction
// (the circuit is taken from their own copper), so the area a hand could reach is known. Each
// column holds one part (or, stacked, as many as fit), standing as the engine's lead rules allow;
// strips are cut at random between columns.
#pragma once

#include <random>
#include <string>

#include "netcheck/check/circuit_capture.hpp"
#include "netcheck/model/board.hpp"

namespace planted {

struct Shape {
    const char* kind;
    std::vector<const char*> pins;  // top to bottom
    int span;                       // rows from the first lead to the last
    const char* body;               // "" or the two-lead body that allows the span
};

inline const std::vector<Shape>& shapes() {
    // Spans the engine's lead rules allow (netcheck/layout/lead_rules.cpp, common practice).
    static const std::vector<Shape> kShapes{
        {"resistor", {"1", "2"}, 1, "standing"}, {"resistor", {"1", "2"}, 2, "standing"},
        {"resistor", {"1", "2"}, 4, "lying"},    {"capacitor", {"1", "2"}, 2, ""},
        {"electrolytic", {"+", "-"}, 1, ""},     {"bjt", {"E", "B", "C"}, 2, ""},
    };
    return kShapes;
}

/// A rows x cols board, every column used, with its circuit embedded.
inline netcheck::Board plantedBoard(std::mt19937& random, int rows, int cols, bool stacked) {
    netcheck::Board board;
    board.title = "planted";
    board.rows = rows;
    board.cols = cols;
    int count = 0;
    for (int col = 0; col < cols; ++col) {
        int row = static_cast<int>(random() % 2);
        for (bool first = true; first || stacked; first = false) {
            const Shape& shape = shapes()[random() % shapes().size()];
            if (row + shape.span >= rows) {
                if (first) row = 0;  // every column gets a part
                if (row + shape.span >= rows) break;
            }
            netcheck::Part part{"P" + std::to_string(++count), shape.kind, "", {},
                                nlohmann::json::object()};
            for (std::size_t i = 0; i < shape.pins.size(); ++i) {
                const int at = shape.pins.size() == 2 ? row + static_cast<int>(i) * shape.span
                                                      : row + static_cast<int>(i);
                part.pins.push_back({shape.pins[i], {at, col}});
            }
            if (*shape.body) part.extra["body"] = shape.body;
            if (std::string(shape.kind) == "bjt") part.extra["pinout"] = "E-B-C";
            board.parts.push_back(part);
            row += shape.span + 1 + static_cast<int>(random() % 2);
            if (row >= rows) break;
        }
    }
    for (int row = 0; row < rows; ++row) {
        for (int col = 0; col + 1 < cols; ++col) {
            if (random() % 100 < 30) board.cuts.push_back({{row, col}, netcheck::Cut::Kind::Between});
        }
    }
    netcheck::Circuit circuit = netcheck::captureCircuit(board);
    for (const netcheck::Part& part : board.parts) circuit.parts[part.ref].extra = part.extra;
    board.circuit = circuit;
    return board;
}

}  // namespace planted
