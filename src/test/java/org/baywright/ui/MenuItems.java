package org.baywright.ui;

import java.util.ArrayDeque;
import javafx.scene.Node;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;

/** Finds a menu item of the main window's menu bar by its id, in menus at any depth (menu items are not nodes). */
final class MenuItems {
    private MenuItems() {
    }

    static MenuItem find(Node root, String id) {
        MenuBar bar = (MenuBar) root.lookup("#menu-bar");
        ArrayDeque<MenuItem> todo = new ArrayDeque<>(bar.getMenus());
        while (!todo.isEmpty()) {
            MenuItem m = todo.pop();
            if (id.equals(m.getId())) {
                return m;
            }
            if (m instanceof Menu sub) {
                todo.addAll(sub.getItems());
            }
        }
        throw new AssertionError("no menu item " + id);
    }
}
