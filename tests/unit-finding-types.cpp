// The one table of finding types: every id is distinct and reads back, and the README's table of
// findings is this table, so the docs cannot drift from the code.
#include <doctest/doctest.h>

#include <set>

#include "netcheck/check/check_report.hpp"
#include "test_support.hpp"

using namespace netcheck;

TEST_CASE("finding types") {
    SUBCASE("ids are distinct and read back to their type") {
        std::set<std::string_view> ids;
        for (const FindingTypeInfo& info : findingTypes()) {
            CAPTURE(info.id);
            CHECK(ids.insert(info.id).second);
            CHECK(findingTypeOfId(info.id) == info.type);
            CHECK(&findingTypeInfo(info.type) == &info);
            CHECK_FALSE(info.meaning.empty());
        }
        CHECK_FALSE(findingTypeOfId("no-such-finding").has_value());
    }
    SUBCASE("errors come before warnings, as reports list them") {
        bool warningSeen = false;
        for (const FindingTypeInfo& info : findingTypes()) {
            if (info.severity == Severity::Warning) warningSeen = true;
            CHECK_FALSE((warningSeen && info.severity == Severity::Error));
        }
    }
    SUBCASE("the README's table of findings is the table") {
        const std::string readme = test_support::readTextFile(test_support::sourcePath("README.md"));
        CHECK(readme.find(findingTypesMarkdown()) != std::string::npos);
    }
    SUBCASE("a finding's severity is its type's") {
        Finding finding;
        finding.type = FindingType::Trim;
        CHECK(finding.severity() == Severity::Warning);
        CHECK(finding.id() == "trim");
        finding.type = FindingType::PinOnCut;
        CHECK(finding.severity() == Severity::Error);
    }
}
