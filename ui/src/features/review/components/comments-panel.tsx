import { useState, type FormEvent } from 'react';
import { Button, Callout, Spinner, Tag } from '@blueprintjs/core';
import { ChatIcon, SendMessageIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';
import { COMMENT_MAX_LENGTH, type CommentDto } from '@fuelwright/shared';
import { paths } from '../../../app/paths';
import { useRequiredUser } from '../../../lib/current-user';
import { formErrors } from '../../../lib/form-errors';
import { useAddComment } from '../api/add-comment';
import { useComments } from '../api/get-comments';
import { formatWhen, roleLabel } from '../lib/format';
import { ReviewPanel } from './review-panel';
import { TextAreaField } from './text-area-field';

function CommentItem({ comment, mine }: { comment: CommentDto; mine: boolean }) {
  const role = roleLabel(comment.authorRole);
  return (
    <li className={mine ? 'fw-comment fw-comment-mine' : 'fw-comment'}>
      <div className="fw-comment-head">
        <strong className="fw-break-word">{mine ? `${comment.authorName} (you)` : comment.authorName}</strong>
        {role && (
          <Tag minimal round>
            {role}
          </Tag>
        )}
        <time className="fw-small fw-muted" dateTime={comment.createdAt}>
          {formatWhen(comment.createdAt)}
        </time>
      </div>
      {/* Plain text: React escapes it, and line breaks are kept by CSS. Never rendered as HTML. */}
      <p className="fw-comment-body">{comment.body}</p>
    </li>
  );
}

/** The case's thread: everyone who can see the case reads and writes it; the other side is e-mailed. */
export function CommentsPanel({ caseId }: { caseId: string }) {
  const viewer = useRequiredUser();
  const comments = useComments(caseId);
  const add = useAddComment(caseId);
  const [body, setBody] = useState('');
  const errors = formErrors(add.error, ['body']);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    add.mutate(body.trim(), { onSuccess: () => setBody('') });
  };

  return (
    <ReviewPanel id="review-comments" title="Comments" icon={<ChatIcon size={20} className="fw-title-icon" />} className="fw-review-order-2">
      {comments.isPending ? (
        <Spinner size={24} aria-label="Loading comments" />
      ) : comments.isError ? (
        <Callout intent="danger" compact>
          The comments could not be loaded: {comments.error.message}{' '}
          <Button variant="minimal" size="small" text="Try again" onClick={() => void comments.refetch()} />
        </Callout>
      ) : comments.data.length === 0 ? (
        <p className="fw-muted">No comments yet. Ask a question, or say what you found.</p>
      ) : (
        <ol className="fw-comments" aria-label="Comments">
          {comments.data.map((comment) => (
            <CommentItem key={comment.id} comment={comment} mine={comment.authorId === viewer.id} />
          ))}
        </ol>
      )}
      <form className="fw-review-form" onSubmit={submit} noValidate aria-label="New comment">
        <TextAreaField
          id="review-comment-body"
          label="Add a comment"
          value={body}
          onChange={setBody}
          maxLength={COMMENT_MAX_LENGTH}
          errors={errors.field('body')}
          hint={
            <>
              Plain text. Everyone on this case sees it and gets an e-mail (<Link to={paths.emailSettings}>e-mail settings</Link>).
            </>
          }
        />
        {errors.form && (
          <Callout className="fw-form-error" intent="danger" role="alert">
            {errors.form}
          </Callout>
        )}
        <Button
          className="fw-touch fw-review-submit"
          type="submit"
          intent="primary"
          size="large"
          icon={<SendMessageIcon />}
          text="Post comment"
          loading={add.isPending}
          disabled={body.trim() === ''}
        />
      </form>
    </ReviewPanel>
  );
}
