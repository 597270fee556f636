// What the Circuit panel keeps between frames: typed text, choices, the last import's notes.
// View state only: never in the document and never in undo.
#pragma once

#include <map>
#include <optional>
#include <string>
#include <vector>

#include "netcheck/file/circuit_text.hpp"
#include "netcheck/spice/spice_import.hpp"

namespace stripsmith {

struct CircuitPanelState {
    netcheck::SpiceOptions spice;        ///< how the next SPICE deck is read
    std::vector<std::string> loadNotes;  ///< the importer's remarks on the last loaded file
    std::string loadedFrom;              ///< the file those notes are about
    bool onlyDifferentNets = false;      ///< comparison lists only the nets that differ

    std::string newRef, newKind = "resistor", newValue, newPins = "1 2";
    std::string editingRef;  ///< part whose fields are open for editing
    std::string editRef, editKind, editValue, editPins;
    std::map<std::string, std::string> pinNetText;  ///< "REF.PIN" -> net name being typed
    std::string renameFrom, renameTo;
    std::string mergeFrom, mergeInto;
    std::string newNetName, newNetPins;  ///< the Nets tab's "Add a net" form

    // The Text tab: the circuit as lines the maker types (netcheck/file/circuit_text).
    std::string text;
    bool textEdited = false;  ///< typed in since it was printed or applied
    bool selectTextTab = false;  ///< once: the text was applied before the tabs were shown
    std::optional<netcheck::Circuit> textFrom;  ///< the board's circuit when printed or applied
    std::string parsedText;                     ///< the text `parsed` was read from
    netcheck::CircuitTextResult parsed;         ///< what the text says (read again on change)
};

}  // namespace stripsmith
