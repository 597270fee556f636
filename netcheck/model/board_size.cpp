#include "netcheck/model/board_size.hpp"

#include <cmath>
#include <cstdio>

#include "netcheck/model/board.hpp"

namespace netcheck {

namespace {

std::string fixed(double value, int decimals) {
    const double scale = std::pow(10.0, decimals);
    char text[48];
    std::snprintf(text, sizeof text, "%.*f", decimals, std::round(value * scale) / scale);
    return text;
}

}  // namespace

std::string sizeInHoles(int holesAcross, int strips) {
    return std::to_string(holesAcross) + " x " + std::to_string(strips) + " holes";
}

std::string sizeInMm(double widthMm, double heightMm, int decimals) {
    return fixed(widthMm, decimals) + " x " + fixed(heightMm, decimals) + " mm";
}

std::string boardSize(const Board& board, int decimals) {
    return sizeInHoles(board.cols, board.rows) + " (" +
           sizeInMm(board.widthMm(), board.heightMm(), decimals) + ")";
}

}  // namespace netcheck
