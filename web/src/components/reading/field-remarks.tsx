import { Typography } from 'antd';
import { createContext, useContext } from 'react';

/**
 * Remarks shown beneath input fields, by dotted input path: the open review comments anchored
 * to that input. Provided by the page; the schema form shows them under the field they name.
 */
export const FieldRemarksContext = createContext<Readonly<Record<string, readonly string[]>>>({});

/** The remarks on one field, if any, as a short list under it. */
export function FieldRemarks({ path }: { path: string }) {
  const remarks = useContext(FieldRemarksContext)[path];
  if (!remarks?.length) return null;
  return (
    <ul className="lw-field-remarks" aria-label="Review comments on this input">
      {remarks.map((remark) => (
        <li key={remark}>
          <Typography.Text type="warning">{remark}</Typography.Text>
        </li>
      ))}
    </ul>
  );
}
