#include "netcheck/repair/detail/board_health.hpp"

#include <algorithm>

namespace netcheck {

std::string findingKey(const Finding& finding) {
    std::string key(finding.id());
    key += "|" + finding.ref + "|" + finding.net + "|";
    for (const std::string& net : finding.nets) key += net + ",";
    if (finding.hole) key += "|" + holeName(*finding.hole);
    // Contacts are told apart by the holes of the links concerned.
    if (finding.type == FindingType::LinkOverLead || finding.type == FindingType::LinksTouch) {
        for (const Hole& hole : finding.holes) key += " " + holeName(hole);
    }
    return key;
}

BoardHealth::BoardHealth(const CheckReport& report) {
    for (const Finding& error : report.errors) errors.push_back(findingKey(error));
    for (const Finding& warning : report.warnings) {
        if (warning.type == FindingType::LinkOverLead || warning.type == FindingType::LinksTouch)
            contacts.push_back(findingKey(warning));
    }
    std::sort(errors.begin(), errors.end());
    std::sort(contacts.begin(), contacts.end());
}

bool BoardHealth::noWorseThan(const BoardHealth& before) const {
    return std::includes(before.errors.begin(), before.errors.end(), errors.begin(), errors.end()) &&
           std::includes(before.contacts.begin(), before.contacts.end(), contacts.begin(),
                         contacts.end());
}

}  // namespace netcheck
