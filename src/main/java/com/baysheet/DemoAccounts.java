package com.baysheet;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Role;
import com.baysheet.auth.SetupCode;
import com.baysheet.store.auth.UserAdmin;

import java.util.List;
import java.util.function.Consumer;

/**
 * With {@code --demo} only: an invented engineer and checker, so that a trial office can go through the check
 * at once. Their passwords are random and printed in the console, so each must be changed at its first login;
 * the console says plainly that these are demo accounts (to be made inactive before real work).
 */
final class DemoAccounts {
    static final List<NewUser> PEOPLE = List.of(
            new NewUser("mquenby", "Marisol Quenby", "MQ", Role.ENGINEER),
            new NewUser("afairweather", "Anselm Fairweather", "AF", Role.CHECKER));
    static final int PASSWORD_LENGTH = 12;

    private DemoAccounts() {}

    static void add(UserAdmin admin, Consumer<String> console) {
        for (NewUser u : PEOPLE) {
            String password = SetupCode.randomText(PASSWORD_LENGTH);
            admin.addDemo(u, password).ifPresentOrElse(
                    made -> console.accept("demo account (invented, for trying Baysheet only; make it inactive before real work): "
                            + made.role().label() + " " + made.username() + " password " + password),
                    () -> console.accept("demo account " + u.username() + " exists already; its password is not shown again"));
        }
    }
}
