// The form kit: a Form bound to a zod schema and fields bound to it by name (see form.tsx).
export { Form, type FormMethods, type FormSchema } from './form';
export { SelectField, TextAreaField, TextField, type FieldProps } from './fields';
export { LengthField } from './length-field';
export { FormAlert, SubmitButton } from './form-alert';
