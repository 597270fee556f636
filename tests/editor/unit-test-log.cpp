// The end-to-end test log: off unless asked for; state events only when the state changes.
#include <doctest/doctest.h>

#include "editor/app/test_log.hpp"

using namespace stripsmith;

TEST_CASE("the test log reports a state only when it changes") {
    TestLog log(true);
    CHECK(log.changed("dialogs", "chooser"));
    CHECK_FALSE(log.changed("dialogs", "chooser"));
    CHECK(log.changed("dialogs", "-"));
    CHECK(log.changed("view", "chooser"));  // each topic remembers its own last value
    CHECK(log.changed("dialogs", "chooser"));
}

TEST_CASE("the test log is off by default") {
    TestLog log;
    CHECK_FALSE(log.on());
    CHECK_FALSE(log.changed("dialogs", "chooser"));
}
