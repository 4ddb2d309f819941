package org.tautline.app.ui;

import java.awt.Color;
import java.awt.Component;
import java.util.LinkedHashMap;
import java.util.Map;

import javax.swing.DefaultListCellRenderer;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextField;
import javax.swing.UIManager;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;

import net.miginfocom.swing.MigLayout;
import org.tautline.app.ui.setup.ChoiceLabels;
import org.tautline.app.ui.setup.MaterialPreset;
import org.tautline.app.ui.setup.RigTimeEstimate;
import org.tautline.app.ui.setup.SetupField;
import org.tautline.app.ui.setup.SetupForm;

/**
 * The setup screen: specimen, sweep plan and specification limits in three columns, with a message under
 * any field that is wrong (what was typed, what was expected).
 */
final class SetupScreen {
    private final JPanel panel = new JPanel(new MigLayout("insets 10, gapx 32, hidemode 3", "[][]push", "[top]"));
    private final Map<String, JComponent> editors = new LinkedHashMap<>();
    private final Map<String, JLabel> messages = new LinkedHashMap<>();
    private final Runnable onEdit;
    private final JLabel lockNote = new JLabel();
    private final JLabel rigTime = new JLabel();
    private SetupForm form;
    private boolean filling;
    private boolean locked;

    /** @param onEdit called on the event thread after every edit */
    SetupScreen(SetupForm form, Runnable onEdit) {
        this.form = form;
        this.onEdit = onEdit;
        JPanel left = new JPanel(new MigLayout("insets 0, wrap 1, gapy 8"));
        left.add(section(SetupField.Section.SPECIMEN));
        left.add(section(SetupField.Section.SENSORS));
        JPanel right = new JPanel(new MigLayout("insets 0, wrap 1, gapy 8"));
        right.add(section(SetupField.Section.PLAN));
        right.add(section(SetupField.Section.SAFETY));
        right.add(limitsSection());
        lockNote.setName("setupLocked");
        lockNote.setVisible(false);
        panel.add(lockNote, "span 2, wrap");
        panel.add(left);
        panel.add(right);
        validate();
    }

    /**
     * Locks the setup while a sweep runs or is paused: the sweep analyses the setup as it was at Start, so an edit
     * then could only mislead.
     *
     * @param lock true to make every field read-only, false to allow edits again
     */
    void locked(boolean lock) {
        if (lock == locked) {
            return;
        }
        locked = lock;
        editors.values().forEach(e -> {
            if (e instanceof JTextComponent t) {
                t.setEditable(!lock);
            } else {
                e.setEnabled(!lock);
            }
        });
        lockNote.setText("<html><b>The setup is locked:</b> a sweep is running or paused, and it is analysed with the"
                + " setup as it was at Start. Cancel the sweep, or let it finish, to edit.</html>");
        lockNote.setVisible(lock);
        panel.revalidate();
    }

    /** @return true while the setup is locked for a sweep */
    boolean isLocked() {
        return locked;
    }

    JComponent component() {
        JScrollPane scroll = new JScrollPane(panel);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    SetupForm form() {
        return form;
    }

    /** Shows another form's values (after New or Open). */
    void show(SetupForm newForm) {
        form = newForm;
        filling = true;
        try {
            newForm.values().forEach((key, text) -> {
                JComponent editor = editors.get(key);
                if (editor instanceof JTextComponent t) {
                    t.setText(text);
                } else if (editor instanceof JComboBox<?> c) {
                    c.setSelectedItem(text);
                }
            });
        } finally {
            filling = false;
        }
        validate();
    }

    private JPanel section(SetupField.Section section) {
        JPanel p = new JPanel(new MigLayout("insets 0, wrap 3, gapy 2, hidemode 3", "[right][grow,fill,100:140:][]"));
        JLabel title = new JLabel(section.title());
        title.putClientProperty("FlatLaf.styleClass", "h3");
        p.add(title, "span 3, left, gapbottom 6");
        if (section == SetupField.Section.SPECIMEN) {
            addMaterialPreset(p);
        }
        if (section == SetupField.Section.PLAN) {
            rigTime.setName("rigTime");
            p.add(rigTime, "span 3, wmax 660, gapbottom 4");
        }
        for (SetupField f : form.fields()) {
            if (f.section() != section) {
                continue;
            }
            JLabel label = new JLabel(f.label());
            JComponent editor = editor(f);
            label.setLabelFor(editor);
            p.add(label);
            p.add(editor);
            p.add(new JLabel(f.unit()));
            p.add(problemLabel(f), "skip 1, span 2, wmax 340, gapbottom 4");
        }
        return p;
    }

    /** The limits as one row each: lower bound, upper bound, unit; an empty bound means none. */
    private JPanel limitsSection() {
        JPanel p = new JPanel(new MigLayout("insets 0, wrap 5, gapy 2, hidemode 3", "[right][90:110:][center][90:110:][]"));
        JLabel title = new JLabel(SetupField.Section.LIMITS.title());
        title.putClientProperty("FlatLaf.styleClass", "h3");
        p.add(title, "span 5, left, gapbottom 6");
        p.add(new JLabel("<html><small>an empty bound means none</small></html>"), "skip 1, span 4, left");
        java.util.List<SetupField> limits = form.fields().stream()
                .filter(f -> f.section() == SetupField.Section.LIMITS).toList();
        for (int i = 0; i + 1 < limits.size(); i += 2) {
            SetupField lower = limits.get(i);
            SetupField upper = limits.get(i + 1);
            JLabel label = new JLabel(lower.label().replaceFirst(": at least$", ""));
            JComponent lowerEditor = editor(lower);
            label.setLabelFor(lowerEditor);
            p.add(label);
            p.add(lowerEditor, "growx");
            p.add(new JLabel("to"));
            p.add(editor(upper), "growx");
            p.add(new JLabel(upper.unit()));
            for (SetupField f : java.util.List.of(lower, upper)) {
                JLabel message = problemLabel(f);
                p.add(message, "skip 1, span 4, wmax 380, gapbottom 4");
            }
        }
        return p;
    }

    private JLabel problemLabel(SetupField f) {
        JLabel message = new JLabel();
        message.setName("problem." + f.key());
        message.setForeground(errorColour());
        message.setVisible(false);
        messages.put(f.key(), message);
        return message;
    }

    private void addMaterialPreset(JPanel p) {
        JComboBox<MaterialPreset> material = new JComboBox<>(MaterialPreset.all().toArray(new MaterialPreset[0]));
        material.setName("material");
        JTextField diameter = new JTextField("0.0005", 6);
        diameter.setName("diameterM");
        JButton apply = new JButton("Fill from material");
        apply.setMnemonic('F');
        JLabel problem = new JLabel();
        problem.setForeground(errorColour());
        apply.addActionListener(e -> {
            if (locked) {
                return;
            }
            try {
                double d = Double.parseDouble(diameter.getText().trim());
                SetupForm f = form;
                f.applyMaterial((MaterialPreset) material.getSelectedItem(), d);
                show(f);
                problem.setText("");
                onEdit.run();
            } catch (IllegalArgumentException ex) {
                problem.setText("Diameter: got '" + diameter.getText() + "'; expected a positive number of m");
            }
        });
        JLabel materialLabel = new JLabel("Material preset");
        materialLabel.setLabelFor(material);
        materialLabel.setDisplayedMnemonic('M');
        p.add(materialLabel);
        p.add(material, "span 2, wmax 300");
        p.add(new JLabel("Wire diameter"));
        p.add(diameter);
        p.add(new JLabel("m"));
        p.add(apply, "skip 1, span 2, split 2");
        p.add(new JLabel("<html><small>handbook values, see Material</small></html>"));
        p.add(problem, "skip 1, span 2, gapbottom 8");
    }

    private JComponent editor(SetupField f) {
        JComponent editor;
        if (f.kind() == SetupField.Kind.CHOICE) {
            JComboBox<String> box = new JComboBox<>(f.choices().toArray(new String[0]));
            // The project keeps the value (PINNED); people see its label (pinned).
            box.setRenderer(new DefaultListCellRenderer() {
                private static final long serialVersionUID = 1L;

                @Override
                public Component getListCellRendererComponent(JList<?> list, Object value, int index, boolean selected,
                                                              boolean focus) {
                    return super.getListCellRendererComponent(list, ChoiceLabels.of(f.key(), (String) value), index,
                            selected, focus);
                }
            });
            box.setSelectedItem(form.value(f.key()));
            box.addActionListener(e -> edited(f.key(), (String) box.getSelectedItem()));
            editor = box;
        } else {
            JTextField field = new JTextField(form.value(f.key()), 10);
            field.getDocument().addDocumentListener(new DocumentListener() {
                @Override
                public void insertUpdate(DocumentEvent e) {
                    edited(f.key(), field.getText());
                }

                @Override
                public void removeUpdate(DocumentEvent e) {
                    edited(f.key(), field.getText());
                }

                @Override
                public void changedUpdate(DocumentEvent e) {
                    edited(f.key(), field.getText());
                }
            });
            editor = field;
        }
        editor.setName(f.key());
        editors.put(f.key(), editor);
        return editor;
    }

    private void edited(String key, String text) {
        if (filling || locked) {
            return;
        }
        if (form.set(key, text)) {
            validate();
            onEdit.run();
        }
    }

    /** Shows the form's problems beside their fields; returns true when there are none. */
    boolean validate() {
        Map<String, String> problems = form.problems();
        messages.forEach((key, label) -> {
            String problem = problems.get(key);
            label.setVisible(problem != null);
            label.setText(problem == null ? "" : "<html>" + escape(problem) + "</html>");
            JComponent editor = editors.get(key);
            if (editor != null) {
                editor.putClientProperty("JComponent.outline", problem == null ? null : "error");
            }
        });
        rigTime.setText(problems.isEmpty() ? "<html>" + escape(RigTimeEstimate.of(form.plan(), form.specimen()).text())
                + "</html>" : "<html>Rig time: shown once the fields marked in red are right.</html>");
        panel.revalidate();
        return problems.isEmpty();
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    private static Color errorColour() {
        Color c = UIManager.getColor("Component.error.focusedBorderColor");
        return c == null ? new Color(0xB0, 0x30, 0x00) : c;
    }
}
