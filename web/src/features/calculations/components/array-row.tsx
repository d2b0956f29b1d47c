import { DeleteOutlined } from '@ant-design/icons';
import { Button, Flex, Typography, theme } from 'antd';
import type { ReactNode } from 'react';

/** One item of a list of rows: its fields in a numbered fieldset, its message, its Remove button. */
export function ArrayRow({
  legend,
  error,
  removeLabel,
  removeTitle,
  removeDisabled,
  onRemove,
  children,
}: {
  /** "Package 1". */
  legend: string;
  error: string | undefined;
  /** "Remove package 1". */
  removeLabel: string;
  /** Why the item may not be removed, if it may not. */
  removeTitle: string | undefined;
  removeDisabled: boolean | undefined;
  onRemove: () => void;
  children: ReactNode;
}) {
  const { token } = theme.useToken();
  return (
    <fieldset
      style={{
        border: `1px solid ${token.colorBorderSecondary}`,
        borderRadius: token.borderRadiusLG,
        padding: `0 ${token.paddingSM}px ${token.paddingSM}px`,
        margin: `0 0 ${token.marginSM}px`,
      }}
    >
      <legend
        style={{
          width: 'auto',
          fontSize: token.fontSize,
          fontWeight: token.fontWeightStrong,
          color: token.colorTextHeading,
          padding: `0 ${token.paddingXXS}px`,
          margin: 0,
          border: 'none',
        }}
      >
        {legend}
      </legend>
      {children}
      {error ? <Typography.Paragraph type="danger">{error}</Typography.Paragraph> : null}
      <Flex justify="flex-end">
        <Button
          size="small"
          type="text"
          danger
          icon={<DeleteOutlined aria-hidden />}
          aria-label={removeLabel}
          title={removeTitle}
          disabled={removeDisabled}
          onClick={onRemove}
        >
          Remove
        </Button>
      </Flex>
    </fieldset>
  );
}
