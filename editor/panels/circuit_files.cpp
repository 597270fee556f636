#include "editor/panels/circuit_files.hpp"

#include <array>

#include "netcheck/spice/spice_export.hpp"

namespace stripsmith {

netcheck::ReadResult<netcheck::Circuit> readCircuitForEditor(
    std::string_view text, std::string_view fileName, const netcheck::SpiceOptions& options) {
    if (netcheck::looksLikeSpiceDeck(text, fileName))
        return netcheck::importSpice(text, fileName, options);
    return netcheck::readCircuit(text, fileName);
}

bool isSpiceFileName(std::string_view path) {
    constexpr std::array<std::string_view, 5> kEndings = {".cir", ".sp", ".spice", ".net", ".ckt"};
    for (std::string_view ending : kEndings)
        if (path.size() > ending.size() && path.ends_with(ending)) return true;
    return false;
}

std::string circuitFileText(const netcheck::Circuit& circuit, std::string_view path,
                            std::string_view title) {
    return isSpiceFileName(path) ? netcheck::exportSpice(circuit, title)
                                 : netcheck::writeCircuit(circuit);
}

}  // namespace stripsmith
