import { Modal } from 'antd';

/** Asks before a move to another page drops inputs that are not saved. */
export function LeaveWithoutSavingDialog({
  open,
  onLeave,
  onStay,
}: {
  open: boolean;
  onLeave: () => void;
  onStay: () => void;
}) {
  return (
    <Modal
      open={open}
      title="Leave without saving?"
      okText="Leave"
      cancelText="Stay"
      onOk={onLeave}
      onCancel={onStay}
    >
      Your changes to the inputs are not saved yet.
    </Modal>
  );
}
