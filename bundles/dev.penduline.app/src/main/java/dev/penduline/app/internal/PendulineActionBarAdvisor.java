package dev.penduline.app.internal;

import org.eclipse.jface.action.IMenuManager;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.ui.IWorkbenchActionConstants;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.actions.ActionFactory.IWorkbenchAction;
import org.eclipse.ui.actions.ContributionItemFactory;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;

/** File, Edit, Window and Help menus built from the platform's standard actions. */
final class PendulineActionBarAdvisor extends ActionBarAdvisor {

    private IWorkbenchAction quit;
    private IWorkbenchAction preferences;
    private IWorkbenchAction about;
    private IWorkbenchAction newWizard;
    private IWorkbenchAction save;
    private IWorkbenchAction importWizards;
    private IWorkbenchAction exportWizards;
    private IWorkbenchAction saveAs;
    private IWorkbenchAction revert;
    private IWorkbenchAction close;
    private IWorkbenchAction undo;
    private IWorkbenchAction redo;
    private OpenFolderAction openFolder;

    PendulineActionBarAdvisor(IActionBarConfigurer configurer) {
        super(configurer);
    }

    @Override
    protected void makeActions(IWorkbenchWindow window) {
        newWizard = register(ActionFactory.NEW.create(window));
        save = register(ActionFactory.SAVE.create(window));
        importWizards = register(ActionFactory.IMPORT.create(window));
        exportWizards = register(ActionFactory.EXPORT.create(window));
        saveAs = register(ActionFactory.SAVE_AS.create(window));
        revert = register(ActionFactory.REVERT.create(window));
        close = register(ActionFactory.CLOSE.create(window));
        // retargeted: the active editor (the mechanism editor) supplies the command stack
        undo = register(ActionFactory.UNDO.create(window));
        redo = register(ActionFactory.REDO.create(window));
        openFolder = new OpenFolderAction(window);
        quit = register(ActionFactory.QUIT.create(window));
        preferences = register(ActionFactory.PREFERENCES.create(window));
        about = register(ActionFactory.ABOUT.create(window));
    }

    private IWorkbenchAction register(IWorkbenchAction action) {
        super.register(action);
        return action;
    }

    @Override
    protected void fillMenuBar(IMenuManager menuBar) {
        IWorkbenchWindow window = getActionBarConfigurer().getWindowConfigurer().getWindow();
        MenuManager file = new MenuManager("&File", IWorkbenchActionConstants.M_FILE);
        MenuManager newMenu = new MenuManager("&New", ActionFactory.NEW.getId());
        // the perspective's new-wizard shortcuts (Mechanism Project first), then "Other..."
        newMenu.add(ContributionItemFactory.NEW_WIZARD_SHORTLIST.create(window));
        file.add(newMenu);
        file.add(openFolder);
        file.add(new Separator());
        file.add(close);
        file.add(save);
        file.add(saveAs);
        file.add(revert);
        file.add(new Separator());
        file.add(importWizards);
        file.add(exportWizards);
        file.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));
        file.add(new Separator());
        file.add(quit);

        MenuManager edit = new MenuManager("&Edit", IWorkbenchActionConstants.M_EDIT);
        edit.add(undo);
        edit.add(redo);
        edit.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));

        MenuManager windowMenu = new MenuManager("&Window", IWorkbenchActionConstants.M_WINDOW);
        MenuManager showView = new MenuManager("Show &View", "showView");
        showView.add(ContributionItemFactory.VIEWS_SHORTLIST.create(window));
        windowMenu.add(showView);
        windowMenu.add(new Separator());
        windowMenu.add(preferences);

        MenuManager help = new MenuManager("&Help", IWorkbenchActionConstants.M_HELP);
        help.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));
        help.add(about);

        menuBar.add(file);
        menuBar.add(edit);
        menuBar.add(new Separator(IWorkbenchActionConstants.MB_ADDITIONS));
        menuBar.add(windowMenu);
        menuBar.add(help);
    }
}
