package dev.penduline.ui.internal.preferences;

import org.eclipse.jface.preference.StringFieldEditor;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Text;

import dev.penduline.services.Defaults.Key;

/**
 * A text field for one setting, checked on every change of its text by the same rule the defaults file is
 * read with, so the page's error names the key and the accepted range exactly as the command
 * line's message about the file would.
 */
final class DefaultsFieldEditor extends StringFieldEditor {

    private final Key key;

    /**
     * A field for one setting.
     *
     * @param key    the setting
     * @param label  the label, with a mnemonic
     * @param parent the page's field parent
     */
    DefaultsFieldEditor(Key key, String label, Composite parent) {
        super(key.key(), label, 14, VALIDATE_ON_KEY_STROKE, parent);
        this.key = key;
        setEmptyStringAllowed(false);
        setErrorMessage(key.key() + ": give " + key.describe());
        Text text = getTextControl(parent);
        text.setToolTipText(key.key() + " in the defaults file: " + key.describe());
        // JFace checks on key release and focus loss; a paste or a drop changes the text without either
        text.addModifyListener(e -> valueChanged());
    }

    @Override
    protected boolean doCheckState() {
        try {
            key.parse(getStringValue());
            setErrorMessage(key.key() + ": give " + key.describe());
            return true;
        } catch (IllegalArgumentException e) {
            setErrorMessage(e.getMessage());
            return false;
        }
    }
}
